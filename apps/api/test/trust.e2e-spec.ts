import { crc32 } from 'node:zlib';
import { PartEntity } from '../src/parts/part.entity.js';
import { approvedCircuit, coolerLineDocument } from './support/approved-circuit.js';
import { createBuild } from './support/builds.js';
import { demoIdLookup, seedCatalogueInto } from './support/demo-catalogue.js';
import { bearer, createTestShop, refreshCookieOf, removeShops, signIn, TEST_PASSWORD, tokenFor, type TestShop } from './support/fixtures.js';
import { pngBytes } from './support/image-bytes.js';
import { startTestApp, type TestApp } from './support/test-app.js';

/** A PNG signature and IHDR (ISO/IEC 15948 §5.2, §11.2.2) declaring any size, with no image data behind it. */
function pngHeaderDeclaring(width: number, height: number): Buffer {
  const data = Buffer.alloc(13);
  data.writeUInt32BE(width, 0);
  data.writeUInt32BE(height, 4);
  data.set([8, 0, 0, 0, 0], 8);
  const typeAndData = Buffer.concat([Buffer.from('IHDR', 'ascii'), data]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(13);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), length, typeAndData, crc]);
}

/** The threat list's overflow, upload, cookie, docs, reset-timing and password cases, each as it was reported. */
describe('trust: bad input costs a clear 400, never a 500 (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let seeded = new Map<string, string>();
  const id = demoIdLookup(() => seeded);
  let fabToken: string;
  let clerkToken: string;
  let reviewerToken: string;
  let buildId: string;
  let circuitId: string;

  beforeAll(async () => {
    testApp = await startTestApp({ TRUST_PROXY: 'loopback' });
    shop = await createTestShop(testApp, 'trust');
    seeded = await seedCatalogueInto(testApp, shop.shop);
    fabToken = await tokenFor(testApp, shop, ['fabricator']);
    clerkToken = await tokenFor(testApp, shop, ['parts-clerk']);
    reviewerToken = await tokenFor(testApp, shop, ['reviewer']);
    buildId = (await createBuild(testApp, fabToken, { vehicle: { make: 'Redfern' } })).id;
    circuitId = (await approvedCircuit(testApp, fabToken, buildId, 'Overflow cooler', coolerLineDocument(id))).id;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
  });

  it('answers a revision number past PostgreSQL integer range (2^31) with 404 or 400, not 500', async () => {
    const revision = await testApp.http().get(`/api/circuits/${circuitId}/revisions/2147483648`).set(bearer(fabToken));
    expect(revision.status).toBe(404);
    const compare = await testApp.http().get(`/api/circuits/${circuitId}/compare?from=99999999999`).set(bearer(reviewerToken));
    expect(compare.status).toBe(400);
    expect(compare.body.issues[0].message).toMatch(/revisions/);
    const cutList = await testApp.http().get(`/api/circuits/${circuitId}/cut-list.xlsx?revision=99999999999`).set(bearer(fabToken));
    expect(cutList.status).toBe(400);
    const version = await testApp.http().patch(`/api/circuits/${circuitId}`).set(bearer(fabToken)).send({ version: 2 ** 40, name: 'x' });
    expect(version.status).toBe(400);
  });

  it('refuses stock changes that overflow numeric(12,3) or round to nothing', async () => {
    const partId = id('demo-hose-6-rubber');
    const adjust = (delta: number) =>
      testApp.http().post(`/api/parts/${partId}/stock-adjustments`).set(bearer(clerkToken)).send({ delta, reason: 'count' });
    await testApp.dataSource.getRepository(PartEntity).update({ id: partId }, { stockOnHand: 999_000_000 });
    const overflow = await adjust(99_999_999).expect(400);
    expect(overflow.body.issues[0].message).toMatch(/cannot exceed/);
    const tiny = await adjust(1e-9).expect(400);
    expect(tiny.body.issues[0].message).toMatch(/at least 0\.001/);
    await adjust(1e300).expect(400);
    await testApp.dataSource.getRepository(PartEntity).update({ id: partId }, { stockOnHand: 0 });
  });

  describe('photo uploads', () => {
    const upload = (bytes: Buffer, fields: Record<string, string> = {}) => {
      const request = testApp.http().post(`/api/builds/${buildId}/uploads`).set(bearer(fabToken));
      for (const [name, value] of Object.entries(fields)) request.field(name, value);
      return request.attach('file', bytes, { filename: 'photo.png', contentType: 'image/png' });
    };

    it('refuses a PNG declaring 4294967295 × 4294967295 px, and one over 50 megapixels, by its header alone', async () => {
      const huge = await upload(pngHeaderDeclaring(4294967295, 4294967295)).expect(400);
      expect(huge.body.message).toMatch(/50 megapixels/);
      await upload(pngHeaderDeclaring(8000, 7000)).expect(400); // 56 MP
      await upload(pngHeaderDeclaring(19_000, 500)).expect(400); // 38:1
      await upload(pngBytes(40, 30)).expect(201);
    });

    it('caps multipart text fields (a 30 MB field is refused, a short one passes)', async () => {
      const response = await upload(pngBytes(4, 4), { note: 'x'.repeat(30 * 1024 * 1024) });
      expect([400, 413]).toContain(response.status);
      expect(response.body.code).toEqual(expect.any(String));
      await upload(pngBytes(4, 4), { note: 'fine' }).expect(201);
    });
  });

  it('marks the refresh cookie Secure when the request came over HTTPS through the trusted proxy', async () => {
    const user = await shop.addUser(['reviewer'], 'https');
    const overHttps = await testApp.http().post('/api/auth/login').set('X-Forwarded-Proto', 'https').send({ email: user.email, password: TEST_PASSWORD }).expect(200);
    const line = (overHttps.headers['set-cookie'] as unknown as string[]).find((cookie) => cookie.startsWith('ls_refresh='));
    expect(line).toMatch(/; Secure/);
    expect(refreshCookieOf(overHttps.headers)).toMatch(/^ls_refresh=/);
    const plain = await signIn(testApp, user.email);
    expect(plain.cookie).toMatch(/^ls_refresh=/);
  });

  it('answers reset requests for known and unknown addresses after the same time (within 60 ms)', async () => {
    const user = await shop.addUser(['fabricator'], 'timing');
    const timed = async (email: string) => {
      const started = process.hrtime.bigint();
      await testApp.http().post('/api/auth/request-reset').send({ email }).expect(202);
      return Number(process.hrtime.bigint() - started) / 1e6;
    };
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 3; i += 1) {
      known.push(await timed(user.email));
      unknown.push(await timed(`nobody.${i}@trust.example`));
    }
    const median = (values: number[]) => [...values].sort((a, b) => a - b)[1];
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(60);
  });

  it('refuses ten spaces and common passwords when an admin creates a user', async () => {
    const admin = await tokenFor(testApp, shop, ['admin']);
    for (const password of ['          ', 'password123', '1234567890']) {
      const refused = await testApp
        .http()
        .post('/api/users')
        .set(bearer(admin))
        .send({ email: `weak.${Date.now()}@trust.example`, displayName: 'Weak', roles: ['fabricator'], password })
        .expect(400);
      expect(refused.body.issues[0].path).toBe('password');
    }
  });
});

describe('production posture (e2e)', () => {
  let production: TestApp;

  beforeAll(async () => {
    production = await startTestApp({ NODE_ENV: 'production' });
  });

  afterAll(async () => {
    await production.close();
  });

  it('serves no API docs in production unless API_DOCS=on', async () => {
    expect((await production.http().get('/api/docs-json')).status).toBe(404);
    expect((await production.http().get('/api/docs')).status).toBe(404);
  });
});
