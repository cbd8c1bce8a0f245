import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routesOf } from '../../common/openapi/route-catalog.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('API reference', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => {
    await t?.close();
  });

  it('documents every route, with the schemas the routes validate with', async () => {
    const document = (await t.http.get('/api/openapi.json').expect(200)).body;
    expect(document.openapi).toMatch(/^3\./);
    const documented = Object.entries(document.paths as Record<string, Record<string, unknown>>).flatMap(([path, operations]) =>
      Object.keys(operations).map((method) => `${method.toUpperCase()} ${path}`),
    );
    const routes = routesOf(t.app).map((route) => `${route.method} ${route.path.replace(/:([A-Za-z0-9_]+)/g, '{$1}')}`);
    expect(documented.sort()).toEqual([...new Set(routes)].sort());

    const signIn = document.paths['/api/auth/sign-in'].post;
    expect(signIn.security).toEqual([]);
    expect(signIn.requestBody.content['application/json'].schema).toMatchObject({ properties: { email: expect.any(Object), password: expect.any(Object) }, required: ['email', 'password'] });
    expect(signIn.responses['200'].content['application/json'].schema.properties).toHaveProperty('accessToken');

    const patchUser = document.paths['/api/users/{id}'].patch;
    expect(patchUser.parameters).toEqual(expect.arrayContaining([expect.objectContaining({ name: 'id', in: 'path', required: true })]));
    expect(patchUser.responses).toHaveProperty('401');
    expect(patchUser.responses).toHaveProperty('403');
    expect(patchUser.description).toMatch(/Roles: Admin/);
    expect(document.paths['/api/audit'].get.parameters.map((parameter: { name: string }) => parameter.name)).toEqual(expect.arrayContaining(['action', 'from', 'limit']));
  });

  it('serves a browsable page with its assets from the package, no CDN', async () => {
    const page = await t.http.get('/api/docs').expect(200);
    expect(page.headers['content-type']).toMatch(/text\/html/);
    const sources = [...page.text.matchAll(/(?:src|href)="([^"]+)"/g)].map((match) => match[1]!);
    expect(sources.every((source) => source.startsWith('/api/docs'))).toBe(true);
    for (const source of sources) await t.http.get(source).expect(200);
  });
});
