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

  it('ignores X-Forwarded-For by default: every client behind a proxy shares its address', async () => {
    const email = 'shared.proxy@brackwater.example';
    const from = (client: string) => t.http.post('/api/auth/sign-in').set('X-Forwarded-For', client).send({ email, password: 'guess number one' });
    for (let attempt = 0; attempt < 3; attempt++) expect((await from('203.0.113.10')).status).toBe(401);
    expect((await from('203.0.113.20')).status).toBe(429);
  });
});

describe('auth rate limit behind a trusted proxy', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ env: { LIMITBOOK_AUTH_RATE_LIMIT: '3', LIMITBOOK_TRUST_PROXY: 'loopback' } });
  });
  afterAll(async () => {
    await t?.close();
  });

  it('counts each X-Forwarded-For client separately', async () => {
    const email = 'trusted.proxy@brackwater.example';
    const from = (client: string) => t.http.post('/api/auth/sign-in').set('X-Forwarded-For', client).send({ email, password: 'guess number one' });
    for (let attempt = 0; attempt < 3; attempt++) expect((await from('203.0.113.10')).status).toBe(401);
    expect((await from('203.0.113.10')).status).toBe(429);
    // The balancer appends the address it saw; the client is the last untrusted hop.
    expect((await from('203.0.113.20')).status).toBe(401);
    expect((await from('198.51.100.7, 203.0.113.10')).status).toBe(429);
  });
});
