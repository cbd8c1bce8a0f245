import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('auth rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ env: { LIMITBOOK_AUTH_RATE_LIMIT: '3', LIMITBOOK_AUTH_RATE_WINDOW_SECONDS: '60' } });
  });
  afterAll(async () => {
    await t?.close();
  });

  it('answers 429 in the error shape once an address and e-mail run out of attempts', async () => {
    const email = t.demoPerson('reader').email;
    for (let attempt = 0; attempt < 3; attempt++) {
      await t.http.post('/api/auth/sign-in').send({ email, password: 'guess number one' }).expect(401);
    }
    const limited = await t.http.post('/api/auth/sign-in').send({ email, password: t.demoPerson('reader').password }).expect(429);
    expect(limited.body).toEqual({ statusCode: 429, code: 'RATE_LIMITED', message: expect.any(String) });

    // Another account from the same address still has its own budget.
    const other = t.demoPerson('author');
    await t.http.post('/api/auth/sign-in').send({ email: other.email, password: other.password }).expect(200);
  });

  it('limits forgot-password too', async () => {
    const email = 'someone@brackwater.example';
    for (let attempt = 0; attempt < 3; attempt++) await t.http.post('/api/auth/forgot-password').send({ email }).expect(204);
    const limited = await t.http.post('/api/auth/forgot-password').send({ email }).expect(429);
    expect(limited.body.code).toBe('RATE_LIMITED');
  });
});
