import { errorBodySchema, signInResponseSchema, type ErrorBody, type ErrorCode } from '@limitbook/contracts';
import type { z } from 'zod';
import { env } from '@/config/env';
import { session as defaultSession, type SessionStore } from './session';

/** An error answered by the API (or standing in for one when the server cannot be reached). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: ErrorCode;
  readonly fields: Record<string, string>;
  /** Seconds to wait before trying again, from `Retry-After` when the server sends one. */
  readonly retryAfter: number | null;

  constructor(readonly body: ErrorBody, retryAfter: number | null = null) {
    super(body.message);
    this.name = 'ApiError';
    this.status = body.statusCode;
    this.code = body.code;
    this.fields = body.fields ?? {};
    this.retryAfter = retryAfter;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Query = Record<string, string | number | boolean | null | undefined>;

export type RequestOptions = {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
  /** Public endpoints (sign-in, password reset…) go without a token and never trigger a refresh. */
  anonymous?: boolean;
};

type ClientConfig = {
  baseUrl?: string;
  session?: SessionStore;
  fetch?: typeof fetch;
};

const refreshPath = '/api/auth/refresh';

function buildUrl(baseUrl: string, path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `${baseUrl}${path}${search ? `?${search}` : ''}`;
}

function parseRetryAfter(response: Response): number | null {
  const header = response.headers.get('Retry-After');
  if (!header) return null;
  const seconds = Number(header);
  if (Number.isFinite(seconds)) return Math.max(0, Math.round(seconds));
  const date = Date.parse(header);
  return Number.isNaN(date) ? null : Math.max(0, Math.round((date - Date.now()) / 1000));
}

async function toApiError(response: Response): Promise<ApiError> {
  const retryAfter = parseRetryAfter(response);
  try {
    const parsed = errorBodySchema.safeParse(await response.json());
    if (parsed.success) return new ApiError(parsed.data, retryAfter);
  } catch {
    // Not JSON: a proxy or the network stack answered, not the API.
  }
  return new ApiError(
    { statusCode: response.status, code: response.status === 429 ? 'RATE_LIMITED' : 'INTERNAL', message: `The server answered with HTTP ${response.status}.` },
    retryAfter,
  );
}

const unreachable = () =>
  new ApiError({ statusCode: 0, code: 'INTERNAL', message: 'Cannot reach the Limitbook server. Check your connection and try again.' });

export function createApiClient(config: ClientConfig = {}) {
  const baseUrl = config.baseUrl ?? env.API_URL;
  const store = config.session ?? defaultSession;
  const doFetch: typeof fetch = config.fetch ?? ((input, init) => globalThis.fetch(input, init));
  let refreshing: Promise<boolean> | null = null;

  async function send(path: string, options: RequestOptions, token: string | null): Promise<Response> {
    const headers: Record<string, string> = { Accept: 'application/json' };
    // Multipart bodies carry their own boundary in the Content-Type the browser writes.
    const multipart = options.body instanceof FormData;
    if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
    if (token) headers.Authorization = `Bearer ${token}`;
    try {
      return await doFetch(buildUrl(baseUrl, path, options.query), {
        method: options.method ?? 'GET',
        headers,
        body: options.body === undefined ? undefined : multipart ? (options.body as FormData) : JSON.stringify(options.body),
        // The refresh cookie must travel when the API sits on another origin in development.
        credentials: 'include',
        signal: options.signal,
      });
    } catch (error) {
      if (error instanceof DOMException && error.name === 'AbortError') throw error;
      throw unreachable();
    }
  }

  /** Trades the refresh cookie for a new access token. Concurrent callers share one request. */
  function refreshSession(): Promise<boolean> {
    refreshing ??= (async () => {
      try {
        const response = await send(refreshPath, { method: 'POST' }, null);
        if (!response.ok) {
          store.signOut('expired');
          return false;
        }
        store.signIn(signInResponseSchema.parse(await response.json()));
        return true;
      } catch {
        store.signOut('expired');
        return false;
      } finally {
        refreshing = null;
      }
    })();
    return refreshing;
  }

  async function perform(path: string, options: RequestOptions): Promise<Response> {
    if (options.anonymous) return send(path, options, null);
    const token = store.accessToken();
    const response = await send(path, options, token);
    if (response.status !== 401) return response;
    // One refresh, one retry: a second 401 is the answer.
    const refreshed = await refreshSession();
    return refreshed ? send(path, options, store.accessToken()) : response;
  }

  async function request<S extends z.ZodType>(path: string, schema: S, options?: RequestOptions): Promise<z.infer<S>>;
  async function request(path: string, schema: null, options?: RequestOptions): Promise<void>;
  async function request(path: string, schema: z.ZodType | null, options: RequestOptions = {}): Promise<unknown> {
    const response = await perform(path, options);
    if (!response.ok) throw await toApiError(response);
    if (schema === null || response.status === 204) {
      if (schema !== null) throw contractError(path, 'an empty body');
      return undefined;
    }
    const parsed = schema.safeParse(await response.json().catch(() => undefined));
    if (!parsed.success) {
      console.error(`Response of ${path} does not match its contract`, parsed.error.issues);
      throw contractError(path, 'a body that does not match the contract');
    }
    return parsed.data;
  }

  function contractError(path: string, what: string) {
    return new ApiError({
      statusCode: 0,
      code: 'INTERNAL',
      message: `The server sent ${what} for ${path}. Reload the page; if it persists, the app and server versions differ.`,
    });
  }

  /** Fetches a file with the session's token and hands back its bytes and suggested name. */
  async function download(path: string, options: RequestOptions = {}): Promise<{ blob: Blob; filename: string | null }> {
    const response = await perform(path, options);
    if (!response.ok) throw await toApiError(response);
    const disposition = response.headers.get('Content-Disposition') ?? '';
    const match = /filename\*?=(?:UTF-8'')?"?([^";]+)"?/i.exec(disposition);
    return { blob: await response.blob(), filename: match?.[1] ? decodeURIComponent(match[1]) : null };
  }

  return {
    get: <S extends z.ZodType>(path: string, schema: S, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request(path, schema, { ...options, method: 'GET' }),
    post: <S extends z.ZodType>(path: string, body: unknown, schema: S, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request(path, schema, { ...options, method: 'POST', body }),
    patch: <S extends z.ZodType>(path: string, body: unknown, schema: S, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request(path, schema, { ...options, method: 'PATCH', body }),
    put: <S extends z.ZodType>(path: string, body: unknown, schema: S, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request(path, schema, { ...options, method: 'PUT', body }),
    /** Sends a `FormData` body as multipart/form-data (file uploads). */
    upload: <S extends z.ZodType>(path: string, form: FormData, schema: S, options?: Omit<RequestOptions, 'method' | 'body'>) =>
      request(path, schema, { ...options, method: 'POST', body: form }),
    /** For endpoints answering 204 No Content. */
    send: (path: string, options: RequestOptions) => request(path, null, options),
    download,
    refreshSession,
  };
}

export type ApiClient = ReturnType<typeof createApiClient>;

export const api = createApiClient();
