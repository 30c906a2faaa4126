import { CircuitRevisionEntity } from '../src/circuits/circuit-revision.entity.js';
import { PartEntity } from '../src/parts/part.entity.js';
import { coolerLineDocument } from './support/approved-circuit.js';
import { createBuild, createCircuit } from './support/builds.js';
import { seedCatalogueInto } from './support/demo-catalogue.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';
import { downloadWorkbook, rowWith } from './support/xlsx.js';

interface DraftOrdersResponse {
  orders: Array<{ lines: Array<{ partId: string; quantity: number }> }>;
}

/** Once signed off, a revision's cut list and order quantities no longer follow later rule or catalogue edits. */
describe('signed-off numbers stay as approved (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let ids: Map<string, string>;
  let fab: string;
  let lead: string;
  let admin: string;
  let clerk: string;
  let circuitId: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const id = (demoId: string) => {
    const found = ids.get(demoId);
    if (!found) throw new Error(`${demoId} was not seeded`);
    return found;
  };
  const token = async (roles: Parameters<TestShop['addUser']>[0]) => (await signIn(testApp, (await shop.addUser(roles)).email)).accessToken;

  async function cutLengthIn(query: string): Promise<unknown> {
    const { workbook } = await downloadWorkbook(testApp, `/api/circuits/${circuitId}/cut-list.xlsx${query}`, fab);
    const sheet = workbook.getWorksheet('Cut list');
    if (!sheet) throw new Error('no Cut list sheet');
    const headerRow = rowWith(sheet, 'Cut length (in)');
    const column = (sheet.getRow(headerRow).values as unknown[]).indexOf('Cut length (in)');
    return sheet.getRow(headerRow + 1).getCell(column).value;
  }

  /** Whole feet of hose on the order draft (the shelf is emptied first, so nothing is taken off). */
  async function orderedHoseFeet(): Promise<number | undefined> {
    const response = await testApp.http().post('/api/orders/draft').set(as(clerk)).send({ circuitIds: [circuitId] }).expect(201);
    return (response.body as DraftOrdersResponse).orders.flatMap((order) => order.lines).find((line) => line.partId === id('demo-hose-6-rubber'))
      ?.quantity;
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    shop = await createTestShop(testApp, 'signed-off');
    ids = await seedCatalogueInto(testApp, shop.shop);
    await testApp.dataSource.getRepository(PartEntity).update({ id: id('demo-hose-6-rubber') }, { stockOnHand: 0 });
    [fab, lead, admin, clerk] = await Promise.all([token(['fabricator']), token(['reviewer']), token(['admin']), token(['parts-clerk'])]);
    const buildId = (await createBuild(testApp, fab, { vehicle: { make: 'Redfern', model: 'Pickup' } })).id;
    const circuit = await createCircuit(testApp, fab, buildId, { name: 'Cooler signed off', kind: 'transmission-cooler' });
    circuitId = circuit.id;
    await testApp
      .http()
      .put(`/api/circuits/${circuitId}/draft`)
      .set(as(fab))
      .set('If-Match', String(circuit.draftVersion))
      .send(coolerLineDocument(id, [10, 20]))
      .expect(200);
    // The real sign-off: submit, acknowledge whatever cautions the check raises, approve.
    await testApp.http().post(`/api/circuits/${circuitId}/submit`).set(as(fab)).send({}).expect(200);
    const open = (await testApp.http().get(`/api/circuits/${circuitId}/review`).set(as(lead)).expect(200)).body.openItems
      .unacknowledgedCautions as Array<{ key: string }>;
    for (const flag of open) {
      await testApp.http().post(`/api/circuits/${circuitId}/review/acknowledgements`).set(as(lead)).send({ flagKey: flag.key, note: 'Checked on the vehicle' }).expect(201);
    }
    await testApp.http().post(`/api/circuits/${circuitId}/review/approve`).set(as(lead)).send({ note: 'Build it' }).expect(200);
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
  });

  it('stores the approved check on the revision, and the lock refuses any later change to it', async () => {
    const revisions = testApp.dataSource.getRepository(CircuitRevisionEntity);
    const stored = await revisions.createQueryBuilder('r').addSelect('r.evaluation').where('r.circuit_id = :circuitId', { circuitId }).getOneOrFail();
    expect(stored.lockedAt).not.toBeNull();
    // DOMAIN §4 worked example (as in rules.e2e-spec): 30 − (0.95 + 0.80) − (1.05 + 0.80) + 1.5 slack = 27.90 → 28 in.
    expect(stored.evaluation).toMatchObject({ lines: [expect.objectContaining({ cutLengthIn: 28 })] });
    await expect(
      testApp.dataSource.query(`UPDATE "circuit_revisions" SET "evaluation" = '{}'::jsonb WHERE "id" = $1`, [stored.id]),
    ).rejects.toThrow(/locked by its sign-off/);
  });

  it('keeps the approved cut list and order quantities after the shop raises its slack; the draft follows the new rules', async () => {
    expect(await cutLengthIn('')).toBe(28);
    // (28 in cut + 1/2 in trim, common practice) / 12 in/ft = 2.375 ft → 3 whole feet.
    expect(await orderedHoseFeet()).toBe(3);

    await testApp.http().put('/api/shop-rules').set(as(admin)).send({ version: 0, rules: { slackMinIn: 10 } }).expect(200);

    // 30 − 3.60 + max(10 in, 4 % × 30 in) = 36.40 → next 1/8 in = 36.5 in, for the draft only.
    expect(await cutLengthIn('?draft=1')).toBe(36.5);
    expect(await cutLengthIn('')).toBe(28);
    expect(await cutLengthIn('?revision=1')).toBe(28);
    // Not (36.5 + 0.5) / 12 = 3.083 ft → 4 ft: the order works from the signed-off bill of materials.
    expect(await orderedHoseFeet()).toBe(3);
  });
});
