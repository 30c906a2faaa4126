import { randomUUID } from 'node:crypto';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { FakeSmtp } from '../src/mail/fake-smtp-server.js';
import { PartEntity } from '../src/parts/part.entity.js';
import { ROLES, type Role } from '../src/users/role.js';
import { CALLERS, EXPECTED_ACCESS, type Caller, type Outcome } from './access-matrix.expected.js';
import { approvedCircuit, coolerLineDocument } from './support/approved-circuit.js';
import { createBuild, createCircuit } from './support/builds.js';
import { seedCatalogueInto } from './support/demo-catalogue.js';
import { startTestSmtp } from './support/fake-smtp.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { pngBytes } from './support/image-bytes.js';
import { registeredRoutes } from './support/routes.js';
import { startTestApp, type TestApp } from './support/test-app.js';

interface ApiRequest {
  params?: Record<string, string>;
  query?: string;
  body?: unknown;
  headers?: Record<string, string>;
  file?: { field: string; bytes: Buffer; filename: string; contentType: string };
  fields?: Record<string, string>;
}

interface Fixture {
  as: (token: string) => Record<string, string>;
  adminToken: string;
  fabToken: string;
  clerkToken: string;
  buildId: string;
  circuitId: string;
  approvedCircuitId: string;
  submitCircuitId: string;
  reviewCircuitId: string;
  partId: string;
  supplierId: string;
  orderId: string;
  orderLineId: string;
  uploadId: string;
  spareUserId: string;
  document: unknown;
}

/** The current `version` of a record, read as the shop's admin, so writes carry a fresh one. */
async function versionOf(testApp: TestApp, fx: Fixture, path: string): Promise<number> {
  const response = await testApp.http().get(path).set(fx.as(fx.adminToken)).expect(200);
  return (response.body as { version: number }).version;
}

async function freshPart(testApp: TestApp, fx: Fixture): Promise<string> {
  const response = await testApp
    .http()
    .post('/api/parts')
    .set(fx.as(fx.clerkToken))
    .send({
      kind: 'clamp',
      supplierId: fx.supplierId,
      supplierPartNumber: `ACCESS-${randomUUID().slice(0, 8)}`,
      description: 'Cushion clamp for hose OD 0.45–0.52 in',
      priceCents: 990,
      saleUnit: { type: 'pack', size: 10 },
      attributes: { fitsOd: { minIn: 0.45, maxIn: 0.52 } },
    })
    .expect(201);
  return response.body.id as string;
}

function photo(name = 'bay.png'): ApiRequest['file'] {
  return { field: 'file', bytes: pngBytes(4, 3), filename: name, contentType: 'image/png' };
}

type RequestBuilder = (testApp: TestApp, fx: Fixture) => ApiRequest | Promise<ApiRequest>;

/**
 * How to call each route: real ids of the owning shop's fixture and a minimal body. Routes that
 * delete get a record made for that one call, so every caller meets an existing row.
 */
const REQUESTS: Record<string, RequestBuilder> = {
  'GET /api/health': () => ({}),
  'GET /api/docs': () => ({}),
  'GET /api/docs-json': () => ({}),
  'GET /api/docs-yaml': () => ({}),
  'GET /api/docs/': () => ({}),
  'GET /api/docs/index.html': () => ({}),
  'GET /api/docs/swagger-ui-init.js': () => ({}),
  'GET /api/docs/docs/swagger-ui-init.js': () => ({}),
  'GET /api/docs/LICENSE': () => ({}),
  'ALL /api{/*splat}': () => ({ params: { splat: 'no-such-route' } }),
  'POST /api/auth/login': () => ({ body: {} }),
  'POST /api/auth/refresh': () => ({}),
  'POST /api/auth/logout': () => ({}),
  'POST /api/auth/accept-invite': () => ({ body: {} }),
  'POST /api/auth/request-reset': () => ({ body: {} }),
  'POST /api/auth/reset-password': () => ({ body: {} }),

  'GET /api/me': () => ({}),
  'GET /api/users': () => ({}),
  'POST /api/users': () => ({ body: {} }),
  'PATCH /api/users/:id': async (testApp, fx) => {
    const users = await testApp.http().get('/api/users?pageSize=200').set(fx.as(fx.adminToken)).expect(200);
    const spare = (users.body.items as Array<{ id: string; version: number }>).find((user) => user.id === fx.spareUserId);
    return { params: { id: fx.spareUserId }, body: { version: spare?.version } };
  },
  'POST /api/users/invite': () => ({ body: {} }),
  'GET /api/outbox': () => ({}),

  'GET /api/shop': () => ({}),
  'PATCH /api/shop': async (testApp, fx) => ({ body: { version: await versionOf(testApp, fx, '/api/shop') } }),
  'GET /api/shop-rules': () => ({}),
  'PUT /api/shop-rules': () => ({ body: {} }),

  'GET /api/builds': () => ({}),
  'POST /api/builds': () => ({ body: { vehicle: { make: 'Access' } } }),
  'GET /api/builds/:id': (_, fx) => ({ params: { id: fx.buildId } }),
  'PATCH /api/builds/:id': async (testApp, fx) => ({
    params: { id: fx.buildId },
    body: { version: await versionOf(testApp, fx, `/api/builds/${fx.buildId}`) },
  }),
  'GET /api/builds/:buildId/circuits': (_, fx) => ({ params: { buildId: fx.buildId } }),
  'POST /api/builds/:buildId/circuits': (_, fx) => ({ params: { buildId: fx.buildId }, body: { kind: 'fuel' } }),
  'GET /api/builds/:buildId/uploads': (_, fx) => ({ params: { buildId: fx.buildId } }),
  'POST /api/builds/:buildId/uploads': (_, fx) => ({ params: { buildId: fx.buildId }, file: photo() }),
  'GET /api/uploads/:id/content': (_, fx) => ({ params: { id: fx.uploadId } }),
  'DELETE /api/uploads/:id': async (testApp, fx) => {
    const upload = photo('throwaway.png')!;
    const response = await testApp
      .http()
      .post(`/api/builds/${fx.buildId}/uploads`)
      .set(fx.as(fx.fabToken))
      .attach('file', upload.bytes, { filename: upload.filename, contentType: upload.contentType })
      .expect(201);
    return { params: { id: response.body.id } };
  },

  'GET /api/circuits/:id': (_, fx) => ({ params: { id: fx.circuitId } }),
  'PATCH /api/circuits/:id': async (testApp, fx) => ({
    params: { id: fx.circuitId },
    body: { version: await versionOf(testApp, fx, `/api/circuits/${fx.circuitId}`) },
  }),
  'DELETE /api/circuits/:id': async (testApp, fx) => ({
    params: { id: (await createCircuit(testApp, fx.fabToken, fx.buildId, { kind: 'fuel' })).id },
  }),
  'GET /api/circuits/:id/draft': (_, fx) => ({ params: { id: fx.circuitId } }),
  'PUT /api/circuits/:id/draft': async (testApp, fx) => {
    const draft = await testApp.http().get(`/api/circuits/${fx.circuitId}/draft`).set(fx.as(fx.adminToken)).expect(200);
    return { params: { id: fx.circuitId }, headers: { 'If-Match': String(draft.body.draftVersion) }, body: fx.document };
  },
  'GET /api/circuits/:id/revisions': (_, fx) => ({ params: { id: fx.circuitId } }),
  'GET /api/circuits/:id/revisions/:number': (_, fx) => ({ params: { id: fx.circuitId, number: '1' } }),
  'POST /api/circuits/:id/revisions': (_, fx) => ({ params: { id: fx.circuitId }, body: {} }),
  'GET /api/circuits/:id/check': (_, fx) => ({ params: { id: fx.circuitId } }),
  'GET /api/circuits/:id/audit': (_, fx) => ({ params: { id: fx.circuitId } }),
  'GET /api/circuits/:id/cut-list.xlsx': (_, fx) => ({ params: { id: fx.approvedCircuitId } }),
  'POST /api/circuits/:id/submit': (_, fx) => ({ params: { id: fx.submitCircuitId }, body: {} }),
  'GET /api/circuits/:id/review': (_, fx) => ({ params: { id: fx.reviewCircuitId } }),
  'POST /api/circuits/:id/review/acknowledgements': (_, fx) => ({
    params: { id: fx.reviewCircuitId },
    body: { flagKey: 'no-such-caution', note: 'checked on the vehicle' },
  }),
  'POST /api/circuits/:id/review/approve': (_, fx) => ({ params: { id: fx.reviewCircuitId }, body: {} }),
  'POST /api/circuits/:id/review/return': (_, fx) => ({ params: { id: fx.reviewCircuitId }, body: { comments: 'move the clamp' } }),
  'GET /api/circuits/:id/compare': (_, fx) => ({ params: { id: fx.circuitId }, query: 'from=1&to=draft' }),
  'GET /api/reviews': () => ({}),

  'POST /api/rules/evaluate': (_, fx) => ({ body: fx.document }),
  'GET /api/reference/families': () => ({}),
  'GET /api/reference/threads': () => ({}),
  'POST /api/reference/identify': () => ({ body: {} }),
  'POST /api/reference/mate': () => ({ body: {} }),
  'POST /api/reference/adapters': () => ({ body: {} }),
  'GET /api/reference/rules': () => ({}),

  'GET /api/parts': () => ({}),
  'POST /api/parts': (_, fx) => ({
    body: {
      kind: 'clamp',
      supplierId: fx.supplierId,
      supplierPartNumber: `ACCESS-${randomUUID().slice(0, 8)}`,
      description: 'Cushion clamp for hose OD 0.45–0.52 in',
      priceCents: 990,
      saleUnit: { type: 'pack', size: 10 },
      attributes: { fitsOd: { minIn: 0.45, maxIn: 0.52 } },
    },
  }),
  'GET /api/parts/:id': (_, fx) => ({ params: { id: fx.partId } }),
  'PATCH /api/parts/:id': async (testApp, fx) => ({
    params: { id: fx.partId },
    body: { version: await versionOf(testApp, fx, `/api/parts/${fx.partId}`) },
  }),
  'DELETE /api/parts/:id': async (testApp, fx) => ({ params: { id: await freshPart(testApp, fx) } }),
  'GET /api/parts/:id/stock-adjustments': (_, fx) => ({ params: { id: fx.partId } }),
  'POST /api/parts/:id/stock-adjustments': (_, fx) => ({ params: { id: fx.partId }, body: { delta: 1, reason: 'count' } }),
  'GET /api/suppliers': () => ({}),
  'POST /api/suppliers': () => ({ body: { name: `Access supplier ${randomUUID().slice(0, 8)}` } }),
  'PATCH /api/suppliers/:id': async (testApp, fx) => {
    const suppliers = await testApp.http().get('/api/suppliers').set(fx.as(fx.adminToken)).expect(200);
    const supplier = (suppliers.body as Array<{ id: string; version: number }>).find((row) => row.id === fx.supplierId);
    return { params: { id: fx.supplierId }, body: { version: supplier?.version } };
  },
  'POST /api/price-lists/preview': (_, fx) => ({
    fields: { supplierId: fx.supplierId },
    file: { field: 'file', bytes: Buffer.from('Part No,Price\n'), filename: 'prices.csv', contentType: 'text/csv' },
  }),
  'POST /api/price-lists/commit': (_, fx) => ({
    fields: { supplierId: fx.supplierId },
    file: { field: 'file', bytes: Buffer.from('Part No,Price\n'), filename: 'prices.csv', contentType: 'text/csv' },
  }),

  'POST /api/orders/draft': (_, fx) => ({ body: { circuitIds: [fx.approvedCircuitId] } }),
  'GET /api/orders': () => ({}),
  'GET /api/orders/:id': (_, fx) => ({ params: { id: fx.orderId } }),
  'GET /api/orders/:id/export.xlsx': (_, fx) => ({ params: { id: fx.orderId } }),
  'POST /api/orders/:id/send': (_, fx) => ({ params: { id: fx.orderId } }),
  'POST /api/orders/:id/receive': (_, fx) => ({ params: { id: fx.orderId }, body: { lines: [{ orderLineId: fx.orderLineId, quantity: 1 }] } }),
};

function outcomeOf(status: number): Outcome | 'server-error' {
  if (status >= 500) return 'server-error';
  if (status === 401) return 'unauthenticated';
  if (status === 403) return 'forbidden';
  if (status === 404) return 'not-found-for-other-shop';
  return 'allowed';
}

describe('access matrix: every route × every role, another shop and no token (e2e)', () => {
  let smtp: FakeSmtp;
  let storageDir: string;
  let testApp: TestApp;
  let shop: TestShop;
  let other: TestShop;
  let fx: Fixture;
  const tokens = new Map<Caller, string>();

  beforeAll(async () => {
    smtp = await startTestSmtp();
    storageDir = await mkdtemp(join(tmpdir(), 'linesmith-access-'));
    testApp = await startTestApp({ SMTP_PORT: String(smtp.port), STORAGE_DRIVER: 'local', STORAGE_DIR: storageDir });
    shop = await createTestShop(testApp, 'access');
    other = await createTestShop(testApp, 'access-other');
    const ids = await seedCatalogueInto(testApp, shop.shop);
    const id = (demoId: string) => ids.get(demoId) ?? '';
    for (const role of ROLES) tokens.set(role, (await signIn(testApp, (await shop.addUser([role])).email)).accessToken);
    tokens.set('other-shop', (await signIn(testApp, (await other.addUser([...ROLES], 'all-roles')).email)).accessToken);
    const spare = await shop.addUser(['reviewer'], 'spare');

    const as = (token: string) => ({ Authorization: `Bearer ${token}` });
    const token = (role: Role) => tokens.get(role) ?? '';
    const document = coolerLineDocument(id, [10, 20]);
    const buildId = (await createBuild(testApp, token('fabricator'), { vehicle: { make: 'Redfern' } })).id;

    const circuit = await createCircuit(testApp, token('fabricator'), buildId, { kind: 'transmission-cooler', name: 'Cooler' });
    await testApp.http().put(`/api/circuits/${circuit.id}/draft`).set(as(token('fabricator'))).set('If-Match', '1').send(document).expect(200);
    await testApp.http().post(`/api/circuits/${circuit.id}/revisions`).set(as(token('fabricator'))).send({}).expect(201);

    const submitCircuit = await createCircuit(testApp, token('fabricator'), buildId, { kind: 'transmission-cooler', name: 'To submit' });
    await testApp.http().put(`/api/circuits/${submitCircuit.id}/draft`).set(as(token('fabricator'))).set('If-Match', '1').send(document).expect(200);
    const reviewCircuit = await createCircuit(testApp, token('fabricator'), buildId, { kind: 'transmission-cooler', name: 'In review' });
    await testApp.http().put(`/api/circuits/${reviewCircuit.id}/draft`).set(as(token('fabricator'))).set('If-Match', '1').send(document).expect(200);
    await testApp.http().post(`/api/circuits/${reviewCircuit.id}/submit`).set(as(token('fabricator'))).send({}).expect(200);

    // Nothing on the shelf, so drafting orders for the approved circuit buys every part.
    await testApp.dataSource.getRepository(PartEntity).update({ shopId: shop.shop.id }, { stockOnHand: 0 });
    const approved = await approvedCircuit(testApp, token('fabricator'), buildId, 'Approved cooler', document);
    const drafted = await testApp
      .http()
      .post('/api/orders/draft')
      .set(as(token('parts-clerk')))
      .send({ circuitIds: [approved.id] })
      .expect(201);
    const order = drafted.body.orders[0] as { id: string; supplierId: string; lines: Array<{ id: string }> };
    const upload = await testApp
      .http()
      .post(`/api/builds/${buildId}/uploads`)
      .set(as(token('fabricator')))
      .attach('file', pngBytes(5, 5), { filename: 'bay.png', contentType: 'image/png' })
      .expect(201);

    fx = {
      as,
      adminToken: token('admin'),
      fabToken: token('fabricator'),
      clerkToken: token('parts-clerk'),
      buildId,
      circuitId: circuit.id,
      approvedCircuitId: approved.id,
      submitCircuitId: submitCircuit.id,
      reviewCircuitId: reviewCircuit.id,
      partId: id('demo-hose-6-rubber'),
      supplierId: order.supplierId,
      orderId: order.id,
      orderLineId: order.lines[0].id,
      uploadId: upload.body.id,
      spareUserId: spare.id,
      document,
    };
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop, other]);
    await testApp.close();
    await smtp.close();
    await rm(storageDir, { recursive: true, force: true });
  });

  it('has an expected outcome and a request for every route of the API, and no stale entries', () => {
    const routes = registeredRoutes(testApp);
    expect(routes.length).toBeGreaterThan(50);
    const missing = routes.filter((route) => !(route in EXPECTED_ACCESS)).map((route) => `${route} is not in access-matrix.expected.ts`);
    const stale = Object.keys(EXPECTED_ACCESS)
      .filter((route) => !routes.includes(route))
      .map((route) => `${route} is in access-matrix.expected.ts but no longer in the API`);
    const noRequest = routes.filter((route) => !(route in REQUESTS)).map((route) => `${route} has no request in access-matrix.e2e-spec.ts`);
    expect([...missing, ...stale, ...noRequest]).toEqual([]);
  });

  it('answers every route with the expected outcome for every caller', async () => {
    const mismatches: string[] = [];
    const failedSuccesses: string[] = [];
    for (const route of registeredRoutes(testApp)) {
      const expected = EXPECTED_ACCESS[route];
      const build = REQUESTS[route];
      if (!expected || !build) continue; // reported by the test above
      const [method, pathPattern] = route.split(' ');
      let firstAllowed = true;
      for (const caller of CALLERS) {
        const spec = await build(testApp, fx);
        const path = pathPattern
          .replace('{/*splat}', '/:splat')
          .replace(/:(\w+)/g, (_, name: string) => spec.params?.[name] ?? `missing-${name}`);
        let call = testApp.http()[(method === 'ALL' ? 'get' : method.toLowerCase()) as 'get'](spec.query ? `${path}?${spec.query}` : path);
        const token = tokens.get(caller);
        if (token) call = call.set('Authorization', `Bearer ${token}`);
        for (const [name, value] of Object.entries(spec.headers ?? {})) call = call.set(name, value);
        if (spec.file || spec.fields) {
          for (const [name, value] of Object.entries(spec.fields ?? {})) call = call.field(name, value);
          if (spec.file) call = call.attach(spec.file.field, spec.file.bytes, { filename: spec.file.filename, contentType: spec.file.contentType });
        } else if (spec.body !== undefined) {
          call = call.send(spec.body as object);
        }
        const response = await call;
        const actual = outcomeOf(response.status);
        const unknownRoute = actual === 'not-found-for-other-shop' && expected.outcomes[caller] === 'not-found';
        if (actual !== expected.outcomes[caller] && !unknownRoute) {
          mismatches.push(`${route} as ${caller}: expected ${expected.outcomes[caller]}, got ${response.status} ${JSON.stringify(response.body).slice(0, 160)}`);
        }
        // The success check is for the owning shop (the other shop's user sends shop A's ids).
        if (expected.outcomes[caller] === 'allowed' && caller !== 'other-shop' && firstAllowed) {
          firstAllowed = false;
          if (expected.succeeds && (response.status < 200 || response.status > 299)) {
            failedSuccesses.push(`${route} as ${caller}: expected 2xx, got ${response.status} ${JSON.stringify(response.body).slice(0, 160)}`);
          }
        }
      }
    }
    expect(mismatches).toEqual([]);
    expect(failedSuccesses).toEqual([]);
  }, 120_000);
});
