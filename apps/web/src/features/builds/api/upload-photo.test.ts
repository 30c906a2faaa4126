import { afterEach, describe, expect, it, vi } from 'vitest';
import { demoUsers, sessionBody } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { createApiClient } from '../../../lib/api-client';
import { uploadPhoto } from './upload-photo';

// Expected behaviour: the uploads contract (`POST /api/builds/:buildId/uploads`, multipart field
// `file`, bearer token; errors in the API's `{ statusCode, code, message, issues }` shape).
const stored = {
  id: 'up-1',
  buildId: 'b-1',
  kind: 'photo',
  fileName: 'engine-bay.jpg',
  mimeType: 'image/jpeg',
  sizeBytes: 4,
  widthPx: 4032,
  heightPx: 3024,
  uploadedById: 'u-fab',
  createdAt: '2026-01-06T10:00:00.000Z',
};

interface Sent {
  url: string;
  headers: Record<string, string>;
  body: FormData;
}

/** A scripted XMLHttpRequest: each send answers the next scripted reply after two progress events. */
function fakeXhr(replies: { status: number; body: unknown }[]) {
  const sent: Sent[] = [];
  class FakeXhr {
    upload: { onprogress: ((e: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = { onprogress: null };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    onabort: (() => void) | null = null;
    withCredentials = false;
    status = 0;
    responseText = '';
    private url = '';
    private headers: Record<string, string> = {};
    open(_method: string, url: string) {
      this.url = url;
    }
    setRequestHeader(name: string, value: string) {
      this.headers[name] = value;
    }
    abort() {
      this.onabort?.();
    }
    send(body: FormData) {
      sent.push({ url: this.url, headers: this.headers, body });
      const reply = replies.shift()!;
      queueMicrotask(() => {
        this.upload.onprogress?.({ lengthComputable: true, loaded: 1, total: 4 });
        this.upload.onprogress?.({ lengthComputable: true, loaded: 4, total: 4 });
        this.status = reply.status;
        this.responseText = JSON.stringify(reply.body);
        this.onload?.();
      });
    }
  }
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  return sent;
}

async function signedInClient(mock = createFetchMock()) {
  let token = 0;
  mock
    .on('POST', '/api/auth/login', () => jsonResponse(200, sessionBody(demoUsers.fabricator, `token-${(token += 1)}`)))
    .on('POST', '/api/auth/refresh', () => jsonResponse(200, sessionBody(demoUsers.fabricator, `token-${(token += 1)}`)))
    .on('GET', '/api/me', ({ headers }) =>
      headers.get('Authorization') === 'Bearer token-1'
        ? jsonResponse(401, { statusCode: 401, code: 'unauthorized', message: 'Expired.', issues: [] })
        : jsonResponse(200, demoUsers.fabricator),
    );
  const client = createApiClient({ fetchFn: mock.fetchFn });
  await client.signIn(demoUsers.fabricator.email, 'linesmith-demo');
  return client;
}

const photo = () => new File([new Uint8Array([0xff, 0xd8, 0xff, 0xd9])], 'engine-bay.jpg', { type: 'image/jpeg' });

afterEach(() => vi.unstubAllGlobals());

describe('photo upload', () => {
  it('sends the file in the `file` field with the bearer token and reports progress', async () => {
    const sent = fakeXhr([{ status: 201, body: stored }]);
    const progress: number[] = [];
    const upload = await uploadPhoto({ client: await signedInClient(), buildId: 'b-1', file: photo(), onProgress: (f) => progress.push(f) });

    expect(sent).toHaveLength(1);
    expect(sent[0].url).toBe('/api/builds/b-1/uploads');
    expect(sent[0].headers.Authorization).toBe('Bearer token-1');
    expect((sent[0].body.get('file') as File).name).toBe('engine-bay.jpg');
    expect(progress).toEqual([0.25, 1, 1]);
    expect(upload).toMatchObject({ id: 'up-1', widthPx: 4032, heightPx: 3024 });
  });

  it('renews an expired token once and sends again', async () => {
    const sent = fakeXhr([
      { status: 401, body: { statusCode: 401, code: 'unauthorized', message: 'Expired.', issues: [] } },
      { status: 201, body: stored },
    ]);
    await uploadPhoto({ client: await signedInClient(), buildId: 'b-1', file: photo(), onProgress: () => {} });
    expect(sent.map((s) => s.headers.Authorization)).toEqual(['Bearer token-1', 'Bearer token-2']);
  });

  it("passes the server's reason on, e.g. a file whose bytes are not an image", async () => {
    fakeXhr([{ status: 400, body: { statusCode: 400, code: 'validation_failed', message: 'engine-bay.jpg is not a JPEG, PNG or WebP image.', issues: [] } }]);
    await expect(
      uploadPhoto({ client: await signedInClient(), buildId: 'b-1', file: photo(), onProgress: () => {} }),
    ).rejects.toMatchObject({ status: 400, message: 'engine-bay.jpg is not a JPEG, PNG or WebP image.' });
  });
});
