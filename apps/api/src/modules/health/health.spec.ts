import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('GET /api/health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => {
    await t?.close();
  });

  it('answers without a token and names the database driver', async () => {
    const response = await t.http.get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok', database: t.driver, version: expect.stringMatching(/^\d+\.\d+\.\d+/) });
    expect(t.driver).toBe(process.env.LIMITBOOK_TEST_DATABASE_URL ? 'postgres' : 'pglite');
  });

  it('answers unknown API paths with the error shape', async () => {
    const response = await t.http.get('/api/no-such-thing').expect(404);
    expect(response.body).toMatchObject({ statusCode: 404, code: 'NOT_FOUND' });
  });
});
