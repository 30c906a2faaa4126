import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createHash } from 'node:crypto';
import { createBuild, createCircuit } from './support/builds.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { jpegWithOrientation, pngBytes } from './support/image-bytes.js';
import { startTestApp, type TestApp } from './support/test-app.js';

const MB = 1024 * 1024;

describe('build photos (e2e)', () => {
  let testApp: TestApp;
  let storageDir: string;
  let shopA: TestShop;
  let shopB: TestShop;
  let fabA: string;
  let fabAUserId: string;
  let clerkA: string;
  let fabB: string;
  let buildId: string;

  beforeAll(async () => {
    storageDir = await mkdtemp(join(tmpdir(), 'linesmith-uploads-'));
    testApp = await startTestApp({ STORAGE_DRIVER: 'local', STORAGE_DIR: storageDir });
    shopA = await createTestShop(testApp, 'uploads-a');
    shopB = await createTestShop(testApp, 'uploads-b');
    const fabAUser = await shopA.addUser(['fabricator']);
    fabAUserId = fabAUser.id;
    fabA = (await signIn(testApp, fabAUser.email)).accessToken;
    clerkA = (await signIn(testApp, (await shopA.addUser(['parts-clerk'])).email)).accessToken;
    fabB = (await signIn(testApp, (await shopB.addUser(['fabricator'])).email)).accessToken;
    buildId = (await createBuild(testApp, fabA, { vehicle: { make: 'Redfern' } })).id;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shopA, shopB]);
    await testApp.close();
    await rm(storageDir, { recursive: true, force: true });
  });

  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const upload = (token: string, bytes: Buffer, filename: string, contentType: string, build = buildId) =>
    testApp.http().post(`/api/builds/${build}/uploads`).set(as(token)).attach('file', bytes, { filename, contentType });

  it('stores a PNG: sniffed type, size, SHA-256, dimensions, sanitised name', async () => {
    const bytes = pngBytes(7, 5);
    const response = await upload(fabA, bytes, '../../engine bay/left side.png', 'image/png').expect(201);
    expect(response.body).toMatchObject({
      buildId,
      kind: 'photo',
      fileName: 'left side.png',
      mimeType: 'image/png',
      sizeBytes: bytes.length,
      sha256: createHash('sha256').update(bytes).digest('hex'),
      widthPx: 7,
      heightPx: 5,
      uploadedById: fabAUserId,
      contentUrl: `/api/uploads/${response.body.id}/content`,
    });
    expect(response.body).not.toHaveProperty('storageKey');
    // Stored under <dir>/<shop id>/<uuid>: nothing the sender typed.
    const stored = await readdir(join(storageDir, shopA.shop.id));
    expect(stored).toHaveLength(1);
    expect(stored[0]).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('keeps a UTF-8 file name intact', async () => {
    const response = await upload(fabA, pngBytes(2, 2), 'kühler – vorne.png', 'image/png').expect(201);
    expect(response.body.fileName).toBe('kühler – vorne.png');
  });

  it('reports the displayed size of a JPEG turned by EXIF orientation 6 (width and height swapped)', async () => {
    const turned = await upload(fabA, jpegWithOrientation(640, 480, 6), 'bay.jpg', 'image/jpeg').expect(201);
    expect(turned.body).toMatchObject({ mimeType: 'image/jpeg', widthPx: 480, heightPx: 640 });
    const upright = await upload(fabA, jpegWithOrientation(640, 480, 1), 'bay.jpeg', 'image/jpeg').expect(201);
    expect(upright.body).toMatchObject({ widthPx: 640, heightPx: 480 });
  });

  it('refuses empty, oversized, mislabelled and lying files with clear messages', async () => {
    const empty = await upload(fabA, Buffer.alloc(0), 'empty.jpg', 'image/jpeg').expect(400);
    expect(empty.body.message).toMatch(/empty/);

    const tooLarge = Buffer.concat([pngBytes(4, 4), Buffer.alloc(15 * MB)]);
    const large = await upload(fabA, tooLarge, 'huge.png', 'image/png').expect(413);
    expect(large.body).toMatchObject({ code: 'payload_too_large', message: expect.stringMatching(/15 MB/) });

    const text = await upload(fabA, Buffer.from('not a photo at all\n'), 'notes.jpg', 'image/jpeg').expect(400);
    expect(text.body.message).toMatch(/not a JPEG, PNG or WebP/);

    const lyingHeader = await upload(fabA, pngBytes(3, 3), 'photo.png', 'image/jpeg').expect(400);
    expect(lyingHeader.body.message).toMatch(/sent as image\/jpeg but its contents are image\/png/);

    const lyingName = await upload(fabA, pngBytes(3, 3), 'photo.jpg', 'image/png').expect(400);
    expect(lyingName.body.message).toMatch(/named \.jpg but its contents are image\/png/);

    const missing = await testApp.http().post(`/api/builds/${buildId}/uploads`).set(as(fabA)).field('x', 'y').expect(400);
    expect(missing.body.issues[0].path).toBe('file');

    await upload(clerkA, pngBytes(2, 2), 'p.png', 'image/png').expect(403);
  });

  it('serves the bytes only to the owning shop, privately cached; lists; deletes', async () => {
    const bytes = pngBytes(9, 9);
    const created = await upload(fabA, bytes, 'serve.png', 'image/png').expect(201);
    const content = await testApp
      .http()
      .get(created.body.contentUrl)
      .set(as(clerkA))
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(content.headers['content-type']).toBe('image/png');
    expect(content.headers['cache-control']).toMatch(/^private/);
    expect(content.headers['content-length']).toBe(String(bytes.length));
    expect((content.body as Buffer).equals(bytes)).toBe(true);

    await testApp.http().get(created.body.contentUrl).set(as(fabB)).expect(404);
    await testApp.http().get(created.body.contentUrl).expect(401);
    await testApp.http().get(`/api/builds/${buildId}/uploads`).set(as(fabB)).expect(404);
    await testApp.http().delete(`/api/uploads/${created.body.id}`).set(as(fabB)).expect(404);

    const list = await testApp.http().get(`/api/builds/${buildId}/uploads`).set(as(clerkA)).expect(200);
    expect(list.body.map((item: { id: string }) => item.id)).toContain(created.body.id);

    const before = (await readdir(join(storageDir, shopA.shop.id))).length;
    await testApp.http().delete(`/api/uploads/${created.body.id}`).set(as(fabA)).expect(204);
    await testApp.http().get(created.body.contentUrl).set(as(fabA)).expect(404);
    expect((await readdir(join(storageDir, shopA.shop.id))).length).toBe(before - 1);
  });

  it('uses a photo of the same build as sketch background, and will not delete it while in use', async () => {
    const photo = await upload(fabA, pngBytes(8, 6), 'bg.png', 'image/png').expect(201);
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'fuel', name: 'Feed' });
    const draft = (await testApp.http().get(`/api/circuits/${circuit.id}/draft`).set(as(fabA)).expect(200)).body.document;
    const withBackground = { ...draft, background: { uploadId: photo.body.id, opacity: 0.6, locked: true } };
    await testApp.http().put(`/api/circuits/${circuit.id}/draft`).set(as(fabA)).set('If-Match', '1').send(withBackground).expect(200);

    const inUse = await testApp.http().delete(`/api/uploads/${photo.body.id}`).set(as(fabA)).expect(409);
    expect(inUse.body.message).toMatch(/"Feed"/);

    const otherBuild = await createBuild(testApp, fabA, { vehicle: { make: 'Other' } });
    const foreign = await upload(fabA, pngBytes(2, 2), 'other.png', 'image/png', otherBuild.id).expect(201);
    const refused = await testApp
      .http()
      .put(`/api/circuits/${circuit.id}/draft`)
      .set(as(fabA))
      .set('If-Match', '2')
      .send({ ...draft, background: { uploadId: foreign.body.id, opacity: 1, locked: false } })
      .expect(400);
    expect(refused.body.issues[0].path).toBe('background.uploadId');
  });
});
