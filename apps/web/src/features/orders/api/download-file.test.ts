import { afterEach, describe, expect, it, vi } from 'vitest';
import { createApiClient } from '../../../lib/api-client';
import { demoUsers, sessionBody } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { downloadFile } from './download-file';

// Expected behaviour: API contract (bearer token, one refresh on 401, error shape) and RFC 6266 for the file name.
const user = demoUsers['parts-clerk'];
const path = '/api/orders/o-1/export.xlsx';

async function signedInClient(mock: ReturnType<typeof createFetchMock>) {
  mock.on('POST', '/api/auth/login', () => jsonResponse(200, sessionBody(user, 'token-1')));
  const client = createApiClient({ fetchFn: mock.fetchFn });
  await client.signIn(user.email, 'linesmith-demo');
  return client;
}

function stubObjectUrls() {
  const created: Blob[] = [];
  vi.spyOn(URL, 'createObjectURL').mockImplementation((blob) => {
    created.push(blob as Blob);
    return 'blob:linesmith/1';
  });
  vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
  const clicked: string[] = [];
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    clicked.push(this.download);
  });
  return { created, clicked };
}

afterEach(() => {
  vi.restoreAllMocks();
});

describe('downloadFile', () => {
  it('goes through the client: an expired token is refreshed once and the file saved under the server’s name', async () => {
    const mock = createFetchMock()
      .on('GET', path, ({ headers }) =>
        headers.get('Authorization') === 'Bearer token-2'
          ? new Response('sheet bytes', {
              status: 200,
              headers: { 'Content-Disposition': 'attachment; filename="order-demo-supplier-2026-03-02.xlsx"' },
            })
          : errorResponse(401, 'unauthorized', 'The access token has expired.'),
      )
      .on('POST', '/api/auth/refresh', () => jsonResponse(200, sessionBody(user, 'token-2')));
    const client = await signedInClient(mock);
    const { created, clicked } = stubObjectUrls();

    const name = await downloadFile(client, path, 'order-o-1.xlsx');

    expect(name).toBe('order-demo-supplier-2026-03-02.xlsx');
    expect(mock.callsTo('GET', path).map((r) => r.headers.get('Authorization'))).toEqual(['Bearer token-1', 'Bearer token-2']);
    expect(mock.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
    expect(clicked).toEqual(['order-demo-supplier-2026-03-02.xlsx']);
    expect(await created[0].text()).toBe('sheet bytes');
    expect(document.querySelector('a[download]')).toBeNull();
  });

  it('uses the fallback name when the server names no file', async () => {
    const mock = createFetchMock().on('GET', path, () => new Response('sheet bytes', { status: 200 }));
    const client = await signedInClient(mock);
    const { clicked } = stubObjectUrls();

    await expect(downloadFile(client, path, 'order-o-1.xlsx')).resolves.toBe('order-o-1.xlsx');
    expect(clicked).toEqual(['order-o-1.xlsx']);
  });

  it('ends the session and throws when the refresh fails, saving nothing', async () => {
    const mock = createFetchMock()
      .on('GET', path, () => errorResponse(401, 'unauthorized', 'The access token has expired.'))
      .on('POST', '/api/auth/refresh', () => errorResponse(401, 'unauthorized', 'The refresh token was revoked.'));
    const client = await signedInClient(mock);
    const { clicked } = stubObjectUrls();

    await expect(downloadFile(client, path, 'order-o-1.xlsx')).rejects.toMatchObject({ status: 401 });
    expect(client.getSession()).toEqual({ status: 'signed-out', reason: 'expired' });
    expect(clicked).toEqual([]);
  });
});
