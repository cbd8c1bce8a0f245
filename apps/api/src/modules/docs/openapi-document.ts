import { roleLabels } from '@limitbook/contracts';
import { errorBodySchema } from '@limitbook/contracts';
import { z } from 'zod';
import { type RouteEntry } from '../../common/openapi/route-catalog.js';

type JsonSchema = Record<string, unknown>;

function schemaOf(schema: z.ZodType, io: 'input' | 'output'): JsonSchema {
  const json = z.toJSONSchema(schema, { target: 'openapi-3.0', io, unrepresentable: 'any' }) as JsonSchema;
  delete json.$schema;
  return json;
}

/** Query and path objects become one OpenAPI parameter per property. */
function parametersOf(schema: z.ZodType | undefined, location: 'query' | 'path'): JsonSchema[] {
  if (!schema) return [];
  const json = schemaOf(schema, 'input');
  const properties = (json.properties ?? {}) as Record<string, JsonSchema>;
  const required = new Set((json.required ?? []) as string[]);
  return Object.entries(properties).map(([name, property]) => ({
    name,
    in: location,
    required: location === 'path' || required.has(name),
    schema: property,
    ...(typeof property.description === 'string' ? { description: property.description } : {}),
  }));
}

const errorResponse = (description: string) => ({ description, content: { 'application/json': { schema: { $ref: '#/components/schemas/ErrorBody' } } } });

/** OpenAPI 3.0 from the same schemas the routes validate with. */
export function buildOpenApiDocument(routes: RouteEntry[], version: string): JsonSchema {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const route of [...routes].sort((a, b) => a.path.localeCompare(b.path))) {
    const path = route.path.replace(/:([A-Za-z0-9_]+)/g, '{$1}');
    const contract = route.contract;
    const okResponse = contract?.response
      ? { description: 'Success', content: { [contract.contentType ?? 'application/json']: { schema: schemaOf(contract.response, 'output') } } }
      : contract?.contentType
        ? { description: 'Success', content: { [contract.contentType]: { schema: { type: 'string' } } } }
        : { description: 'Success, no content' };
    const responses: Record<string, unknown> = { [String(contract?.status ?? route.status)]: okResponse };
    if (route.inputs.body || route.inputs.query || route.inputs.params) responses['400'] = errorResponse('Invalid input; `fields` names each offending field');
    if (route.access.kind !== 'public') {
      responses['401'] = errorResponse('Missing, invalid or expired access token');
      responses['403'] = errorResponse('Role not allowed');
    }
    const access =
      route.access.kind === 'public' ? 'Public.' : route.access.kind === 'roles' ? `Roles: ${route.access.roles.map((role) => roleLabels[role]).join(', ')}.` : 'No access rule: always refused.';
    (paths[path] ??= {})[route.method.toLowerCase()] = {
      operationId: `${route.controller.replace(/Controller$/, '')}_${route.handlerName}`,
      summary: contract?.summary ?? route.handlerName,
      description: [contract?.description, access].filter(Boolean).join('\n\n'),
      tags: [contract?.tag ?? route.controller.replace(/Controller$/, '')],
      ...(route.access.kind === 'public' ? { security: [] } : {}),
      parameters: [...parametersOf(route.inputs.params, 'path'), ...parametersOf(route.inputs.query, 'query')],
      ...(route.inputs.body ? { requestBody: { required: true, content: { 'application/json': { schema: schemaOf(route.inputs.body, 'input') } } } } : {}),
      responses,
    };
  }
  return {
    openapi: '3.0.3',
    info: {
      title: 'Limitbook API',
      version,
      description: 'Sign in with POST /api/auth/sign-in, then send `Authorization: Bearer <accessToken>` on every other call.',
    },
    servers: [{ url: '/' }],
    security: [{ bearer: [] }],
    components: {
      securitySchemes: { bearer: { type: 'http', scheme: 'bearer', bearerFormat: 'JWT' } },
      schemas: { ErrorBody: schemaOf(errorBodySchema, 'output') },
    },
    paths,
  };
}
