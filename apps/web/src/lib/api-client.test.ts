import { userListSchema } from '@limitbook/contracts';
import { describe, expect, it, vi } from 'vitest';
import { jsonResponse } from '@/testing/render';
import { ApiError, createApiClient } from './api-client';
import { createSessionStore } from './session';

const user = { id: 'u1', email: 'tomas.wren@brackwater.example', name: 'Tomas Wren', role: 'reader' as const };
const signedIn = (accessToken: string) => ({ status: 'signed-in' as const, user, accessToken, expiresAt: Date.now() + 60_000 });
const unauthenticated = () => jsonResponse(401, { statusCode: 401, code: 'UNAUTHENTICATED', message: 'Sign in to continue' });
const emptyList = { items: [], total: 0 };

type Call = { url: string; method: string; authorization: string | null };

/** A fetch at the network boundary that answers from a script and records what was sent. */
function scriptedFetch(answers: Array<(call: Call) => Response>) {
  const calls: Call[] = [];
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const headers = new Headers(init?.headers);
    const call = { url: String(input), method: init?.method ?? 'GET', authorization: headers.get('Authorization') };
    calls.push(call);
    const answer = answers.shift();
    if (!answer) throw new Error(`Unexpected request ${call.method} ${call.url}`);
    return answer(call);
  });
  return { fetch: fetch as unknown as typeof globalThis.fetch, calls };
}

describe('api client', () => {
  it('refreshes once on 401 and retries the request with the new token', async () => {
    const session = createSessionStore(signedIn('stale'));
    const { fetch, calls } = scriptedFetch([
      unauthenticated,
      () => jsonResponse(200, { accessToken: 'fresh', expiresIn: 900, user }),
      () => jsonResponse(200, emptyList),
    ]);
    const api = createApiClient({ baseUrl: '', session, fetch });

    await expect(api.get('/api/users', userListSchema)).resolves.toEqual(emptyList);

    expect(calls.map((call) => `${call.method} ${call.url} ${call.authorization}`)).toEqual([
      'GET /api/users Bearer stale',
      'POST /api/auth/refresh null',
      'GET /api/users Bearer fresh',
    ]);
    expect(session.accessToken()).toBe('fresh');
  });

  it('gives up after a failed refresh: throws the 401 and ends the session', async () => {
    const session = createSessionStore(signedIn('stale'));
    const { fetch, calls } = scriptedFetch([unauthenticated, unauthenticated]);
    const api = createApiClient({ baseUrl: '', session, fetch });

    const error = await api.get('/api/users', userListSchema).catch((caught: unknown) => caught);

    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(401);
    expect(calls).toHaveLength(2);
    expect(session.get()).toEqual({ status: 'signed-out', reason: 'expired' });
  });

  it('does not loop when the retried request is refused again', async () => {
    const session = createSessionStore(signedIn('stale'));
    const { fetch, calls } = scriptedFetch([
      unauthenticated,
      () => jsonResponse(200, { accessToken: 'fresh', expiresIn: 900, user }),
      unauthenticated,
    ]);
    const api = createApiClient({ baseUrl: '', session, fetch });

    await expect(api.get('/api/users', userListSchema)).rejects.toMatchObject({ status: 401 });
    expect(calls).toHaveLength(3);
  });

  it('shares one refresh between requests that fail together', async () => {
    const session = createSessionStore(signedIn('stale'));
    const { fetch, calls } = scriptedFetch([
      unauthenticated,
      unauthenticated,
      () => jsonResponse(200, { accessToken: 'fresh', expiresIn: 900, user }),
      () => jsonResponse(200, emptyList),
      () => jsonResponse(200, emptyList),
    ]);
    const api = createApiClient({ baseUrl: '', session, fetch });

    await Promise.all([api.get('/api/users', userListSchema), api.get('/api/users', userListSchema)]);

    expect(calls.filter((call) => call.url === '/api/auth/refresh')).toHaveLength(1);
  });

  it('never refreshes for anonymous endpoints such as sign-in', async () => {
    const session = createSessionStore({ status: 'signed-out' });
    const { fetch, calls } = scriptedFetch([
      () => jsonResponse(401, { statusCode: 401, code: 'UNAUTHENTICATED', message: 'Wrong e-mail or password' }),
    ]);
    const api = createApiClient({ baseUrl: '', session, fetch });

    await expect(api.send('/api/auth/sign-in', { method: 'POST', body: {}, anonymous: true })).rejects.toMatchObject({ status: 401 });
    expect(calls).toHaveLength(1);
  });

  it('carries the error body, field messages and Retry-After on ApiError', async () => {
    const { fetch } = scriptedFetch([
      () =>
        jsonResponse(
          429,
          { statusCode: 429, code: 'RATE_LIMITED', message: 'Too many attempts', fields: { email: 'Slow down' } },
          { 'Retry-After': '120' },
        ),
    ]);
    const api = createApiClient({ baseUrl: '', session: createSessionStore({ status: 'signed-out' }), fetch });

    await expect(api.send('/api/auth/sign-in', { method: 'POST', body: {}, anonymous: true })).rejects.toMatchObject({
      code: 'RATE_LIMITED',
      fields: { email: 'Slow down' },
      retryAfter: 120,
    });
  });

  it('rejects a response that does not match its contract', async () => {
    const { fetch } = scriptedFetch([() => jsonResponse(200, { items: 'nope' })]);
    const api = createApiClient({ baseUrl: '', session: createSessionStore(signedIn('t')), fetch });
    vi.spyOn(console, 'error').mockImplementation(() => {});

    await expect(api.get('/api/users', userListSchema)).rejects.toBeInstanceOf(ApiError);
  });

  it('sends a FormData body as multipart, leaving the Content-Type (and its boundary) to the browser', async () => {
    const session = createSessionStore(signedIn('token'));
    let sent: RequestInit | undefined;
    const fetch = vi.fn(async (_input: RequestInfo | URL, init?: RequestInit) => {
      sent = init;
      return jsonResponse(200, emptyList);
    }) as unknown as typeof globalThis.fetch;
    const api = createApiClient({ baseUrl: '', session, fetch });
    const form = new FormData();
    form.append('file', new Blob(['a,b\n1,2\n'], { type: 'text/csv' }), 'pins.csv');

    await api.upload('/api/files', form, userListSchema);

    expect(sent?.method).toBe('POST');
    expect(sent?.body).toBe(form);
    expect(new Headers(sent?.headers).get('Content-Type')).toBeNull();
  });
});
