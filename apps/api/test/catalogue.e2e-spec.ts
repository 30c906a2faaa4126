import { demoParts, demoSuppliers, partSchema } from '@linesmith/catalog';
import { PartEntity } from '../src/parts/part.entity.js';
import { demoIdLookup, seedCatalogueInto } from './support/demo-catalogue.js';
import { bearer, createTestShop, removeShops, tokenFor, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

interface ApiPart {
  id: string;
  kind: string;
  description: string;
  supplierId: string | null;
  supplierPartNumber: string;
  priceCents: number;
  retired: boolean;
  version: number;
  attributes: Record<string, unknown>;
}

describe('parts and suppliers (e2e)', () => {
  let testApp: TestApp;
  let shopA: TestShop;
  let shopB: TestShop;
  let ids: Map<string, string>;
  let fabToken: string;
  let clerkToken: string;
  let otherShopToken: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    shopA = await createTestShop(testApp, 'parts-a');
    shopB = await createTestShop(testApp, 'parts-b');
    ids = await seedCatalogueInto(testApp, shopA.shop);
    fabToken = await tokenFor(testApp, shopA, ['fabricator']);
    clerkToken = await tokenFor(testApp, shopA, ['parts-clerk']);
    otherShopToken = await tokenFor(testApp, shopB, ['admin', 'parts-clerk']);
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shopA, shopB]);
    await testApp.close();
  });

  const as = bearer;
  const id = demoIdLookup(() => ids);
  const listAs = async (token: string, query: string) =>
    (await testApp.http().get(`/api/parts?${query}`).set(as(token)).expect(200)).body as { items: ApiPart[]; total: number };
  const idsOf = (items: ApiPart[]) => items.map((part) => part.id).sort();

  it('seeds the demo catalogue once: a second run adds and changes nothing', async () => {
    const repo = testApp.dataSource.getRepository(PartEntity);
    const before = await repo.findBy({ shopId: shopA.shop.id });
    const again = await seedCatalogueInto(testApp, shopA.shop);
    const after = await repo.findBy({ shopId: shopA.shop.id });
    expect(after).toHaveLength(demoParts.length);
    expect(new Map(after.map((row) => [row.id, row.version]))).toEqual(new Map(before.map((row) => [row.id, row.version])));
    expect([...again.keys()].sort()).toEqual(demoParts.map((part) => part.id).sort());
    expect(again).toEqual(ids);
  });

  it('answers parts in the library Part shape with database ids and own-shop supplier ids', async () => {
    const response = await testApp.http().get(`/api/parts/${id('demo-hose-6-rubber')}`).set(as(fabToken)).expect(200);
    const part = partSchema.parse(response.body);
    expect(part).toMatchObject({ id: id('demo-hose-6-rubber'), kind: 'hose', attributes: { dash: 6, odIn: 0.69 } });
    const suppliers = await testApp.http().get('/api/suppliers').set(as(fabToken)).expect(200);
    expect(suppliers.body.map((s: { name: string }) => s.name).sort()).toEqual(demoSuppliers.map((s) => s.name).sort());
    expect(suppliers.body.map((s: { id: string }) => s.id)).toContain(part.supplierId);
  });

  it('filters by kind, family and size, dash, supplier and search, and pages', async () => {
    const hoses = await listAs(fabToken, 'kind=hose');
    const demoHoses = demoParts.filter((p) => p.kind === 'hose').length;
    expect(hoses.total).toBe(demoHoses);

    const page2 = await listAs(fabToken, 'kind=hose&pageSize=3&page=2');
    expect(page2).toMatchObject({ total: demoHoses, page: 2, pageSize: 3 });
    expect(page2.items).toHaveLength(demoHoses - 3);
    const page1 = await listAs(fabToken, 'kind=hose&pageSize=3&page=1');
    expect(idsOf([...page1.items, ...page2.items])).toEqual(idsOf(hoses.items));

    // -6 O-ring boss ends: the four ORB -6 to 37° adapters, the ORB -6 to ORFS adapter and the ORB -6 plug of the demo catalogue.
    const orb6 = await listAs(fabToken, 'family=orb&size=6');
    expect(idsOf(orb6.items)).toEqual(
      ['demo-adapter-orb6-f37-6', 'demo-adapter-orb6-f37-6-long', 'demo-adapter-orb6-f37-6-90', 'demo-adapter-orb6-f37-6-hl', 'demo-adapter-orfs6-orb6', 'demo-plug-orb6']
        .map(id)
        .sort(),
    );

    // A 3/8 in inverted-flare end is a -6 tube size (DOMAIN §1: a dash is the tube OD in sixteenths).
    const dash6Adapters = await listAs(fabToken, 'kind=adapter&dash=-6');
    expect(idsOf(dash6Adapters.items)).toContain(id('demo-adapter-invf6-f37-6'));
    expect(idsOf(dash6Adapters.items)).not.toContain(id('demo-adapter-orb8-f37-8'));

    const badDash = await testApp.http().get('/api/parts?dash=six').set(as(fabToken)).expect(400);
    expect(badDash.body.issues[0].path).toBe('dash');

    const search = await listAs(fabToken, `search=${encodeURIComponent('LONG-NOSE')}`);
    expect(idsOf(search.items)).toEqual([id('demo-adapter-orb6-f37-6-long')]);

    // The hoses of the first hose's supplier: as many as the demo catalogue has from that supplier.
    const supplierId = (await listAs(fabToken, 'kind=hose')).items[0].supplierId;
    const suppliers = (await testApp.http().get('/api/suppliers').set(as(fabToken)).expect(200)).body as Array<{ id: string; name: string }>;
    const demoSupplier = demoSuppliers.find((s) => s.name === suppliers.find((s) => s.id === supplierId)?.name);
    const demoHosesOfSupplier = demoParts.filter((p) => p.kind === 'hose' && p.supplierId === demoSupplier?.id).length;
    expect(demoHosesOfSupplier).toBeGreaterThan(0);
    const hosesOfSupplier = await listAs(fabToken, `kind=hose&supplierId=${supplierId}`);
    expect(hosesOfSupplier.total).toBe(demoHosesOfSupplier);

    const byPrice = await listAs(fabToken, 'kind=adapter&sort=priceCents&direction=desc&pageSize=200');
    const prices = byPrice.items.map((part) => part.priceCents);
    expect(prices).toEqual([...prices].sort((a, b) => b - a));
  });

  it('finds the hose ends, clamps and sleeves that fit a hose', async () => {
    // -6 CPE braided rubber hose, OD 0.69 in: its own three hose ends and its M14 banjo hose end,
    // the 0.63–0.72 in clamp and the 0.50–0.75 in sleeve; not the PTFE ends, not the -8 ends, not
    // the barbed ends of the -6 cooler hose (same OD), not the 0.53–0.62 in clamp.
    const fits = await listAs(fabToken, `fitsHose=${id('demo-hose-6-rubber')}&pageSize=200`);
    expect(idsOf(fits.items)).toEqual(
      ['demo-hose-end-6-rubber-0', 'demo-hose-end-6-rubber-45', 'demo-hose-end-6-rubber-90', 'demo-hose-end-6-rubber-banjo-m14', 'demo-clamp-11-16', 'demo-sleeve-5-8']
        .map(id)
        .sort(),
    );
    const notAHose = await testApp.http().get(`/api/parts?fitsHose=${id('demo-clamp-11-16')}`).set(as(fabToken)).expect(400);
    expect(notAHose.body.issues[0].path).toBe('fitsHose');
  });

  it('keeps shops apart: another shop sees none of these parts and gets 404 for their ids', async () => {
    const hoseId = id('demo-hose-6-rubber');
    await testApp.http().get(`/api/parts/${hoseId}`).set(as(otherShopToken)).expect(404);
    expect((await listAs(otherShopToken, 'includeRetired=true')).total).toBe(0);
    expect((await testApp.http().get('/api/suppliers').set(as(otherShopToken)).expect(200)).body).toEqual([]);
    await testApp.http().get(`/api/parts?fitsHose=${hoseId}`).set(as(otherShopToken)).expect(400);
    await testApp.http().patch(`/api/parts/${hoseId}`).set(as(otherShopToken)).send({ version: 1, priceCents: 1 }).expect(404);
    await testApp.http().get('/api/parts/not-a-uuid').set(as(fabToken)).expect(404);
  });

  it('creates and edits parts for the parts clerk, validated by the catalogue schema', async () => {
    const supplierId = (await listAs(fabToken, 'kind=hose')).items[0].supplierId;
    const body = {
      kind: 'clamp',
      supplierId,
      supplierPartNumber: 'E2E-CLAMP-1',
      description: 'Cushion clamp for hose OD 0.45–0.52 in',
      priceCents: 990,
      saleUnit: { type: 'pack', size: 10 },
      attributes: { fitsOd: { minIn: 0.45, maxIn: 0.52 } },
    };
    await testApp.http().post('/api/parts').set(as(fabToken)).send(body).expect(403);

    const bad = await testApp
      .http()
      .post('/api/parts')
      .set(as(clerkToken))
      .send({ ...body, attributes: { fitsOd: { minIn: -1, maxIn: 0.52 } } })
      .expect(400);
    expect(bad.body.issues.map((issue: { path: string }) => issue.path)).toContain('attributes.fitsOd.minIn');

    const foreignSupplier = await testApp
      .http()
      .post('/api/parts')
      .set(as(clerkToken))
      .send({ ...body, supplierId: shopB.shop.id })
      .expect(400);
    expect(foreignSupplier.body.issues[0].path).toBe('supplierId');

    const created = await testApp.http().post('/api/parts').set(as(clerkToken)).send(body).expect(201);
    expect(created.body).toMatchObject({ ...body, id: expect.any(String), version: 1, retired: false, stockOnHand: 0 });
    await testApp.http().post('/api/parts').set(as(clerkToken)).send(body).expect(409);

    const listed = await listAs(fabToken, 'kind=clamp');
    expect(idsOf(listed.items)).toContain(created.body.id);

    const edited = await testApp
      .http()
      .patch(`/api/parts/${created.body.id}`)
      .set(as(clerkToken))
      .send({ version: 1, retired: true, priceCents: 1050 })
      .expect(200);
    expect(edited.body).toMatchObject({ version: 2, retired: true, priceCents: 1050, attributes: body.attributes });

    const stale = await testApp
      .http()
      .patch(`/api/parts/${created.body.id}`)
      .set(as(clerkToken))
      .send({ version: 1, priceCents: 1 })
      .expect(409);
    expect(stale.body.current).toMatchObject({ id: created.body.id, version: 2, priceCents: 1050 });

    const wrongKind = await testApp
      .http()
      .patch(`/api/parts/${created.body.id}`)
      .set(as(clerkToken))
      .send({ version: 2, kind: 'hose' })
      .expect(400);
    expect(wrongKind.body.issues.some((issue: { path: string }) => issue.path.startsWith('attributes'))).toBe(true);

    expect(idsOf((await listAs(fabToken, 'kind=clamp')).items)).not.toContain(created.body.id);
    expect(idsOf((await listAs(fabToken, 'kind=clamp&includeRetired=true')).items)).toContain(created.body.id);
  });

  it('manages suppliers for the parts clerk with version checks', async () => {
    await testApp.http().post('/api/suppliers').set(as(fabToken)).send({ name: 'Nope' }).expect(403);
    const created = await testApp
      .http()
      .post('/api/suppliers')
      .set(as(clerkToken))
      .send({ name: 'Eastbay Hose Works', email: 'Desk@Eastbay.example' })
      .expect(201);
    expect(created.body).toMatchObject({ name: 'Eastbay Hose Works', email: 'desk@eastbay.example', active: true, version: 1 });
    await testApp.http().post('/api/suppliers').set(as(clerkToken)).send({ name: 'EASTBAY hose works' }).expect(409);
    const badEmail = await testApp.http().post('/api/suppliers').set(as(clerkToken)).send({ name: 'X', email: 'nope' }).expect(400);
    expect(badEmail.body.issues[0].path).toBe('email');

    await testApp.http().patch(`/api/suppliers/${created.body.id}`).set(as(clerkToken)).send({ version: 1, active: false }).expect(200);
    const stale = await testApp
      .http()
      .patch(`/api/suppliers/${created.body.id}`)
      .set(as(clerkToken))
      .send({ version: 1, phone: '555-0100' })
      .expect(409);
    expect(stale.body.current).toMatchObject({ version: 2, active: false });
    const active = await testApp.http().get('/api/suppliers').set(as(fabToken)).expect(200);
    expect(active.body.map((s: { id: string }) => s.id)).not.toContain(created.body.id);
    const all = await testApp.http().get('/api/suppliers?includeInactive=true').set(as(fabToken)).expect(200);
    expect(all.body.map((s: { id: string }) => s.id)).toContain(created.body.id);
  });
});
