import type { z } from 'zod';
import { ApiError } from './api-error';
import { apiErrorBodySchema } from './contract/api-error-body-schema';
import { authSessionSchema } from './contract/auth-session-schema';
import type { Me } from './contract/me-schema';

export type SignedOutReason = 'not-signed-in' | 'expired' | 'signed-out';

/** The session lives in memory only; the refresh cookie (httpOnly) is what survives a reload. */
export type SessionState =
  | { status: 'restoring' }
  | { status: 'signed-in'; accessToken: string; user: Me }
  | { status: 'signed-out'; reason: SignedOutReason };

export type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions<T> {
  method?: HttpMethod;
  body?: unknown;
  /** Parses the response body; `z.void()`/`z.undefined()` for 204 responses. */
  schema: z.ZodType<T>;
  signal?: AbortSignal;
}

export interface ApiClientOptions {
  fetchFn?: typeof fetch;
  baseUrl?: string;
}

export interface ApiClient {
  request<T>(path: string, options: RequestOptions<T>): Promise<T>;
  signIn(email: string, password: string): Promise<Me>;
  /** Posts to an endpoint that answers like login (accepting an invitation) and adopts that session. */
  signInWith(path: string, body: unknown): Promise<Me>;
  signOut(): Promise<void>;
  /** Restores the session from the refresh cookie once per page load. */
  restoreSession(): Promise<boolean>;
  getSession(): SessionState;
  subscribe(listener: () => void): () => void;
}

const networkErrorMessage = 'Linesmith could not reach the server. Check the connection and try again.';
const refreshLockName = 'linesmith-session-refresh';

export function createApiClient({ fetchFn, baseUrl = '' }: ApiClientOptions = {}): ApiClient {
  // Resolved per call so tests (and polyfills) that replace the global fetch are honoured.
  const doFetch: typeof fetch = fetchFn ?? ((input, init) => globalThis.fetch(input, init));
  let session: SessionState = { status: 'restoring' };
  let refreshInFlight: Promise<boolean> | null = null;
  let restoreOnce: Promise<boolean> | null = null;
  const listeners = new Set<() => void>();

  function setSession(next: SessionState): void {
    session = next;
    for (const listener of listeners) listener();
  }

  function currentToken(): string | null {
    return session.status === 'signed-in' ? session.accessToken : null;
  }

  async function send(path: string, method: HttpMethod, body: unknown, token: string | null, signal?: AbortSignal) {
    const headers: Record<string, string> = { Accept: 'application/json' };
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    if (token) headers.Authorization = `Bearer ${token}`;
    try {
      return await doFetch(`${baseUrl}${path}`, {
        method,
        headers,
        body: body === undefined ? undefined : JSON.stringify(body),
        credentials: 'same-origin',
        signal,
      });
    } catch (cause) {
      if (signal?.aborted) throw cause;
      throw new ApiError({ status: 0, code: 'network_error', message: networkErrorMessage });
    }
  }

  async function toApiError(response: Response): Promise<ApiError> {
    const raw: unknown = await response.json().catch(() => undefined);
    const parsed = apiErrorBodySchema.safeParse(raw);
    if (parsed.success) {
      const { code, message, issues } = parsed.data;
      return new ApiError({ status: response.status, code, message, issues, body: parsed.data });
    }
    return new ApiError({
      status: response.status,
      code: 'unexpected_response',
      message: `The server answered ${response.status} ${response.statusText}`.trim() + '.',
      body: raw,
    });
  }

  async function parseBody<T>(response: Response, schema: z.ZodType<T>): Promise<T> {
    const text = await response.text();
    const result = schema.safeParse(text === '' ? undefined : JSON.parse(text));
    if (!result.success) {
      throw new ApiError({
        status: response.status,
        code: 'unexpected_response',
        message: 'The server sent data this version of Linesmith does not understand.',
        issues: result.error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message })),
      });
    }
    return result.data;
  }

  async function refreshNow(): Promise<boolean> {
    try {
      const response = await send('/api/auth/refresh', 'POST', undefined, null);
      if (!response.ok) return false;
      const next = authSessionSchema.parse(await response.json());
      setSession({ status: 'signed-in', accessToken: next.accessToken, user: next.user });
      return true;
    } catch {
      return false;
    }
  }

  /**
   * Single flight: every caller waiting for a new token shares one refresh. Rotated refresh
   * tokens are single-use (a reuse revokes the family), so two tabs must not refresh at once
   * either; the Web Locks API serialises them where the browser has it.
   */
  function refreshSession(): Promise<boolean> {
    if (!refreshInFlight) {
      const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
      const run = locks ? locks.request(refreshLockName, refreshNow) : refreshNow();
      refreshInFlight = run.finally(() => {
        refreshInFlight = null;
      });
    }
    return refreshInFlight;
  }

  async function request<T>(path: string, { method = 'GET', body, schema, signal }: RequestOptions<T>): Promise<T> {
    const tokenUsed = currentToken();
    let response = await send(path, method, body, tokenUsed, signal);
    if (response.status === 401 && tokenUsed !== null) {
      // Another request may already have swapped the token while this one was in flight.
      const refreshed = currentToken() !== tokenUsed || (await refreshSession());
      if (refreshed) response = await send(path, method, body, currentToken(), signal);
      if (!refreshed || response.status === 401) {
        const error = await toApiError(response);
        if (session.status === 'signed-in') setSession({ status: 'signed-out', reason: 'expired' });
        throw error;
      }
    }
    if (!response.ok) throw await toApiError(response);
    return parseBody(response, schema);
  }

  async function signIn(email: string, password: string): Promise<Me> {
    return signInWith('/api/auth/login', { email, password });
  }

  async function signInWith(path: string, body: unknown): Promise<Me> {
    const response = await send(path, 'POST', body, null);
    if (!response.ok) throw await toApiError(response);
    const next = await parseBody(response, authSessionSchema);
    setSession({ status: 'signed-in', accessToken: next.accessToken, user: next.user });
    return next.user;
  }

  async function signOut(): Promise<void> {
    try {
      await send('/api/auth/logout', 'POST', undefined, currentToken());
    } catch {
      // The local session ends regardless; the server-side token expires on its own.
    }
    setSession({ status: 'signed-out', reason: 'signed-out' });
  }

  function restoreSession(): Promise<boolean> {
    restoreOnce ??= refreshSession().then((ok) => {
      if (!ok) setSession({ status: 'signed-out', reason: 'not-signed-in' });
      return ok;
    });
    return restoreOnce;
  }

  return {
    request,
    signIn,
    signInWith,
    signOut,
    restoreSession,
    getSession: () => session,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}
