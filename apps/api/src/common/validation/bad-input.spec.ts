import { type Role, roles } from '@limitbook/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { JSON_BODY_LIMIT } from '../../app.setup.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { routesOf, type RouteEntry } from '../openapi/route-catalog.js';

type JsonSchema = { type?: string | string[]; properties?: Record<string, JsonSchema>; required?: string[]; format?: string; enum?: unknown[] };

const inputSchema = (schema: z.ZodType) => z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' }) as JsonSchema;

/** A value no schema of this property accepts. */
function wrongValue(property: JsonSchema): unknown {
  const types = [property.type ?? []].flat();
  if (types.includes('string')) return 12345;
  if (types.includes('number') || types.includes('integer') || types.includes('boolean')) return 'not-a-value';
  return 'not-a-value';
}

/** A query-string value that fails the property's check (everything in a query string is text). */
function wrongQueryValue(property: JsonSchema): string | undefined {
  const types = [property.type ?? []].flat();
  if (types.includes('number') || types.includes('integer') || types.includes('boolean')) return 'not-a-number';
  if (property.format || property.enum) return 'not-valid-here';
  return undefined;
}

const concretePath = (path: string) => path.replace(/:[A-Za-z0-9_]+/g, '0f8e2c53-6a1d-4f4b-9a3e-5b7c2d1e8f90');

describe('bad input on every route that takes input', () => {
  let t: TestApp;
  let routes: RouteEntry[];
  const tokens = new Map<Role, string>();

  beforeAll(async () => {
    t = await createTestApp();
    routes = routesOf(t.app).filter((route) => route.inputs.body || route.inputs.query || route.inputs.params);
    for (const role of roles) tokens.set(role, await t.signIn(role));
  });
  afterAll(async () => {
    await t?.close();
  });

  function call(route: RouteEntry, path = concretePath(route.path)) {
    let request = t.http[route.method.toLowerCase() as 'post'](path);
    if (route.access.kind === 'roles') request = request.set('Authorization', `Bearer ${tokens.get(route.access.roles[0]!)!}`);
    return request;
  }

  it('covers the routes with bodies, queries and path parameters', () => {
    expect(routes.filter((route) => route.inputs.body).length).toBeGreaterThanOrEqual(6);
    expect(routes.filter((route) => route.inputs.query).length).toBeGreaterThanOrEqual(3);
    expect(routes.filter((route) => route.inputs.params).length).toBeGreaterThanOrEqual(2);
  });

  it('answers 400 with field messages (413 when too large) and writes nothing', async () => {
    const before = await t.rowCounts();
    const failures: string[] = [];
    const expectError = (label: string, response: { status: number; body: { code?: string; fields?: Record<string, string> } }, status: number, code: string, fieldKeys: string[] = []) => {
      const fields = response.body.fields ?? {};
      const missing = fieldKeys.filter((key) => !(key in fields));
      if (response.status !== status || response.body.code !== code || (status === 400 && Object.keys(fields).length === 0) || missing.length > 0) {
        failures.push(`${label}: got ${response.status} ${JSON.stringify(response.body)}, expected ${status} ${code} with fields ${fieldKeys.join(', ') || '(any)'}`);
      }
    };

    for (const route of routes) {
      const name = `${route.method} ${route.path}`;
      if (route.inputs.body) {
        const schema = inputSchema(route.inputs.body);
        const properties = schema.properties ?? {};
        const wrongTypes = Object.fromEntries(Object.entries(properties).map(([key, property]) => [key, wrongValue(property)]));
        expectError(`${name} wrong types`, await call(route).send(wrongTypes), 400, 'VALIDATION_FAILED', Object.keys(properties));
        expectError(`${name} missing fields`, await call(route).send({}), 400, 'VALIDATION_FAILED', schema.required ?? []);
        expectError(`${name} unknown field`, await call(route).send({ unexpectedField: 1 }), 400, 'VALIDATION_FAILED', ['unexpectedField']);
        expectError(`${name} malformed JSON`, await call(route).set('Content-Type', 'application/json').send('{"email": "a@b.example", '), 400, 'MALFORMED_JSON');
        expectError(`${name} not JSON`, await call(route).set('Content-Type', 'text/plain').send('email=a@b.example'), 400, 'VALIDATION_FAILED');
        expectError(`${name} oversize`, await call(route).send({ padding: 'x'.repeat(JSON_BODY_LIMIT) }), 413, 'PAYLOAD_TOO_LARGE');
      }
      if (route.inputs.query) {
        const properties = inputSchema(route.inputs.query).properties ?? {};
        for (const [key, property] of Object.entries(properties)) {
          const value = wrongQueryValue(property);
          if (value !== undefined) expectError(`${name} ?${key}=${value}`, await call(route).query({ [key]: value }), 400, 'VALIDATION_FAILED', [key]);
        }
        expectError(`${name} unknown query field`, await call(route).query({ unexpectedField: '1' }), 400, 'VALIDATION_FAILED', ['unexpectedField']);
      }
      const badParam = 'not-a-uuid';
      const paramNames = [...route.path.matchAll(/:([A-Za-z0-9_]+)/g)].map((match) => match[1]!);
      const rejectsBadParam = route.inputs.params && !route.inputs.params.safeParse(Object.fromEntries(paramNames.map((key) => [key, badParam]))).success;
      if (rejectsBadParam) {
        const response = await call(route, route.path.replace(/:[A-Za-z0-9_]+/g, badParam)).send({});
        // Nest runs parameter pipes concurrently, so with a body or query as well either error may be the one reported.
        expectError(`${name} bad path parameter`, response, 400, 'VALIDATION_FAILED', route.inputs.body || route.inputs.query ? [] : paramNames);
      }
    }
    expect(failures).toEqual([]);
    expect(await t.rowCounts()).toEqual(before);
  });
});
