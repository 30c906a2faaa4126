import ExcelJS from 'exceljs';
import { AuditEventEntity } from '../src/audit/audit-event.entity.js';
import { CircuitEntity } from '../src/circuits/circuit.entity.js';
import { decodeQuotedPrintable, type FakeSmtp } from '../src/mail/fake-smtp-server.js';
import { MailDeliveryError, MailService } from '../src/mail/mail.service.js';
import { OutboxEntity } from '../src/mail/outbox.entity.js';
import { OrderEntity } from '../src/orders/order.entity.js';
import { PartEntity } from '../src/parts/part.entity.js';
import { ShopEntity } from '../src/shops/shop.entity.js';
import { XLSX_CONTENT_TYPE } from '../src/spreadsheets/spreadsheet.js';
import { SupplierEntity } from '../src/suppliers/supplier.entity.js';
import { approvedCircuit, coolerLineDocument } from './support/approved-circuit.js';
import { createBuild, createCircuit } from './support/builds.js';
import { seedCatalogueInto } from './support/demo-catalogue.js';
import { attachmentsOf, startTestSmtp } from './support/fake-smtp.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';
import { downloadWorkbook, rowWith } from './support/xlsx.js';

interface ApiOrderLine {
  id: string;
  partId: string;
  quantity: number;
  unitPriceCents: number;
  lineTotalCents: number;
  receivedQuantity: number;
  saleUnit: string;
}
interface ApiOrder {
  id: string;
  supplierId: string | null;
  status: string;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  lines: ApiOrderLine[];
}

const cents = (dollars: unknown) => Math.round(Number(dollars) * 100);

describe('cut-list spreadsheets and orders (e2e)', () => {
  let smtp: FakeSmtp;
  let testApp: TestApp;
  let shop: TestShop;
  let other: TestShop;
  let ids: Map<string, string>;
  let fabToken: string;
  let clerkToken: string;
  let otherToken: string;
  let buildId: string;
  let circuitA: { id: string };
  let circuitB: { id: string };
  let draftCircuit: { id: string };
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });
  const id = (demoId: string) => {
    const found = ids.get(demoId);
    if (!found) throw new Error(`${demoId} was not seeded`);
    return found;
  };

  beforeAll(async () => {
    smtp = await startTestSmtp();
    testApp = await startTestApp({ SMTP_PORT: String(smtp.port) });
    shop = await createTestShop(testApp, 'orders');
    other = await createTestShop(testApp, 'orders-other');
    await testApp.dataSource.getRepository(ShopEntity).update({ id: shop.shop.id }, { taxRatePercent: 8.25 });
    ids = await seedCatalogueInto(testApp, shop.shop);
    // 1 ft of the -6 hose on the shelf, so the order must take it off.
    await testApp.dataSource.getRepository(PartEntity).update({ id: id('demo-hose-6-rubber') }, { stockOnHand: 1 });
    fabToken = (await signIn(testApp, (await shop.addUser(['fabricator'])).email)).accessToken;
    clerkToken = (await signIn(testApp, (await shop.addUser(['parts-clerk'])).email)).accessToken;
    otherToken = (await signIn(testApp, (await other.addUser(['parts-clerk', 'admin'])).email)).accessToken;
    buildId = (await createBuild(testApp, fabToken, { vehicle: { make: 'Redfern', model: 'Pickup' } })).id;
    circuitA = await approvedCircuit(testApp, fabToken, buildId, 'Cooler A', coolerLineDocument(id, [10, 20]));
    circuitB = await approvedCircuit(testApp, fabToken, buildId, 'Cooler B', coolerLineDocument(id));
    draftCircuit = await createCircuit(testApp, fabToken, buildId, { name: 'Still a draft', kind: 'transmission-cooler' });
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop, other]);
    await testApp.close();
    await smtp.close();
  });

  describe('GET /api/circuits/:id/cut-list.xlsx', () => {
    it('writes the cut list with numbers as numbers, units in the headers and a frozen header row', async () => {
      const { workbook, headers } = await downloadWorkbook(testApp, `/api/circuits/${circuitA.id}/cut-list.xlsx`, fabToken);
      expect(headers['content-type']).toMatch(/spreadsheetml/);
      expect(headers['content-disposition']).toMatch(/attachment; filename=".*rev1-cut-list\.xlsx"/);
      const sheet = workbook.getWorksheet('Cut list');
      if (!sheet) throw new Error('no Cut list sheet');
      const headerRow = rowWith(sheet, 'Cut length (in)');
      expect(headerRow).toBeGreaterThan(0);
      expect(sheet.views[0]).toMatchObject({ state: 'frozen', ySplit: headerRow });
      const header = sheet.getRow(headerRow).values as unknown[];
      const col = (name: string) => header.indexOf(name);
      expect(header).toEqual(expect.arrayContaining(['Cut length (mm)', 'Cut length (in, fraction)', 'Sleeve length (in)']));
      const line = sheet.getRow(headerRow + 1);
      // Worked by hand (DOMAIN §4, as in the rules e2e): 30 − (0.95 + 0.80) − (1.05 + 0.80) + 1.5 slack
      // = 27.90 in → next 1/8 in = 28 in; 28 × 25.4 mm/in (exact by definition) = 711.2 → cut long: 712 mm.
      expect(line.getCell(col('Cut length (in)')).value).toBe(28);
      expect(line.getCell(col('Cut length (in, fraction)')).value).toBe('28"');
      expect(line.getCell(col('Cut length (mm)')).value).toBe(712);
      expect(line.getCell(col('Dash size')).value).toBe('-6');
      expect(line.getCell(col('Supports (count)')).value).toBe(2);
      expect(sheet.getColumn(col('Line')).width).toBeGreaterThan(10);
    });

    it('writes the parts with line totals as formulas and a SUM total that adds up', async () => {
      const { workbook } = await downloadWorkbook(testApp, `/api/circuits/${circuitA.id}/cut-list.xlsx`, fabToken);
      const sheet = workbook.getWorksheet('Parts');
      if (!sheet) throw new Error('no Parts sheet');
      expect(sheet.views[0]).toMatchObject({ state: 'frozen', ySplit: 1 });
      const totalRow = rowWith(sheet, 'Total (before tax)');
      let expected = 0;
      for (let n = 2; n < totalRow; n += 1) {
        const row = sheet.getRow(n);
        const quantity = row.getCell(4).value;
        const price = row.getCell(6).value;
        expect(typeof quantity).toBe('number');
        expect(row.getCell(7).formula).toBe(`D${n}*F${n}`);
        if (typeof price === 'number') {
          expect(row.getCell(7).result).toBeCloseTo((quantity as number) * price, 6);
          expect((row.getCell(7).result as number) * 100).toBeCloseTo((quantity as number) * price * 100, 6);
          expected += (quantity as number) * price;
        }
      }
      const total = sheet.getRow(totalRow).getCell(7);
      expect(total.formula).toBe(`SUM(G2:G${totalRow - 1})`);
      expect(total.result as number).toBeCloseTo(expected, 2);
      // The hose row is in feet: (28 in cut + 1/2 in trim, common practice) / 12 = 2.375 ft.
      const hoseRow = sheet.getRow(rowWith(sheet, 'ft'));
      expect(hoseRow.getCell(4).value).toBeCloseTo(28.5 / 12, 3);
    });

    it('needs draft=1 for a circuit without an approved revision, and hides other shops', async () => {
      await testApp.http().get(`/api/circuits/${draftCircuit.id}/cut-list.xlsx`).set(as(fabToken)).expect(409);
      const { workbook } = await downloadWorkbook(testApp, `/api/circuits/${draftCircuit.id}/cut-list.xlsx?draft=1`, fabToken);
      expect(workbook.getWorksheet('Cut list')?.getCell('A2').value).toMatch(/Draft/);
      await testApp.http().get(`/api/circuits/${circuitA.id}/cut-list.xlsx?revision=9`).set(as(fabToken)).expect(404);
      await testApp.http().get(`/api/circuits/${circuitA.id}/cut-list.xlsx`).set(as(otherToken)).expect(404);
    });
  });

  it('deletes only parts nothing uses; a part on a revision must be retired instead', async () => {
    const used = await testApp.http().delete(`/api/parts/${id('demo-hose-6-rubber')}`).set(as(clerkToken)).expect(409);
    expect(used.body.message).toMatch(/Retire it instead/);
    const created = await testApp
      .http()
      .post('/api/parts')
      .set(as(clerkToken))
      .send({ kind: 'clamp', description: 'Entered by mistake', attributes: { fitsOd: { minIn: 0.5, maxIn: 0.6 } } })
      .expect(201);
    await testApp.http().delete(`/api/parts/${created.body.id}`).set(as(fabToken)).expect(403);
    await testApp.http().delete(`/api/parts/${created.body.id}`).set(as(otherToken)).expect(404);
    await testApp.http().delete(`/api/parts/${created.body.id}`).set(as(clerkToken)).expect(204);
    await testApp.http().get(`/api/parts/${created.body.id}`).set(as(clerkToken)).expect(404);
  });

  describe('orders', () => {
    let orders: ApiOrder[];

    it('refuses circuits that are not approved, and fabricators', async () => {
      await testApp.http().post('/api/orders/draft').set(as(fabToken)).send({ circuitIds: [circuitA.id] }).expect(403);
      const refused = await testApp.http().post('/api/orders/draft').set(as(clerkToken)).send({ circuitIds: [circuitA.id, draftCircuit.id] }).expect(400);
      expect(refused.body.issues).toEqual([expect.objectContaining({ path: 'circuitIds.1' })]);
      await testApp.http().post('/api/orders/draft').set(as(otherToken)).send({ circuitIds: [circuitA.id] }).expect(404);
      expect(await testApp.dataSource.getRepository(OrderEntity).countBy({ shopId: shop.shop.id })).toBe(0);
    });

    it('drafts one order per supplier: summed, stock taken off, whole feet, taxed at the shop rate', async () => {
      const response = await testApp.http().post('/api/orders/draft').set(as(clerkToken)).send({ circuitIds: [circuitA.id, circuitB.id] }).expect(201);
      orders = response.body.orders;
      expect(orders.length).toBeGreaterThan(0);
      const hoseLine = orders.flatMap((order) => order.lines).find((line) => line.partId === id('demo-hose-6-rubber'));
      // Two cuts of 28 in + 1/2 in trim each = 57 in = 4.75 ft; 1 ft on hand → 3.75 ft → 4 whole feet.
      expect(hoseLine).toMatchObject({ quantity: 4, saleUnit: 'foot' });
      for (const order of orders) {
        expect(order.status).toBe('draft');
        const subtotal = order.lines.reduce((sum, line) => sum + line.quantity * line.unitPriceCents, 0);
        expect(order.subtotalCents).toBe(subtotal);
        expect(order.taxCents).toBe(Math.round(subtotal * 0.0825));
        expect(order.totalCents).toBe(subtotal + order.taxCents);
      }
      const listed = await testApp.http().get('/api/orders').set(as(clerkToken)).expect(200);
      expect(listed.body.map((order: ApiOrder) => order.id).sort()).toEqual(orders.map((order) => order.id).sort());
      await testApp.http().get(`/api/orders/${orders[0].id}`).set(as(otherToken)).expect(404);
    });

    it('exports the order sheet with formulas for line totals, subtotal, tax and total', async () => {
      const order = orders[0];
      const { workbook } = await downloadWorkbook(testApp, `/api/orders/${order.id}/export.xlsx`, clerkToken);
      const sheet = workbook.getWorksheet('Order');
      if (!sheet) throw new Error('no Order sheet');
      const header = rowWith(sheet, 'Supplier part number');
      expect(sheet.views[0]).toMatchObject({ state: 'frozen', ySplit: header });
      let expected = 0;
      for (let n = header + 1; n <= header + order.lines.length; n += 1) {
        const row = sheet.getRow(n);
        expect(row.getCell(6).formula).toBe(`C${n}*E${n}`);
        expected += (row.getCell(3).value as number) * (row.getCell(5).value as number);
      }
      const subtotal = sheet.getRow(rowWith(sheet, 'Subtotal')).getCell(6);
      expect(subtotal.formula).toBe(`SUM(F${header + 1}:F${header + order.lines.length})`);
      expect(cents(subtotal.result)).toBe(Math.round(expected * 100));
      const tax = sheet.getRow(rowWith(sheet, 'Tax (8.25 %)')).getCell(6);
      expect(tax.formula).toMatch(/^ROUND\(F\d+\*8\.25\/100,2\)$/);
      expect(cents(tax.result)).toBe(Math.round(expected * 100 * 0.0825));
      const total = sheet.getRow(rowWith(sheet, 'Total')).getCell(6);
      expect(total.formula).toMatch(/^F\d+\+F\d+$/);
      expect(cents(total.result)).toBe(order.totalCents);
    });

    it('puts the order back to draft when the e-mail fails, and answers the error', async () => {
      const order = orders.find((candidate) => candidate.supplierId !== null) as ApiOrder;
      const failure = jest.spyOn(testApp.app.get(MailService), 'send').mockRejectedValueOnce(new MailDeliveryError());
      try {
        const failed = await testApp.http().post(`/api/orders/${order.id}/send`).set(as(clerkToken)).expect(503);
        expect(failed.body.message).toMatch(/could not be sent/);
      } finally {
        failure.mockRestore();
      }
      const after = (await testApp.http().get(`/api/orders/${order.id}`).set(as(clerkToken)).expect(200)).body;
      expect(after).toMatchObject({ status: 'draft', sentAt: null });
      expect(await testApp.dataSource.getRepository(CircuitEntity).countBy({ id: circuitA.id, status: 'approved' })).toBe(1);
    });

    it('e-mails the sheet to the supplier, marks the order sent and the circuits ordered', async () => {
      const order = orders.find((candidate) => candidate.supplierId !== null) as ApiOrder;
      const supplier = await testApp.dataSource.getRepository(SupplierEntity).findOneByOrFail({ id: order.supplierId as string });
      const shown = await testApp.http().get(`/api/orders/${order.id}`).set(as(clerkToken)).expect(200);
      expect(shown.body.supplier).toEqual({ id: supplier.id, name: supplier.name, email: supplier.email, accountNumber: supplier.accountNumber });
      // Two sends at once (a double click, two clerks): the order is claimed once, so one e-mail goes out.
      const attempts = await Promise.all([1, 2].map(() => testApp.http().post(`/api/orders/${order.id}/send`).set(as(clerkToken))));
      expect(attempts.map((attempt) => attempt.status).sort()).toEqual([200, 409]);
      const sent = attempts.find((attempt) => attempt.status === 200)!;
      expect(sent.body).toMatchObject({ status: 'sent', sentAt: expect.any(String) });
      const mails = smtp.messages().filter((message) => message.to.includes(supplier.email));
      expect(mails).toHaveLength(1);
      const mail = mails[0];
      expect(decodeQuotedPrintable(mail?.raw ?? '')).toContain(supplier.accountNumber);
      const [attachment] = attachmentsOf(mail?.raw ?? '');
      expect(attachment).toMatchObject({ contentType: XLSX_CONTENT_TYPE, filename: expect.stringMatching(/^order-.*\.xlsx$/) });
      const attached = new ExcelJS.Workbook();
      await attached.xlsx.load(attachment.content as never);
      const attachedSheet = attached.getWorksheet('Order');
      expect(cents(attachedSheet?.getRow(rowWith(attachedSheet, 'Total')).getCell(6).result)).toBe(order.totalCents);
      const outbox = await testApp.dataSource.getRepository(OutboxEntity).findOneByOrFail({ shopId: shop.shop.id, to: supplier.email });
      expect(outbox).toMatchObject({ status: 'sent', attachmentNames: [attachment.filename] });
      const circuits = await testApp.dataSource.getRepository(CircuitEntity).findBy({ buildId });
      expect(circuits.filter((circuit) => circuit.id !== draftCircuit.id).map((circuit) => circuit.status)).toEqual(['ordered', 'ordered']);
      const trail = await testApp.dataSource.getRepository(AuditEventEntity).findBy({ circuitId: circuitA.id, action: 'order' });
      expect(trail).toEqual([expect.objectContaining({ revisionNumber: 1, details: expect.objectContaining({ orderId: order.id }) })]);
      await testApp.http().post(`/api/orders/${order.id}/send`).set(as(clerkToken)).expect(409);
    });

    it('books partial and final receipts into stock in sale units, refusing more than ordered', async () => {
      const order = orders.find((candidate) => candidate.status === 'draft' && candidate.supplierId !== null) ?? orders[0];
      const sentOrder = (await testApp.http().get(`/api/orders/${order.id}`).set(as(clerkToken)).expect(200)).body as ApiOrder;
      if (sentOrder.status === 'draft') await testApp.http().post(`/api/orders/${order.id}/send`).set(as(clerkToken)).expect(200);
      const line = sentOrder.lines[0];
      const parts = testApp.dataSource.getRepository(PartEntity);
      const before = (await parts.findOneByOrFail({ id: line.partId })).stockOnHand;

      const tooMany = await testApp
        .http()
        .post(`/api/orders/${order.id}/receive`)
        .set(as(clerkToken))
        .send({ lines: [{ orderLineId: line.id, quantity: line.quantity + 1 }] })
        .expect(400);
      expect(tooMany.body.issues[0].path).toBe('lines.0.quantity');
      expect((await parts.findOneByOrFail({ id: line.partId })).stockOnHand).toBe(before);

      const partial = await testApp.http().post(`/api/orders/${order.id}/receive`).set(as(clerkToken)).send({ lines: [{ orderLineId: line.id, quantity: 1 }] }).expect(200);
      expect(partial.body.status).toBe(sentOrder.lines.length === 1 && line.quantity === 1 ? 'received' : 'partially-received');
      expect((await parts.findOneByOrFail({ id: line.partId })).stockOnHand).toBeCloseTo(before + 1, 6);

      const rest = sentOrder.lines
        .map((l) => ({ orderLineId: l.id, quantity: l.quantity - (l.id === line.id ? 1 : 0) }))
        .filter((entry) => entry.quantity > 0);
      if (rest.length) {
        const done = await testApp.http().post(`/api/orders/${order.id}/receive`).set(as(clerkToken)).send({ lines: rest }).expect(200);
        expect(done.body.status).toBe('received');
        expect(done.body.lines.every((l: ApiOrderLine) => l.receivedQuantity === l.quantity)).toBe(true);
      }
      expect((await parts.findOneByOrFail({ id: line.partId })).stockOnHand).toBeCloseTo(before + line.quantity, 6);
      // A new receipt (its own Idempotency-Key, as the web app sends per click) of a received order.
      await testApp
        .http()
        .post(`/api/orders/${order.id}/receive`)
        .set(as(clerkToken))
        .set('Idempotency-Key', 'one-more-receipt')
        .send({ lines: [{ orderLineId: line.id, quantity: 1 }] })
        .expect(409);
    });
  });
});
