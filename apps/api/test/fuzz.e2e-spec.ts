import fc from 'fast-check';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Response } from 'supertest';
import { ROLES } from '../src/users/role.js';
import { coolerLineDocument } from './support/approved-circuit.js';
import { createBuild, createCircuit } from './support/builds.js';
import { seedCatalogueInto } from './support/demo-catalogue.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { pngBytes } from './support/image-bytes.js';
import { registeredRoutes } from './support/routes.js';
import { startTestApp, type TestApp } from './support/test-app.js';

/**
 * Property: whatever a client sends, the API never answers 5xx, and every refusal is a 4xx the
 * contract names, in the error shape `{ statusCode, code, message, issues }` with a path on each
 * validation issue. FUZZ_RUNS (default 10,000) generated requests in all, across every route;
 * FUZZ_SEED replays a failing run.
 */
const TOTAL_RUNS = Number(process.env.FUZZ_RUNS ?? 10_000);
const SEED = Number(process.env.FUZZ_SEED ?? 20_261_202);
const share = (fraction: number) => Math.max(1, Math.round(TOTAL_RUNS * fraction));

const REFUSALS = [400, 409, 413, 415, 428];

/** Random ids and paths may also name nothing (404), hit a role boundary (403) or a limit (429). */
const ANY_ROUTE_REFUSALS = [...REFUSALS, 401, 403, 404, 429];

function expectContractAnswer(response: Response, context: string, refusals: number[] = REFUSALS): void {
  const where = `${context} → ${response.status} ${JSON.stringify(response.body).slice(0, 300)}`;
  if (response.status >= 500) throw new Error(`server error: ${where}`);
  if (response.status < 400) return;
  if (!refusals.includes(response.status)) throw new Error(`unexpected refusal: ${where}`);
  const body = response.body as { statusCode?: unknown; code?: unknown; message?: unknown; issues?: unknown };
  const shaped =
    body.statusCode === response.status &&
    typeof body.code === 'string' &&
    typeof body.message === 'string' &&
    Array.isArray(body.issues) &&
    (body.issues as Array<{ path?: unknown; message?: unknown }>).every((issue) => typeof issue.path === 'string' && typeof issue.message === 'string');
  if (!shaped) throw new Error(`not the error shape: ${where}`);
  if (body.code === 'validation_failed' && (body.issues as unknown[]).length === 0) throw new Error(`validation error without issues: ${where}`);
}

/** Runs a property with the shared seed; the seed is in the message of any failure. */
async function check<T>(name: string, arbitrary: fc.Arbitrary<T>, numRuns: number, predicate: (value: T) => Promise<void>) {
  try {
    await fc.assert(fc.asyncProperty(arbitrary, predicate), { seed: SEED, numRuns, endOnFailure: true });
  } catch (error) {
    const cause = (error as Error).cause instanceof Error ? `\n${((error as Error).cause as Error).stack}` : '';
    throw new Error(`${name} failed with FUZZ_SEED=${SEED} FUZZ_RUNS=${TOTAL_RUNS}\n${(error as Error).message}${cause}`);
  }
}

// ---- mutations of a circuit document ----

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every path to a value inside `value` (objects and arrays), root excluded. */
function pathsOf(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== 'object') return [];
  const entries: [string | number, Json][] = Array.isArray(value) ? value.map((item, index) => [index, item]) : Object.entries(value);
  return entries.flatMap(([key, child]) => [[...prefix, key], ...pathsOf(child, [...prefix, key])]);
}

function parentOf(root: Json, path: (string | number)[]): { parent: Record<string | number, Json>; key: string | number } {
  let node = root as Record<string | number, Json>;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, Json>;
  return { parent: node, key: path[path.length - 1] };
}

function nested(depth: number): Json {
  let value: Json = 1;
  for (let level = 0; level < depth; level++) value = level % 2 ? [value] : { a: value };
  return value;
}

const weirdValue: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>('NaN', 'Infinity', '-Infinity', '1e309', '-0', '', ' ', '0x10', 'null', 'undefined', '__proto__'),
  fc.constantFrom<Json>(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -1, 0, 1e-320, 2 ** 31, -(2 ** 53)),
  fc.constantFrom<Json>(null, true, false, [], {}),
  fc.constantFrom<Json>('x'.repeat(100_000), 'é'.repeat(5_000), '\u0000\u202e<script>', '../../etc/passwd'),
  fc.integer({ min: 20, max: 300 }).map(nested),
  fc.string({ maxLength: 40 }),
  fc.double(),
  fc.uuid(),
  fc.array(fc.integer(), { maxLength: 5 }),
);

type Mutation =
  | { kind: 'delete'; pick: number }
  | { kind: 'replace'; pick: number; value: Json }
  | { kind: 'unknown-key'; pick: number; key: string; value: Json }
  | { kind: 'duplicate-id'; list: 'units' | 'lines' }
  | { kind: 'dangling-ref'; field: 'unitId' | 'portId' | 'hosePartId' | 'endStack'; value: string };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constant('delete' as const), pick: fc.nat() }),
  fc.record({ kind: fc.constant('replace' as const), pick: fc.nat(), value: weirdValue }),
  fc.record({ kind: fc.constant('unknown-key' as const), pick: fc.nat(), key: fc.oneof(fc.string({ maxLength: 20 }), fc.constant('__proto__'), fc.constant('constructor')), value: weirdValue }),
  fc.record({ kind: fc.constant('duplicate-id' as const), list: fc.constantFrom('units' as const, 'lines' as const) }),
  fc.record({
    kind: fc.constant('dangling-ref' as const),
    field: fc.constantFrom('unitId' as const, 'portId' as const, 'hosePartId' as const, 'endStack' as const),
    value: fc.oneof(fc.uuid(), fc.string({ maxLength: 30 })),
  }),
);

function mutate(document: Json, mutations: Mutation[]): Json {
  const root = structuredClone(document) as { [key: string]: Json };
  for (const step of mutations) {
    const paths = pathsOf(root);
    if (step.kind === 'delete' || step.kind === 'replace') {
      if (!paths.length) continue;
      const { parent, key } = parentOf(root, paths[step.pick % paths.length]);
      if (step.kind === 'replace') parent[key] = step.value;
      else if (Array.isArray(parent)) parent.splice(Number(key), 1);
      else delete parent[key];
    } else if (step.kind === 'unknown-key') {
      const objects = [[], ...paths].filter((path) => {
        const value = path.length ? parentOf(root, path).parent[path[path.length - 1]] : root;
        return value !== null && typeof value === 'object' && !Array.isArray(value);
      });
      const path = objects[step.pick % objects.length];
      const target = (path.length ? parentOf(root, path).parent[path[path.length - 1]] : root) as Record<string, Json>;
      Object.defineProperty(target, step.key, { value: step.value, enumerable: true, writable: true, configurable: true });
    } else if (step.kind === 'duplicate-id') {
      const list = root[step.list];
      if (Array.isArray(list) && list.length) list.push(structuredClone(list[0]));
    } else {
      const line = (root.lines as Json[] | undefined)?.[0] as Record<string, Json> | undefined;
      if (!line || typeof line !== 'object') continue;
      if (step.field === 'hosePartId') line.hosePartId = step.value;
      else if (step.field === 'endStack') line.endStacks = { from: [step.value], to: [step.value, step.value] };
      else if (line.from && typeof line.from === 'object') (line.from as Record<string, Json>)[step.field] = step.value;
    }
  }
  return root;
}

// ---- query strings ----

const queryKey = fc.oneof(
  fc.constantFrom('search', 'status', 'sort', 'direction', 'page', 'pageSize', 'kind', 'family', 'size', 'dash', 'fitsHose', 'supplierId', 'includeRetired', 'role', 'active', 'limit'),
  fc.string({ maxLength: 12 }),
);
const queryValue = fc.oneof(
  fc.string({ maxLength: 30 }),
  fc.constantFrom('', '0', '-1', '1e9', 'NaN', 'true', 'false', 'asc', 'desc', 'open', 'in-review', '-6', 'x'.repeat(5_000), '%', '%zz', '%E0%A4%A'),
  fc.integer().map(String),
  fc.uuid(),
);
const rawQuery = fc
  .array(fc.tuple(queryKey, queryValue, fc.boolean()), { maxLength: 6 })
  .map((pairs) => pairs.map(([key, value, raw]) => `${encodeURIComponent(key)}=${raw ? value.replace(/[^\x21-\x7e]/g, '') : encodeURIComponent(value)}`).join('&'));

// ---- uploads ----

const MAGIC = [Buffer.alloc(0), pngBytes(2, 2).subarray(0, 8), Buffer.from([0xff, 0xd8, 0xff]), Buffer.from('RIFF\0\0\0\0WEBP'), Buffer.from('PK\x03\x04'), pngBytes(3, 2)];
const uploadCase = fc.record({
  magic: fc.nat({ max: MAGIC.length - 1 }),
  bytes: fc.uint8Array({ maxLength: 2_048 }),
  name: fc.oneof(fc.string({ maxLength: 40 }), fc.constantFrom('a.png', 'a.jpg', 'a.webp', 'a.xlsx', 'a.csv', '../../etc/passwd.png', '.png', 'x'.repeat(400) + '.png')),
  contentType: fc.constantFrom('image/png', 'image/jpeg', 'image/webp', 'text/plain', 'application/octet-stream', 'text/csv', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', 'x/y'),
  raw: fc.option(fc.constantFrom('multipart/form-data', 'multipart/form-data; boundary=zz', 'application/octet-stream', 'image/png', 'application/json', 'text/plain'), { freq: 4 }),
});

// ---- any route ----

/** Values for path parameters: real ids of the fixture (filled in at run time), strangers and overflows. */
const paramValue = (realIds: () => string[]) =>
  fc.oneof(
    fc.nat().map((index) => realIds()[index % realIds().length]),
    fc.uuid(),
    fc.constantFrom('0', '1', '-1', '2147483648', '99999999999', '1e309', 'NaN', 'draft', '..%2F..%2Fetc', '%00', 'x'.repeat(300), '%E0%A4%A'),
    fc.string({ minLength: 1, maxLength: 20 }).map(encodeURIComponent),
  );
/** Field names the API's bodies use, so generated bodies reach past the first check. */
const bodyKey = fc.oneof(
  fc.constantFrom(
    'version', 'name', 'email', 'password', 'displayName', 'roles', 'active', 'token', 'circuitIds', 'lines', 'orderLineId',
    'quantity', 'delta', 'reason', 'kind', 'vehicle', 'customer', 'notes', 'status', 'message', 'note', 'flagKey', 'comments',
    'supplierId', 'rules', 'timezone', 'taxRatePercent', 'attributes', 'priceCents', 'mapping', 'rows',
  ),
  fc.string({ maxLength: 12 }),
);
const bodyValue: fc.Arbitrary<Json> = fc.oneof(weirdValue, fc.array(fc.dictionary(bodyKey, weirdValue, { maxKeys: 3 }), { maxLength: 3 }));
const anyBody = fc.oneof(fc.dictionary(bodyKey, bodyValue, { maxKeys: 6 }), weirdValue);
const headerCase = fc.record({
  ifMatch: fc.option(fc.constantFrom('1', '0', '-1', '2147483648', '"1"', 'W/"3"', '*', 'abc', 'x'.repeat(500)), { freq: 2 }),
  idempotencyKey: fc.option(fc.constantFrom('k', '', ' ', 'x'.repeat(500), '%D0%BA', 'a b', '\t'), { freq: 2 }),
  contentType: fc.option(fc.constantFrom('application/json', 'text/plain', 'application/x-www-form-urlencoded', 'application/json; charset=latin1'), { freq: 3 }),
});

describe('fuzzing: random and mutated input never breaks the API (e2e)', () => {
  // About 25 ms a case beyond the usual 30 s.
  jest.setTimeout(30_000 + TOTAL_RUNS * 25);
  let storageDir: string;
  let testApp: TestApp;
  let shop: TestShop;
  let auth: Record<string, string>;
  let circuitId: string;
  let buildId: string;
  let supplierId: string;
  let partId: string;
  let validDocument: Json;
  let draftVersion = 1;

  beforeAll(async () => {
    storageDir = await mkdtemp(join(tmpdir(), 'linesmith-fuzz-'));
    testApp = await startTestApp({ STORAGE_DRIVER: 'local', STORAGE_DIR: storageDir });
    shop = await createTestShop(testApp, 'fuzz');
    const ids = await seedCatalogueInto(testApp, shop.shop);
    const token = (await signIn(testApp, (await shop.addUser([...ROLES], 'fuzzer')).email)).accessToken;
    auth = { Authorization: `Bearer ${token}` };
    buildId = (await createBuild(testApp, token, { vehicle: { make: 'Redfern' } })).id;
    circuitId = (await createCircuit(testApp, token, buildId, { kind: 'transmission-cooler' })).id;
    validDocument = coolerLineDocument((demoId) => ids.get(demoId) ?? '', [10, 20]) as unknown as Json;
    const hose = await testApp.http().get(`/api/parts/${ids.get('demo-hose-6-rubber')}`).set(auth).expect(200);
    supplierId = hose.body.supplierId;
    partId = hose.body.id;
  });

  afterAll(async () => {
    // The sign-in routes were hammered from loopback: leave no spent allowance to later test files.
    await testApp.dataSource.query(`DELETE FROM rate_limits`);
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
    await rm(storageDir, { recursive: true, force: true });
  });

  it('answers mutated circuit documents on PUT /api/circuits/:id/draft within the contract', async () => {
    await check('draft', fc.array(mutation, { minLength: 1, maxLength: 4 }), share(0.2), async (mutations) => {
      const body = mutate(validDocument, mutations);
      const response = await testApp.http().put(`/api/circuits/${circuitId}/draft`).set(auth).set('If-Match', String(draftVersion)).send(body as object);
      if (response.status === 200) draftVersion = response.body.draftVersion;
      expectContractAnswer(response, `PUT draft ${JSON.stringify(mutations).slice(0, 300)}`);
    });
  });

  it('answers a document nested thousands of levels deep within the contract', async () => {
    // Kept out of the generators: fast-check's own reporting recurses through such values.
    for (const depth of [2_000, 100_000]) {
      // Written by hand: JSON.stringify itself recurses.
      const units = '{"a":['.repeat(depth) + '1' + ']}'.repeat(depth);
      const body = JSON.stringify(validDocument).replace(/"units":\[.*?\],"lines"/, `"units":${units},"lines"`);
      expect(body.length).toBeGreaterThan(depth * 8);
      const draft = await testApp
        .http()
        .put(`/api/circuits/${circuitId}/draft`)
        .set(auth)
        .set('If-Match', String(draftVersion))
        .set('Content-Type', 'application/json')
        .send(body);
      expectContractAnswer(draft, `PUT draft nested ${depth}`);
      const evaluated = await testApp.http().post('/api/rules/evaluate').set(auth).set('Content-Type', 'application/json').send(body);
      expectContractAnswer(evaluated, `evaluate nested ${depth}`);
    }
  });

  it('answers mutated circuit documents on POST /api/rules/evaluate within the contract', async () => {
    await check('evaluate', fc.array(mutation, { minLength: 1, maxLength: 4 }), share(0.15), async (mutations) => {
      const response = await testApp.http().post('/api/rules/evaluate').set(auth).send(mutate(validDocument, mutations) as object);
      expectContractAnswer(response, `evaluate ${JSON.stringify(mutations).slice(0, 300)}`);
    });
  });

  it('answers random query strings on the list endpoints within the contract', async () => {
    const endpoint = fc.constantFrom('/api/builds', '/api/parts', '/api/reviews', '/api/orders', '/api/users');
    await check('queries', fc.tuple(endpoint, rawQuery), share(0.15), async ([path, query]) => {
      const response = await testApp.http().get(`${path}?${query}`).set(auth);
      expectContractAnswer(response, `GET ${path}?${query.slice(0, 200)}`);
      if (response.status === 200) expect(response.body).toBeDefined();
    });
  });

  it('answers random bytes, names and content types on the upload routes within the contract', async () => {
    const target = fc.constantFrom('photo' as const, 'price-list' as const);
    await check('uploads', fc.tuple(target, uploadCase), share(0.1), async ([kind, file]) => {
      const path = kind === 'photo' ? `/api/builds/${buildId}/uploads` : '/api/price-lists/preview';
      const bytes = Buffer.concat([MAGIC[file.magic], Buffer.from(file.bytes)]);
      let call = testApp.http().post(path).set(auth);
      if (file.raw !== null) {
        call = call.set('Content-Type', file.raw).send(bytes);
      } else {
        if (kind === 'price-list') call = call.field('supplierId', supplierId);
        call = call.attach('file', bytes, { filename: file.name.replace(/["\r\n\\]/g, '') || 'f', contentType: file.contentType });
      }
      const response = await call;
      expectContractAnswer(response, `${kind} ${JSON.stringify({ ...file, bytes: file.bytes.length })}`);
    });
  });
  it('answers generated requests on every registered route within the contract', async () => {
    const routes = registeredRoutes(testApp)
      // Sign-out ends the fuzzer's own session; its refusals are covered by auth.e2e-spec.ts.
      .filter((route) => route !== 'POST /api/auth/logout')
      .map((route) => route.split(' ') as [string, string]);
    const realIds = () => [buildId, circuitId, supplierId, partId, shop.shop.id];
    const request = fc.record({
      route: fc.nat({ max: routes.length - 1 }),
      params: fc.array(paramValue(realIds), { minLength: 3, maxLength: 3 }),
      query: rawQuery,
      body: anyBody,
      headers: headerCase,
    });
    await check('routes', request, share(0.4), async (input) => {
      const [method, pattern] = routes[input.route];
      let next = 0;
      const path = pattern.replace('{/*splat}', '/:splat').replace(/:(\w+)/g, () => input.params[next++ % input.params.length]);
      const url = input.query ? `${path}?${input.query}` : path;
      let call = testApp.http()[(method === 'ALL' ? 'post' : method.toLowerCase()) as 'post'](url).set(auth);
      if (input.headers.ifMatch !== null) call = call.set('If-Match', input.headers.ifMatch);
      if (input.headers.idempotencyKey !== null) call = call.set('Idempotency-Key', input.headers.idempotencyKey);
      // Sent as text: supertest itself refuses some values (a bare `true`) as a body.
      if (method !== 'GET' && method !== 'DELETE') {
        call = call.set('Content-Type', input.headers.contentType ?? 'application/json').send(JSON.stringify(input.body) ?? 'null');
      }
      const response = await call;
      expectContractAnswer(response, `${method} ${url.slice(0, 200)} ${JSON.stringify(input.body).slice(0, 200)}`, ANY_ROUTE_REFUSALS);
    });
  });
});
