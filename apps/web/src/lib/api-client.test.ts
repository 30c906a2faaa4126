import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { demoUsers, sessionBody } from '../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../test/fetch-mock';
import { createApiClient } from './api-client';
import { ApiError } from './api-error';

// Expected behaviour: API contract (refresh on 401, error shape) and the web client brief.
const pingSchema = z.object({ ok: z.literal(true) });
const user = demoUsers.fabricator;

/** A client signed in as the fabricator with `token-1`. */
async function signedInClient(mock: ReturnType<typeof createFetchMock>) {
  mock.on('POST', '/api/auth/login', () => jsonResponse(200, sessionBody(user, 'token-1')));
  const client = createApiClient({ fetchFn: mock.fetchFn });
  await client.signIn(user.email, 'linesmith-demo');
  return client;
}

/** Answers 200 only to the given bearer token, 401 otherwise, like an expiring access token. */
function acceptOnly(token: string) {
  return ({ headers }: { headers: Headers }) =>
    headers.get('Authorization') === `Bearer ${token}`
      ? jsonResponse(200, { ok: true })
      : errorResponse(401, 'unauthorized', 'The access token has expired.');
}

describe('api client', () => {
  it('sends JSON with the bearer token and same-origin credentials', async () => {
    const mock = createFetchMock().on('POST', '/api/ping', acceptOnly('token-1'));
    const client = await signedInClient(mock);

    await expect(client.request('/api/ping', { method: 'POST', body: { a: 1 }, schema: pingSchema })).resolves.toEqual({
      ok: true,
    });

    const [input, init] = (mock.fetchFn as unknown as { mock: { calls: [string, RequestInit][] } }).mock.calls.at(-1)!;
    expect(input).toBe('/api/ping');
    expect(init.credentials).toBe('same-origin');
    expect(new Headers(init.headers).get('Content-Type')).toBe('application/json');
    expect(mock.requests.at(-1)?.body).toEqual({ a: 1 });
  });

  it('on 401 refreshes once and retries with the new token', async () => {
    const mock = createFetchMock()
      .on('GET', '/api/ping', acceptOnly('token-2'))
      .on('POST', '/api/auth/refresh', () => jsonResponse(200, sessionBody(user, 'token-2')));
    const client = await signedInClient(mock);

    await expect(client.request('/api/ping', { schema: pingSchema })).resolves.toEqual({ ok: true });

    expect(mock.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
    const pings = mock.callsTo('GET', '/api/ping').map((r) => r.headers.get('Authorization'));
    expect(pings).toEqual(['Bearer token-1', 'Bearer token-2']);
    const session = client.getSession();
    expect(session.status === 'signed-in' && session.accessToken).toBe('token-2');
  });

  it('signs out when the refresh fails, and throws the 401 as an ApiError', async () => {
    const mock = createFetchMock()
      .on('GET', '/api/ping', acceptOnly('never'))
      .on('POST', '/api/auth/refresh', () => errorResponse(401, 'unauthorized', 'The refresh token was revoked.'));
    const client = await signedInClient(mock);
    const notified: string[] = [];
    client.subscribe(() => notified.push(client.getSession().status));

    const error = await client.request('/api/ping', { schema: pingSchema }).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 401, code: 'unauthorized', message: 'The access token has expired.' });
    expect(client.getSession()).toEqual({ status: 'signed-out', reason: 'expired' });
    expect(notified).toEqual(['signed-out']);
    expect(mock.callsTo('GET', '/api/ping')).toHaveLength(1);
  });

  it('refreshes only once when several requests get 401 at the same time', async () => {
    let releaseRefresh!: () => void;
    const refreshGate = new Promise<void>((resolve) => (releaseRefresh = resolve));
    const mock = createFetchMock()
      .on('GET', '/api/ping', acceptOnly('token-2'))
      .on('POST', '/api/auth/refresh', async () => {
        await refreshGate;
        return jsonResponse(200, sessionBody(user, 'token-2'));
      });
    const client = await signedInClient(mock);

    const all = Promise.all([1, 2, 3].map(() => client.request('/api/ping', { schema: pingSchema })));
    // Let all three first attempts fail before the refresh answers.
    await new Promise((resolve) => setTimeout(resolve, 10));
    releaseRefresh();

    await expect(all).resolves.toEqual([{ ok: true }, { ok: true }, { ok: true }]);
    expect(mock.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
    expect(mock.callsTo('GET', '/api/ping')).toHaveLength(6);
  });

  it('does not refresh again for a 401 that arrives after another request already refreshed', async () => {
    let answerSlowRequest!: () => void;
    const slowGate = new Promise<void>((resolve) => (answerSlowRequest = resolve));
    const mock = createFetchMock()
      .on('GET', '/api/ping', acceptOnly('token-2'))
      .on('GET', '/api/slow', async (request) => {
        if (request.headers.get('Authorization') === 'Bearer token-1') {
          await slowGate;
          return errorResponse(401, 'unauthorized', 'The access token has expired.');
        }
        return jsonResponse(200, { ok: true });
      })
      .on('POST', '/api/auth/refresh', () => jsonResponse(200, sessionBody(user, 'token-2')));
    const client = await signedInClient(mock);

    const slow = client.request('/api/slow', { schema: pingSchema });
    await client.request('/api/ping', { schema: pingSchema });
    answerSlowRequest();

    await expect(slow).resolves.toEqual({ ok: true });
    expect(mock.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
  });

  it('passes API errors through with status, code, message and issues', async () => {
    const mock = createFetchMock().on('POST', '/api/users', () =>
      jsonResponse(400, {
        statusCode: 400,
        code: 'validation_failed',
        message: 'The request is not valid.',
        issues: [{ path: 'email', message: 'Invalid e-mail' }],
      }),
    );
    const client = await signedInClient(mock);

    const error = await client.request('/api/users', { method: 'POST', body: {}, schema: pingSchema }).catch((e) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      code: 'validation_failed',
      message: 'The request is not valid.',
      issues: [{ path: 'email', message: 'Invalid e-mail' }],
    });
    expect(mock.callsTo('POST', '/api/auth/refresh')).toHaveLength(0);
  });

  it('does not treat wrong credentials at sign-in as an expired session', async () => {
    const mock = createFetchMock().on('POST', '/api/auth/login', () =>
      errorResponse(401, 'invalid_credentials', 'Wrong e-mail or password.'),
    );
    const client = createApiClient({ fetchFn: mock.fetchFn });

    await expect(client.signIn('x@tidewater.example', 'nope')).rejects.toMatchObject({ code: 'invalid_credentials' });
    expect(mock.callsTo('POST', '/api/auth/refresh')).toHaveLength(0);
  });

  it('restores the session through the refresh cookie only once per page load', async () => {
    const mock = createFetchMock().on('POST', '/api/auth/refresh', () => jsonResponse(200, sessionBody(user)));
    const client = createApiClient({ fetchFn: mock.fetchFn });
    expect(client.getSession()).toEqual({ status: 'restoring' });

    const [first, second] = await Promise.all([client.restoreSession(), client.restoreSession()]);

    expect([first, second]).toEqual([true, true]);
    expect(mock.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
    expect(client.getSession()).toMatchObject({ status: 'signed-in', user: { email: 'fab@tidewater.example' } });
  });

  it('rejects a response that does not match the schema', async () => {
    const mock = createFetchMock().on('GET', '/api/ping', () => jsonResponse(200, { ok: 'yes' }));
    const client = await signedInClient(mock);

    await expect(client.request('/api/ping', { schema: pingSchema })).rejects.toMatchObject({
      code: 'unexpected_response',
    });
  });

  it('sends extra headers such as If-Match beside the bearer token, and passes a 409 body on', async () => {
    const mock = createFetchMock().on('PUT', '/api/drafts/1', ({ headers }) =>
      headers.get('If-Match') === '"3"'
        ? jsonResponse(200, { ok: true })
        : errorResponse(409, 'conflict', 'Changed by someone else.', { current: { version: 4 } }),
    );
    const client = await signedInClient(mock);

    await expect(
      client.request('/api/drafts/1', { method: 'PUT', body: {}, headers: { 'If-Match': '"3"' }, schema: pingSchema }),
    ).resolves.toEqual({ ok: true });
    const sent = mock.callsTo('PUT', '/api/drafts/1')[0].headers;
    expect([sent.get('If-Match'), sent.get('Authorization')]).toEqual(['"3"', 'Bearer token-1']);

    const stale = client.request('/api/drafts/1', { method: 'PUT', body: {}, headers: { 'If-Match': '"2"' }, schema: pingSchema });
    await expect(stale).rejects.toMatchObject({ status: 409, body: { current: { version: 4 } } });
  });

  it('reads bytes as a blob, refreshing once on 401 like JSON requests', async () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47]);
    const mock = createFetchMock()
      .on('GET', '/api/uploads/u-1/content', ({ headers }) =>
        headers.get('Authorization') === 'Bearer token-2'
          ? new Response(png, { status: 200, headers: { 'Content-Type': 'image/png' } })
          : errorResponse(401, 'unauthorized', 'The access token has expired.'),
      )
      .on('POST', '/api/auth/refresh', () => jsonResponse(200, sessionBody(user, 'token-2')));
    const client = await signedInClient(mock);

    const blob = await client.requestBlob('/api/uploads/u-1/content');

    expect(blob.type).toBe('image/png');
    expect(new Uint8Array(await blob.arrayBuffer())).toEqual(png);
    expect(mock.callsTo('GET', '/api/uploads/u-1/content').map((r) => r.headers.get('Authorization'))).toEqual([
      'Bearer token-1',
      'Bearer token-2',
    ]);
  });

  it('throws the API error of a failed blob request', async () => {
    const mock = createFetchMock().on('GET', '/api/uploads/u-9/content', () => errorResponse(404, 'not_found', 'The upload was not found.'));
    const client = await signedInClient(mock);

    await expect(client.requestBlob('/api/uploads/u-9/content')).rejects.toMatchObject({
      status: 404,
      code: 'not_found',
      message: 'The upload was not found.',
    });
  });

  it('reads the file name the server gave a download', async () => {
    const mock = createFetchMock().on(
      'GET',
      '/api/orders/o-1/export.xlsx',
      () => new Response('xlsx', { status: 200, headers: { 'Content-Disposition': 'attachment; filename="order-sheet.xlsx"' } }),
    );
    const client = await signedInClient(mock);

    const file = await client.requestFile('/api/orders/o-1/export.xlsx');

    expect(file.fileName).toBe('order-sheet.xlsx');
    expect(await file.blob.text()).toBe('xlsx');
  });

  it('reloads the signed-in user (a renamed shop) into the session and tells the listeners', async () => {
    const renamed = { ...user, shop: { ...user.shop, name: 'Renamed Demo Shop' } };
    const mock = createFetchMock().on('GET', '/api/me', () => jsonResponse(200, renamed));
    const client = await signedInClient(mock);
    let notified = 0;
    client.subscribe(() => (notified += 1));

    await client.reloadMe();

    const session = client.getSession();
    expect(session.status === 'signed-in' && session.user.shop.name).toBe('Renamed Demo Shop');
    expect(notified).toBe(1);
  });

  it('lends the Authorization header to a custom request and retries it once after a refresh', async () => {
    const mock = createFetchMock().on('POST', '/api/auth/refresh', () => jsonResponse(200, sessionBody(user, 'token-2')));
    const client = await signedInClient(mock);
    const seen: Record<string, string>[] = [];

    const result = await client.withAuthorization(async (headers) => {
      seen.push(headers);
      return { status: headers.Authorization === 'Bearer token-2' ? 201 : 401 };
    });

    expect(result.status).toBe(201);
    expect(seen).toEqual([{ Authorization: 'Bearer token-1' }, { Authorization: 'Bearer token-2' }]);
  });
});
