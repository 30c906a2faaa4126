import { PartEntity } from '../src/parts/part.entity.js';
import { StockAdjustmentEntity } from '../src/stock/stock-adjustment.entity.js';
import { seedCatalogueInto } from './support/demo-catalogue.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

describe('stock adjustments and the shop profile (e2e)', () => {
  let testApp: TestApp;
  let shopA: TestShop;
  let shopB: TestShop;
  let ids: Map<string, string>;
  let clerkToken: string;
  let fabToken: string;
  let adminToken: string;
  let otherToken: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    testApp = await startTestApp();
    shopA = await createTestShop(testApp, 'stock-a');
    shopB = await createTestShop(testApp, 'stock-b');
    ids = await seedCatalogueInto(testApp, shopA.shop);
    clerkToken = (await signIn(testApp, (await shopA.addUser(['parts-clerk'])).email)).accessToken;
    fabToken = (await signIn(testApp, (await shopA.addUser(['fabricator'])).email)).accessToken;
    adminToken = (await signIn(testApp, (await shopA.addUser(['admin'])).email)).accessToken;
    otherToken = (await signIn(testApp, (await shopB.addUser(['admin', 'parts-clerk'])).email)).accessToken;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shopA, shopB]);
    await testApp.close();
  });

  it('books adjustments with the stock in one step, keeps a history and never goes below zero', async () => {
    const partId = ids.get('demo-hose-6-rubber') as string;
    const before = (await testApp.http().get(`/api/parts/${partId}`).set(as(clerkToken)).expect(200)).body as { stockOnHand: number; version: number };
    const added = await testApp.http().post(`/api/parts/${partId}/stock-adjustments`).set(as(clerkToken)).send({ delta: 120, reason: 'Delivery' }).expect(201);
    expect(added.body).toMatchObject({ stockOnHand: before.stockOnHand + 120, version: before.version + 1, adjustment: { delta: 120, reason: 'Delivery' } });
    await testApp.http().post(`/api/parts/${partId}/stock-adjustments`).set(as(clerkToken)).send({ delta: -20.5, reason: 'Count' }).expect(201);

    const refused = await testApp
      .http()
      .post(`/api/parts/${partId}/stock-adjustments`)
      .set(as(clerkToken))
      .send({ delta: -(before.stockOnHand + 1000), reason: 'Too much' })
      .expect(400);
    expect(refused.body.issues[0]).toMatchObject({ path: 'delta' });

    const part = await testApp.dataSource.getRepository(PartEntity).findOneByOrFail({ id: partId });
    expect(part.stockOnHand).toBeCloseTo(before.stockOnHand + 120 - 20.5, 6);
    expect(await testApp.dataSource.getRepository(StockAdjustmentEntity).countBy({ partId })).toBe(2);
    const history = await testApp.http().get(`/api/parts/${partId}/stock-adjustments`).set(as(fabToken)).expect(200);
    expect(history.body.map((row: { delta: number }) => row.delta).sort()).toEqual([-20.5, 120].sort());
    expect(history.body[0].actor).toMatchObject({ displayName: expect.stringContaining('parts-clerk') });
    // The part list sees the new stock at once (the cached catalogue was dropped).
    const listed = await testApp.http().get('/api/parts?kind=hose&pageSize=200').set(as(clerkToken)).expect(200);
    expect(listed.body.items.find((p: { id: string }) => p.id === partId).stockOnHand).toBeCloseTo(part.stockOnHand, 6);
  });

  it('lets only the parts clerk and admin adjust, and hides other shops', async () => {
    const partId = ids.get('demo-hose-6-rubber') as string;
    await testApp.http().post(`/api/parts/${partId}/stock-adjustments`).set(as(fabToken)).send({ delta: 1, reason: 'x' }).expect(403);
    await testApp.http().post(`/api/parts/${partId}/stock-adjustments`).set(as(otherToken)).send({ delta: 1, reason: 'x' }).expect(404);
    await testApp.http().get(`/api/parts/${partId}/stock-adjustments`).set(as(otherToken)).expect(404);
    await testApp.http().post(`/api/parts/${partId}/stock-adjustments`).set(as(clerkToken)).send({ delta: 0, reason: 'x' }).expect(400);
  });

  it('changes stock only through adjustments: PATCH ignores stockOnHand and refuses a new sale unit while stock is on hand', async () => {
    const partId = ids.get('demo-hose-6-rubber') as string;
    const current = (await testApp.http().get(`/api/parts/${partId}`).set(as(clerkToken)).expect(200)).body as { stockOnHand: number; version: number };
    expect(current.stockOnHand).toBeGreaterThan(0);
    const adjustmentsBefore = await testApp.dataSource.getRepository(StockAdjustmentEntity).countBy({ partId });
    const edited = await testApp
      .http()
      .patch(`/api/parts/${partId}`)
      .set(as(clerkToken))
      .send({ version: current.version, stockOnHand: current.stockOnHand + 500, priceCents: 1234 })
      .expect(200);
    expect(edited.body).toMatchObject({ stockOnHand: current.stockOnHand, priceCents: 1234 });
    const refused = await testApp
      .http()
      .patch(`/api/parts/${partId}`)
      .set(as(clerkToken))
      .send({ version: edited.body.version, saleUnit: { type: 'each' } })
      .expect(400);
    expect(refused.body.issues).toEqual([{ path: 'saleUnit', message: expect.stringMatching(/on hand/) }]);
    expect(await testApp.dataSource.getRepository(StockAdjustmentEntity).countBy({ partId })).toBe(adjustmentsBefore);
  });

  it('books the opening stock of a new part as its first adjustment', async () => {
    const created = await testApp
      .http()
      .post('/api/parts')
      .set(as(clerkToken))
      .send({ kind: 'clamp', description: 'Cushion clamp, opening stock', stockOnHand: 40, attributes: { fitsOd: { minIn: 0.5, maxIn: 0.6 } } })
      .expect(201);
    expect(created.body.stockOnHand).toBe(40);
    const history = await testApp.http().get(`/api/parts/${created.body.id}/stock-adjustments`).set(as(clerkToken)).expect(200);
    expect(history.body).toEqual([expect.objectContaining({ delta: 40, reason: 'Opening stock' })]);
  });

  it('retires a part instead of deleting it', async () => {
    const partId = ids.get('demo-hose-8-ptfe') as string;
    const current = (await testApp.http().get(`/api/parts/${partId}`).set(as(clerkToken)).expect(200)).body as { version: number };
    await testApp.http().patch(`/api/parts/${partId}`).set(as(clerkToken)).send({ version: current.version, retired: true }).expect(200);
    const listed = await testApp.http().get('/api/parts?kind=hose&pageSize=200').set(as(clerkToken)).expect(200);
    expect(listed.body.items.map((p: { id: string }) => p.id)).not.toContain(partId);
    await testApp.http().get(`/api/parts/${partId}`).set(as(clerkToken)).expect(200);
  });

  it('reads and edits the shop profile with a version check', async () => {
    const profile = await testApp.http().get('/api/shop').set(as(fabToken)).expect(200);
    expect(profile.body).toMatchObject({ id: shopA.shop.id, taxRatePercent: 0, timezone: 'UTC' });
    await testApp.http().patch('/api/shop').set(as(clerkToken)).send({ version: profile.body.version, taxRatePercent: 8.25 }).expect(403);
    const edited = await testApp
      .http()
      .patch('/api/shop')
      .set(as(adminToken))
      .send({ version: profile.body.version, taxRatePercent: 8.25, timezone: 'America/Denver' })
      .expect(200);
    expect(edited.body).toMatchObject({ taxRatePercent: 8.25, timezone: 'America/Denver', version: profile.body.version + 1 });
    const stale = await testApp.http().patch('/api/shop').set(as(adminToken)).send({ version: profile.body.version, name: 'X' }).expect(409);
    expect(stale.body.current).toMatchObject({ taxRatePercent: 8.25 });
    await testApp.http().patch('/api/shop').set(as(adminToken)).send({ version: edited.body.version, timezone: 'Mars/Base' }).expect(400);
    const other = await testApp.http().get('/api/shop').set(as(otherToken)).expect(200);
    expect(other.body.id).toBe(shopB.shop.id);
  });
});
