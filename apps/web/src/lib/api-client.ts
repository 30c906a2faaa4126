import type { z } from 'zod';
import { ApiError, apiErrorFromText } from './api-error';
import { fileNameFromContentDisposition } from './content-disposition';
import { authSessionSchema } from './contract/auth-session-schema';
import { meSchema, type Me } from './contract/me-schema';

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
  /** Extra request headers, e.g. `If-Match` for a compare-and-set save. */
  headers?: Record<string, string>;
}

export interface BlobRequestOptions {
  signal?: AbortSignal;
  headers?: Record<string, string>;
}

/** A downloaded file: its bytes and the name the server gave it (`Content-Disposition`), if any. */
export interface DownloadedFile {
  blob: Blob;
  fileName: string | null;
}

/** Anything with an HTTP status: a fetch Response, or what an XMLHttpRequest answered. */
export interface StatusResult {
  status: number;
}

export interface ApiClientOptions {
  fetchFn?: typeof fetch;
  baseUrl?: string;
}

export interface ApiClient {
  request<T>(path: string, options: RequestOptions<T>): Promise<T>;
  /** GETs bytes (a photo, a spreadsheet) with the session's token; non-2xx throws an ApiError. */
  requestBlob(path: string, options?: BlobRequestOptions): Promise<Blob>;
  /** Like `requestBlob`, also reading the file name the server sent (an order sheet export). */
  requestFile(path: string, options?: BlobRequestOptions): Promise<DownloadedFile>;
  /**
   * For requests the helpers above cannot make (e.g. a multipart upload through XMLHttpRequest for
   * its progress events): runs `attempt` with the Authorization header, and once more with a
   * refreshed session when it answers 401. The caller reads the result and its errors.
   */
  withAuthorization<R extends StatusResult>(attempt: (headers: Record<string, string>) => Promise<R>): Promise<R>;
  signIn(email: string, password: string): Promise<Me>;
  /** Posts to an endpoint that answers like login (accepting an invitation) and adopts that session. */
  signInWith(path: string, body: unknown): Promise<Me>;
  signOut(): Promise<void>;
  /** Reads `GET /api/me` again into the session (after a rename of the user or the shop). */
  reloadMe(): Promise<Me>;
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

  function authorizationHeader(token: string | null): Record<string, string> {
    return token ? { Authorization: `Bearer ${token}` } : {};
  }

  async function send(
    path: string,
    method: HttpMethod,
    body: unknown,
    token: string | null,
    signal?: AbortSignal,
    extraHeaders: Record<string, string> = {},
  ) {
    const headers: Record<string, string> = { Accept: 'application/json', ...extraHeaders, ...authorizationHeader(token) };
    if (body !== undefined) headers['Content-Type'] = 'application/json';
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
    const text = await response.text().catch(() => '');
    return apiErrorFromText(response.status, text, `The server answered ${response.status} ${response.statusText}`.trim() + '.');
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

  /** Sends with the current token; on 401 refreshes (single flight) and sends once more; a second 401 ends the session. */
  async function withToken<R extends StatusResult>(attempt: (token: string | null) => Promise<R>): Promise<R> {
    const tokenUsed = currentToken();
    let result = await attempt(tokenUsed);
    if (result.status === 401 && tokenUsed !== null) {
      // Another request may already have swapped the token while this one was in flight.
      const refreshed = currentToken() !== tokenUsed || (await refreshSession());
      if (refreshed) result = await attempt(currentToken());
      if ((!refreshed || result.status === 401) && session.status === 'signed-in') {
        setSession({ status: 'signed-out', reason: 'expired' });
      }
    }
    return result;
  }

  async function request<T>(path: string, { method = 'GET', body, schema, signal, headers }: RequestOptions<T>): Promise<T> {
    const response = await withToken((token) => send(path, method, body, token, signal, headers));
    if (!response.ok) throw await toApiError(response);
    return parseBody(response, schema);
  }

  async function requestFile(path: string, { signal, headers }: BlobRequestOptions = {}): Promise<DownloadedFile> {
    const response = await withToken((token) => send(path, 'GET', undefined, token, signal, { Accept: '*/*', ...headers }));
    if (!response.ok) throw await toApiError(response);
    return { blob: await response.blob(), fileName: fileNameFromContentDisposition(response.headers.get('Content-Disposition')) };
  }

  async function requestBlob(path: string, options?: BlobRequestOptions): Promise<Blob> {
    return (await requestFile(path, options)).blob;
  }

  function withAuthorization<R extends StatusResult>(attempt: (headers: Record<string, string>) => Promise<R>): Promise<R> {
    return withToken((token) => attempt(authorizationHeader(token)));
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

  async function reloadMe(): Promise<Me> {
    const me = await request('/api/me', { schema: meSchema });
    // Only the same user's session takes the new profile; a sign-out meanwhile stays signed out.
    if (session.status === 'signed-in' && session.user.id === me.id) setSession({ ...session, user: me });
    return me;
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
    requestBlob,
    requestFile,
    withAuthorization,
    signIn,
    signInWith,
    signOut,
    reloadMe,
    restoreSession,
    getSession: () => session,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}
