import ExcelJS from 'exceljs';
import iconv from 'iconv-lite';
import { PassThrough } from 'node:stream';
import { PartEntity } from '../src/parts/part.entity.js';
import { PriceListsService } from '../src/price-lists/price-lists.service.js';
import { PriceListRowsError } from '../src/price-lists/price-list-errors.js';
import { seedCatalogueInto } from './support/demo-catalogue.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';
import { repeatedPart, SHEET_HEAD, SHEET_TAIL, workbookAround, zipBomb } from './support/zip.js';

interface ApiPart {
  id: string;
  supplierId: string | null;
  supplierPartNumber: string;
  description: string;
  priceCents: number;
}

async function xlsxOf(rows: unknown[][], edit?: (sheet: ExcelJS.Worksheet) => void): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet('Prices');
  for (const row of rows) sheet.addRow(row);
  edit?.(sheet);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

const csvOf = (rows: unknown[][]) => Buffer.from(rows.map((row) => row.join(',')).join('\r\n'));
const latin1CsvOf = (rows: unknown[][], separator: string) => iconv.encode(rows.map((row) => row.join(separator)).join('\r\n'), 'latin1');

/** A workbook of `rows` data rows written by exceljs's streaming writer straight into a buffer. */
async function streamedWorkbook(rows: number): Promise<Buffer> {
  const sink = new PassThrough();
  const chunks: Buffer[] = [];
  sink.on('data', (chunk: Buffer) => chunks.push(chunk));
  const writer = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: sink });
  const sheet = writer.addWorksheet('Prices');
  sheet.addRow(['Part No', 'Net price']).commit();
  for (let index = 0; index < rows; index += 1) sheet.addRow([`HX-${100000 + index}`, 1 + (index % 100) / 4]).commit();
  sheet.commit();
  await writer.commit();
  return Buffer.concat(chunks);
}

/** Runs `work` while sampling the process's resident memory every 5 ms; answers the peak growth and the time. */
async function measured<T>(work: () => Promise<T>): Promise<{ result: T; peakGrowthBytes: number; elapsedMs: number }> {
  const baseline = process.memoryUsage().rss;
  let peak = baseline;
  const sampler = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 5);
  const started = performance.now();
  try {
    const result = await work();
    const elapsedMs = performance.now() - started;
    peak = Math.max(peak, process.memoryUsage().rss);
    return { result, peakGrowthBytes: peak - baseline, elapsedMs };
  } finally {
    clearInterval(sampler);
  }
}
const MB = 1024 * 1024;

describe('price-list import (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let clerkToken: string;
  let fabToken: string;
  let supplierId: string;
  let supplierParts: ApiPart[];
  const mapping = { partNumber: 'Part No', description: 'Description', price: 'Net price' };
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    testApp = await startTestApp();
    shop = await createTestShop(testApp, 'prices');
    await seedCatalogueInto(testApp, shop.shop);
    clerkToken = (await signIn(testApp, (await shop.addUser(['parts-clerk'])).email)).accessToken;
    fabToken = (await signIn(testApp, (await shop.addUser(['fabricator'])).email)).accessToken;
    const suppliers = await testApp.http().get('/api/suppliers').set(as(clerkToken)).expect(200);
    supplierId = suppliers.body[0].id;
    const parts = await testApp.http().get(`/api/parts?supplierId=${supplierId}&pageSize=200`).set(as(clerkToken)).expect(200);
    supplierParts = parts.body.items;
    expect(supplierParts.length).toBeGreaterThanOrEqual(3);
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
  });

  const post = (path: 'preview' | 'commit', file: Buffer, name: string, fields: Record<string, string> = {}, token = clerkToken) => {
    const call = testApp.http().post(`/api/price-lists/${path}`).set(as(token)).field('supplierId', fields.supplierId ?? supplierId);
    for (const field of ['mapping', 'encoding', 'delimiter'] as const) if (fields[field] !== undefined) call.field(field, fields[field]);
    return call.attach('file', file, name);
  };
  const pricesNow = async () => {
    const rows = await testApp.dataSource.getRepository(PartEntity).findBy({ shopId: shop.shop.id, supplierId });
    return new Map(rows.map((row) => [row.id, row.priceCents]));
  };

  it('answers the header row and a guessed mapping for a first look', async () => {
    const file = await xlsxOf([['Part No', 'Description', 'Net price', 'UOM'], [supplierParts[0].supplierPartNumber, 'x', 1, 'each']]);
    const response = await post('preview', file, 'prices.xlsx').expect(200);
    expect(response.body).toMatchObject({
      headers: ['Part No', 'Description', 'Net price', 'UOM'],
      mapping: { partNumber: 'Part No', description: 'Description', price: 'Net price', saleUnit: 'UOM' },
      guessed: true,
    });
  });

  it('previews and commits a good file: updated and unchanged counted, prices written in one go', async () => {
    const [a, b, c] = supplierParts;
    const file = await xlsxOf([
      ['Part No', 'Description', 'Net price'],
      [a.supplierPartNumber, a.description, 12.34],
      [b.supplierPartNumber.toLowerCase(), 'Renamed by the supplier', '$1,234.50'],
      [c.supplierPartNumber, c.description, c.priceCents / 100],
    ]);
    const before = await pricesNow();
    const preview = await post('preview', file, 'prices.xlsx', { mapping: JSON.stringify(mapping) }).expect(200);
    expect(preview.body.report).toEqual([]);
    expect(preview.body.counts).toEqual({ new: 0, updated: 2, unchanged: 1, errors: 0 });
    expect(await pricesNow()).toEqual(before); // a dry run writes nothing

    const committed = await post('commit', file, 'prices.xlsx', { mapping: JSON.stringify(mapping) }).expect(200);
    expect(committed.body.counts).toEqual({ new: 0, updated: 2, unchanged: 1, errors: 0 });
    const after = await pricesNow();
    expect(after.get(a.id)).toBe(1234);
    expect(after.get(b.id)).toBe(123450);
    expect(after.get(c.id)).toBe(c.priceCents);
    const listed = await testApp.http().get(`/api/parts/${b.id}`).set(as(clerkToken)).expect(200);
    expect(listed.body).toMatchObject({ priceCents: 123450, description: 'Renamed by the supplier' });
  });

  it('reads .csv too, keeping part numbers as text', async () => {
    const [a] = supplierParts;
    const file = csvOf([['Part No', 'Net price'], [a.supplierPartNumber, '9.99']]);
    const response = await post('commit', file, 'prices.csv', { mapping: JSON.stringify({ partNumber: 'Part No', price: 'Net price' }) }).expect(200);
    expect(response.body.counts).toMatchObject({ updated: 1 });
    expect((await pricesNow()).get(a.id)).toBe(999);
  });

  it('answers 400 when the mapping names columns the file does not have', async () => {
    const file = await xlsxOf([['SKU', 'Cost'], [supplierParts[0].supplierPartNumber, 1]]);
    const response = await post('preview', file, 'prices.xlsx', { mapping: JSON.stringify(mapping) }).expect(400);
    expect(response.body.issues.map((issue: { path: string }) => issue.path).sort()).toEqual(['mapping.description', 'mapping.partNumber', 'mapping.price']);
  });

  it('reports bad numbers, duplicates and unknown part numbers row by row, and a commit then writes nothing', async () => {
    const [a, b, c] = supplierParts;
    const file = await xlsxOf([
      ['Part No', 'Description', 'Net price'],
      [a.supplierPartNumber, '', 'twelve'],
      [b.supplierPartNumber, '', -5],
      [c.supplierPartNumber, '', '3.456'],
      [a.supplierPartNumber, '', 2],
      ['NO-SUCH-PART', '', 2],
      [b.supplierPartNumber.toUpperCase(), '', 7],
    ]);
    const preview = await post('preview', file, 'prices.xlsx', { mapping: JSON.stringify(mapping) }).expect(200);
    expect(preview.body.report).toEqual([
      { row: 2, column: 'Net price', message: expect.stringMatching(/amount/) },
      { row: 3, column: 'Net price', message: expect.stringMatching(/amount/) },
      { row: 4, column: 'Net price', message: expect.stringMatching(/amount/) },
      { row: 5, column: 'Part No', message: expect.stringMatching(/appears again \(first on row 2\)/) },
      { row: 6, column: 'Part No', message: expect.stringMatching(/Unknown part number NO-SUCH-PART/) },
      { row: 7, column: 'Part No', message: expect.stringMatching(/first on row 3/) },
    ]);
    expect(preview.body.counts).toEqual({ new: 0, updated: 0, unchanged: 0, errors: 6 });
    const before = await pricesNow();
    const refused = await post('commit', file, 'prices.xlsx', { mapping: JSON.stringify(mapping) }).expect(400);
    expect(refused.body.report).toHaveLength(6);
    expect(await pricesNow()).toEqual(before);
  });

  it('rolls back every row when one fails while writing', async () => {
    const [a, b] = supplierParts;
    const file = await xlsxOf([
      ['Part No', 'Description', 'Net price'],
      [a.supplierPartNumber, a.description, 77.77],
      [b.supplierPartNumber, b.description, 88.88],
    ]);
    const before = await pricesNow();
    const service = testApp.app.get(PriceListsService) as unknown as { writeRow: (...args: unknown[]) => Promise<void> };
    const original = service.writeRow.bind(service);
    let calls = 0;
    const spy = jest.spyOn(service, 'writeRow').mockImplementation(async (...args: unknown[]) => {
      calls += 1;
      if (calls === 2) throw new PriceListRowsError([{ row: 3, column: '', message: 'could not be saved' }], { errors: 1 });
      return original(...args);
    });
    try {
      const refused = await post('commit', file, 'prices.xlsx', { mapping: JSON.stringify(mapping) }).expect(400);
      expect(refused.body.report).toEqual([{ row: 3, column: '', message: 'could not be saved' }]);
    } finally {
      spy.mockRestore();
    }
    expect(calls).toBe(2);
    // Row 2 was written inside the transaction, then rolled back with it.
    expect(await pricesNow()).toEqual(before);
  });

  it('refuses a truncated workbook, a file that is not one, a zip bomb and formulas, changing nothing', async () => {
    const before = await pricesNow();
    const good = await xlsxOf([['Part No', 'Net price'], [supplierParts[0].supplierPartNumber, 5]]);
    const simple = JSON.stringify({ partNumber: 'Part No', price: 'Net price' });
    const truncated = await post('commit', good.subarray(0, Math.floor(good.length / 2)), 'prices.xlsx', { mapping: simple }).expect(400);
    expect(truncated.body.message).toMatch(/incomplete|damaged/);
    const notZip = await post('preview', Buffer.from('this is not a workbook at all'), 'prices.xlsx').expect(400);
    expect(notZip.body.message).toMatch(/not an \.xlsx/);
    const bomb = await post('preview', zipBomb(64 * 1024 * 1024), 'prices.xlsx').expect(400);
    expect(bomb.body.message).toMatch(/unpack to far more/);
    const withFormula = await xlsxOf([['Part No', 'Net price'], [supplierParts[0].supplierPartNumber, 5]], (sheet) => {
      sheet.getCell('B2').value = { formula: '2+3', result: 5 } as ExcelJS.CellFormulaValue;
    });
    const formula = await post('commit', withFormula, 'prices.xlsx', { mapping: simple }).expect(400);
    expect(formula.body.message).toMatch(/B2 holds a formula/);
    expect(await pricesNow()).toEqual(before);
  });

  it('refuses more than 20,000 rows and files over 5 MB with a clear message', async () => {
    const rows: unknown[][] = [['Part No', 'Net price']];
    for (let index = 0; index < 20_001; index += 1) rows.push([`P${index}`, '1.00']);
    const tooMany = await post('preview', csvOf(rows), 'prices.csv').expect(400);
    expect(tooMany.body.message).toMatch(/more than 20,000 rows; at most 20,000 are taken/);
    const tooLarge = await post('preview', Buffer.alloc(5 * 1024 * 1024 + 1, 'a'), 'prices.csv').expect(413);
    expect(tooLarge.body.message).toMatch(/larger than 5 MB/);
  });

  it('is for the parts clerk and admin, and only with the shop’s own suppliers', async () => {
    const file = csvOf([['Part No', 'Net price'], ['X', '1']]);
    await post('preview', file, 'prices.csv', {}, fabToken).expect(403);
    const foreign = await post('preview', file, 'prices.csv', { supplierId: '00000000-0000-4000-8000-000000000000' }).expect(400);
    expect(foreign.body.issues[0].path).toBe('supplierId');
    const missing = await testApp.http().post('/api/price-lists/preview').set(as(clerkToken)).field('supplierId', supplierId).expect(400);
    expect(missing.body.issues[0].path).toBe('file');
  });
  it('refuses a workbook that declares 2:1 but inflates to 300 MB within 1 s, memory growing under 50 MB', async () => {
    const header = '<row r="1"><c r="A1" t="inlineStr"><is><t>Part No</t></is></c><c r="B1" t="inlineStr"><is><t>Net price</t></is></c></row>';
    const sheet = await repeatedPart('xl/worksheets/sheet1.xml', SHEET_HEAD + header, '<row r="2"/>', 300 * MB, SHEET_TAIL);
    sheet.declaredBytes = sheet.deflated.length * 2; // honest-looking: 2:1
    const bomb = workbookAround(sheet);
    expect(bomb.length).toBeLessThan(MB); // about 600 kB: deflate packs a 12-byte tag some 500:1
    const before = await pricesNow();
    const { result, elapsedMs, peakGrowthBytes } = await measured(() => post('commit', bomb, 'prices.xlsx', { mapping: JSON.stringify({ partNumber: 'Part No', price: 'Net price' }) }));
    console.info(`inflating .xlsx (${Math.round(bomb.length / 1024)} kB → 300 MB): refused in ${Math.round(elapsedMs)} ms, rss +${(peakGrowthBytes / MB).toFixed(1)} MB`);
    expect(result.status).toBe(400);
    expect(result.body).toMatchObject({ code: 'validation_failed', message: expect.stringMatching(/more than 1 MB of data with no value in it/) });
    expect(elapsedMs).toBeLessThan(1000);
    expect(peakGrowthBytes).toBeLessThan(50 * MB);
    expect(await pricesNow()).toEqual(before);
  });

  it('refuses a 300,000-row workbook at the row limit without reading the rest', async () => {
    const workbook = await streamedWorkbook(300_000);
    const { result, elapsedMs, peakGrowthBytes } = await measured(() => post('preview', workbook, 'prices.xlsx'));
    console.info(`300,000-row .xlsx (${(workbook.length / MB).toFixed(1)} MB): refused in ${Math.round(elapsedMs)} ms, rss +${(peakGrowthBytes / MB).toFixed(1)} MB`);
    expect(result.status).toBe(400);
    expect(result.body.message).toBe('The price list has more than 20,000 rows; at most 20,000 are taken at a time. Split it into smaller files.');
    expect(elapsedMs).toBeLessThan(2000);
    expect(peakGrowthBytes).toBeLessThan(50 * MB);
  });

  it('maps the columns of a semicolon-separated Latin-1 file and says how it was read', async () => {
    const [a] = supplierParts;
    const file = latin1CsvOf(
      [
        ['Part No', 'Description', 'Net price'],
        [a.supplierPartNumber, 'Dörr-Anschluss Ø 3/8', '12,50'],
      ],
      ';',
    );
    const first = await post('preview', file, 'preise.csv').expect(200);
    expect(first.body.readAs).toMatchObject({
      format: 'csv',
      encoding: 'windows-1252',
      delimiter: 'semicolon',
      encodingDetected: true,
      delimiterDetected: true,
      summary: 'Read as Windows-1252, separated by semicolons.',
    });
    expect(first.body.readAs.choices.delimiters.map((choice: { value: string }) => choice.value)).toEqual(['comma', 'semicolon', 'tab']);
    expect(first.body.headers).toEqual(['Part No', 'Description', 'Net price']);
    expect(first.body.mapping).toEqual({ partNumber: 'Part No', description: 'Description', price: 'Net price' });
    const checked = await post('preview', file, 'preise.csv', { mapping: JSON.stringify(mapping) }).expect(200);
    expect(checked.body.report).toEqual([]);
    expect(checked.body.rows).toEqual([expect.objectContaining({ priceCents: 1250, description: 'Dörr-Anschluss Ø 3/8', status: 'updated' })]);

    const asComma = await post('preview', file, 'preise.csv', { delimiter: 'comma', encoding: 'utf-8' }).expect(200);
    expect(asComma.body.readAs).toMatchObject({ summary: 'Read as UTF-8 (as chosen), separated by commas (as chosen).', encodingDetected: false });
    expect(asComma.body.headers).toEqual(['Part No;Description;Net price']);
    const refused = await post('preview', file, 'preise.csv', { encoding: 'ebcdic', delimiter: 'pipe' }).expect(400);
    expect(refused.body.issues.map((issue: { path: string }) => issue.path).sort()).toEqual(['delimiter', 'encoding']);
  });

  it('previews and commits a Latin-1 file with commas as the right text', async () => {
    const [a, b] = supplierParts;
    const file = latin1CsvOf(
      [
        ['Part No', 'Description', 'Net price'],
        [a.supplierPartNumber, 'Dörr fitting Ø 3/8', '4.75'],
        [b.supplierPartNumber, 'Schlauch für Öl -8', '6.10'],
      ],
      ',',
    );
    const preview = await post('preview', file, 'prices.csv', { mapping: JSON.stringify(mapping) }).expect(200);
    expect(preview.body.readAs.summary).toBe('Read as Windows-1252, separated by commas.');
    expect(preview.body.rows.map((row: { description: string }) => row.description)).toEqual(['Dörr fitting Ø 3/8', 'Schlauch für Öl -8']);
    await post('commit', file, 'prices.csv', { mapping: JSON.stringify(mapping) }).expect(200);
    const stored = await testApp.dataSource.getRepository(PartEntity).findBy({ shopId: shop.shop.id, supplierId });
    const byId = new Map(stored.map((row) => [row.id, row]));
    expect(byId.get(a.id)).toMatchObject({ description: 'Dörr fitting Ø 3/8', priceCents: 475 });
    expect(byId.get(b.id)).toMatchObject({ description: 'Schlauch für Öl -8', priceCents: 610 });
  });
});
