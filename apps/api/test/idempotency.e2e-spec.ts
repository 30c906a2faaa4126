import { OrderEntity } from '../src/orders/order.entity.js';
import { OrderSourceEntity } from '../src/orders/order-source.entity.js';
import { PartEntity } from '../src/parts/part.entity.js';
import { approvedCircuit, coolerLineDocument } from './support/approved-circuit.js';
import { createBuild } from './support/builds.js';
import { demoIdLookup, seedCatalogueInto } from './support/demo-catalogue.js';
import { bearer, createTestShop, removeShops, tokenFor, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

interface ApiOrder {
  id: string;
  status: string;
  lines: Array<{ id: string; partId: string | null; quantity: number; receivedQuantity: number }>;
}

/**
 * Double clicks and retries against PostgreSQL: requests are sent at the same moment so they race
 * in the database, and the business records must come out as if one was sent.
 */
describe('idempotent business writes (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let seeded = new Map<string, string>();
  const id = demoIdLookup(() => seeded);
  let fabToken: string;
  let clerkToken: string;
  let buildId: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    shop = await createTestShop(testApp, 'idempotency');
    seeded = await seedCatalogueInto(testApp, shop.shop);
    fabToken = await tokenFor(testApp, shop, ['fabricator']);
    clerkToken = await tokenFor(testApp, shop, ['parts-clerk']);
    buildId = (await createBuild(testApp, fabToken, { vehicle: { make: 'Redfern' } })).id;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
  });

  const draft = (circuitIds: string[]) => testApp.http().post('/api/orders/draft').set(bearer(clerkToken)).send({ circuitIds });

  async function orderCountFor(circuitId: string): Promise<number> {
    return testApp.dataSource.getRepository(OrderSourceEntity).countBy({ circuitId });
  }

  it('drafts one order per circuit revision and supplier however many submits race', async () => {
    const circuit = await approvedCircuit(testApp, fabToken, buildId, 'Raced cooler', coolerLineDocument(id, [10, 20]));
    const answers = await Promise.all(Array.from({ length: 5 }, () => draft([circuit.id])));
    expect(answers.map((answer) => answer.status)).toEqual([201, 201, 201, 201, 201]);
    const orderIds = answers.map((answer) => (answer.body.orders as ApiOrder[]).map((order) => order.id).sort().join());
    expect(new Set(orderIds).size).toBe(1);
    expect(answers.filter((answer) => answer.body.reused === false)).toHaveLength(1);
    const suppliers = (answers[0].body.orders as ApiOrder[]).length;
    expect(suppliers).toBeGreaterThan(0);
    expect(await orderCountFor(circuit.id)).toBe(suppliers);
    expect(await testApp.dataSource.getRepository(OrderEntity).countBy({ shopId: shop.shop.id, circuitIds: [circuit.id] } as never)).toBe(suppliers);

    // A later repeat answers the same orders.
    const later = await draft([circuit.id]).expect(201);
    expect(later.body.reused).toBe(true);
    expect((later.body.orders as ApiOrder[]).map((order) => order.id).sort().join()).toBe(orderIds[0]);
  });

  it('refuses a draft that would put a revision on a second order, naming the circuit', async () => {
    const first = await approvedCircuit(testApp, fabToken, buildId, 'Ordered alone', coolerLineDocument(id));
    const second = await approvedCircuit(testApp, fabToken, buildId, 'Not yet ordered', coolerLineDocument(id));
    await draft([first.id]).expect(201);
    const refused = await draft([first.id, second.id]).expect(409);
    expect(refused.body.message).toMatch(/“Ordered alone” is already on an order/);
    expect(await orderCountFor(second.id)).toBe(0);
  });

  describe('receipts', () => {
    let order: ApiOrder;
    const parts = () => testApp.dataSource.getRepository(PartEntity);
    const receive = (orderId: string, lines: unknown, key?: string) => {
      const request = testApp.http().post(`/api/orders/${orderId}/receive`).set(bearer(clerkToken));
      if (key !== undefined) request.set('Idempotency-Key', key);
      return request.send({ lines });
    };

    beforeAll(async () => {
      const circuit = await approvedCircuit(testApp, fabToken, buildId, 'Received cooler', coolerLineDocument(id, [10, 20]));
      const drafted = (await draft([circuit.id]).expect(201)).body.orders as ApiOrder[];
      // Booking needs a sent order; the send flow itself (e-mail) is covered in orders.e2e-spec.ts.
      const withStockedLine = drafted.find((candidate) => candidate.lines.some((line) => line.partId && line.quantity >= 3)) ?? drafted[0];
      await testApp.dataSource.getRepository(OrderEntity).update({ id: withStockedLine.id }, { status: 'sent', sentAt: new Date() });
      order = withStockedLine;
    });

    it('counts stock once for concurrent submits with one Idempotency-Key', async () => {
      const line = order.lines.find((candidate) => candidate.partId)!;
      const before = (await parts().findOneByOrFail({ id: line.partId! })).stockOnHand;
      const answers = await Promise.all(Array.from({ length: 4 }, () => receive(order.id, [{ orderLineId: line.id, quantity: 1 }], 'click-1')));
      expect(answers.map((answer) => answer.status)).toEqual([200, 200, 200, 200]);
      expect((await parts().findOneByOrFail({ id: line.partId! })).stockOnHand).toBeCloseTo(before + 1, 6);
      for (const answer of answers) expect(answer.body.lines.find((l: { id: string }) => l.id === line.id).receivedQuantity).toBe(1);
    });

    it('counts stock once for a double submit without a key (the same lines moments apart)', async () => {
      const line = order.lines.find((candidate) => candidate.partId)!;
      const before = (await parts().findOneByOrFail({ id: line.partId! })).stockOnHand;
      const quantity = 0.5;
      const answers = await Promise.all([receive(order.id, [{ orderLineId: line.id, quantity }]), receive(order.id, [{ orderLineId: line.id, quantity }])]);
      expect(answers.map((answer) => answer.status)).toEqual([200, 200]);
      expect((await parts().findOneByOrFail({ id: line.partId! })).stockOnHand).toBeCloseTo(before + quantity, 6);
    });

    it('books a new click (a new key) again, and refuses one key reused for other lines', async () => {
      const line = order.lines.find((candidate) => candidate.partId)!;
      const before = (await parts().findOneByOrFail({ id: line.partId! })).stockOnHand;
      await receive(order.id, [{ orderLineId: line.id, quantity: 0.25 }], 'click-2').expect(200);
      await receive(order.id, [{ orderLineId: line.id, quantity: 0.25 }], 'click-3').expect(200);
      expect((await parts().findOneByOrFail({ id: line.partId! })).stockOnHand).toBeCloseTo(before + 0.5, 6);
      const misuse = await receive(order.id, [{ orderLineId: line.id, quantity: 0.125 }], 'click-2').expect(409);
      expect(misuse.body.message).toMatch(/Idempotency-Key was already used/);
      const badKey = await receive(order.id, [{ orderLineId: line.id, quantity: 1 }], 'x'.repeat(201)).expect(400);
      expect(badKey.body.issues[0].path).toBe('Idempotency-Key');
    });

    it('refuses quantities that round to nothing at the stored precision (three decimals)', async () => {
      const line = order.lines.find((candidate) => candidate.partId)!;
      const refused = await receive(order.id, [{ orderLineId: line.id, quantity: 1e-9 }], 'tiny').expect(400);
      expect(refused.body.issues[0]).toEqual({ path: 'lines.0.quantity', message: expect.stringMatching(/at least 0\.001/) });
    });
  });
});
