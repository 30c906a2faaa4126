import ExcelJS from 'exceljs';
import { partOf, repeatedPart, SHEET_HEAD, SHEET_TAIL, workbookAround } from '../../test/support/zip.js';
import { PriceListFileError } from './price-list-errors.js';
import { readXlsxRows, type CellValue } from './read-xlsx.js';

const HEADER_ROW = '<row r="1"><c r="A1" t="inlineStr"><is><t>Part No</t></is></c><c r="B1" t="inlineStr"><is><t>Net price</t></is></c></row>';

async function rowsOf(data: Buffer, stopAfter = Infinity) {
  const rows: Array<{ row: number; cells: CellValue[] }> = [];
  const result = await readXlsxRows(data, (row, cells) => {
    if (rows.length === stopAfter) throw new PriceListFileError('stop');
    rows.push({ row, cells });
  });
  return { ...result, rows };
}

describe('readXlsxRows (streaming, counted inflation)', () => {
  it('reads the first sheet of a workbook written by exceljs: shared strings, numbers, rich text, row numbers', async () => {
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('Harbor prices');
    sheet.addRow(['Part No', 'Description', 'Net price']);
    sheet.addRow(['HX-100', 'Dörr-Anschluss Ø 3/8', 12.5]);
    sheet.addRow([]);
    sheet.addRow(['HX-101', { richText: [{ text: 'Hose ' }, { text: '-8', font: { bold: true } }] }, 3]);
    workbook.addWorksheet('Notes').addRow(['not read']);
    const result = await rowsOf(Buffer.from(await workbook.xlsx.writeBuffer()));
    expect(result.sheetName).toBe('Harbor prices');
    expect(result.rows).toEqual([
      { row: 1, cells: ['Part No', 'Description', 'Net price'] },
      { row: 2, cells: ['HX-100', 'Dörr-Anschluss Ø 3/8', 12.5] },
      { row: 4, cells: ['HX-101', 'Hose -8', 3] },
    ]);
  });

  it('keeps a character whole when the inflater splits it between two chunks', async () => {
    // 16 kB chunks: pad the first cell so "Ø" (2 bytes in UTF-8) straddles a chunk boundary somewhere.
    const cells = Array.from({ length: 40 }, (_, index) => `<row r="${index + 2}"><c r="A${index + 2}" t="inlineStr"><is><t>${'x'.repeat(997)}Ø</t></is></c></row>`);
    const data = workbookAround(partOf('xl/worksheets/sheet1.xml', SHEET_HEAD + HEADER_ROW + cells.join('') + SHEET_TAIL));
    const { rows } = await rowsOf(data);
    expect(rows).toHaveLength(41);
    for (const { cells: values } of rows.slice(1)) expect(values[0]).toBe(`${'x'.repeat(997)}Ø`);
  });

  it('stops reading where the visitor throws', async () => {
    const body = Array.from({ length: 5000 }, (_, index) => `<row r="${index + 2}"><c r="A${index + 2}"><v>${index}</v></c></row>`).join('');
    const data = workbookAround(partOf('xl/worksheets/sheet1.xml', SHEET_HEAD + HEADER_ROW + body + SHEET_TAIL));
    let visited = 0;
    await expect(
      readXlsxRows(data, () => {
        visited += 1;
        if (visited === 10) throw new PriceListFileError('stop');
      }),
    ).rejects.toThrow('stop');
    expect(visited).toBe(10);
  });

  it('refuses formulas with the cell named', async () => {
    const workbook = new ExcelJS.Workbook();
    workbook.addWorksheet('Prices').addRow(['Part No', 'Net price']);
    workbook.getWorksheet('Prices')!.getCell('B2').value = { formula: '2+3', result: 5 } as ExcelJS.CellFormulaValue;
    await expect(rowsOf(Buffer.from(await workbook.xlsx.writeBuffer()))).rejects.toThrow(/B2 holds a formula/);
  });

  it('refuses a sheet that declares 2:1 but runs on with empty rows, within 1 MB of inflating nothing useful', async () => {
    const sheet = await repeatedPart('xl/worksheets/sheet1.xml', SHEET_HEAD + HEADER_ROW, '<row r="2"/>', 64 * 1024 * 1024, SHEET_TAIL);
    sheet.declaredBytes = sheet.deflated.length * 2;
    const started = performance.now();
    await expect(rowsOf(workbookAround(sheet))).rejects.toThrow(/more than 1 MB of data with no value/);
    // Stops long before the 64 MB are inflated; the 1 s figure of the issue is asserted end to end in
    // price-lists.e2e-spec.ts, this bound only has to survive a busy CI machine.
    expect(performance.now() - started).toBeLessThan(10_000);
  }, 60_000);

  it('refuses a sheet that keeps finding values but inflates past the 16 MB budget', async () => {
    // One value every 0.75 MB of empty rows: never idle for 1 MB, but the total passes 16 MB.
    const filler = '<row r="3"/>'.repeat(Math.floor((0.75 * 1024 * 1024) / 12));
    const unit = filler + '<row r="2"><c r="A2"><v>1</v></c></row>';
    const sheet = await repeatedPart('xl/worksheets/sheet1.xml', SHEET_HEAD + HEADER_ROW, unit, 40 * 1024 * 1024, SHEET_TAIL);
    sheet.declaredBytes = sheet.deflated.length * 2;
    await expect(rowsOf(workbookAround(sheet))).rejects.toThrow(/unpacks to more than 16 MB/);
  }, 180_000);

  it('refuses one endless value or a run of bytes that is not XML before holding it', async () => {
    const spaces = await repeatedPart('xl/worksheets/sheet1.xml', SHEET_HEAD + HEADER_ROW + '<row r="2"><c r="A2" t="inlineStr"><is><t>', 'A', 8 * 1024 * 1024, '</t></is></c></row>' + SHEET_TAIL);
    spaces.declaredBytes = spaces.deflated.length * 2;
    await expect(rowsOf(workbookAround(spaces))).rejects.toThrow(/longer than 1 MB/);
    const zeros = await repeatedPart('xl/worksheets/sheet1.xml', SHEET_HEAD + HEADER_ROW, '\0', 8 * 1024 * 1024, SHEET_TAIL);
    zeros.declaredBytes = zeros.deflated.length * 2;
    await expect(rowsOf(workbookAround(zeros))).rejects.toThrow(/cannot be read|longer than 1 MB/);
  }, 120_000);

  it('refuses damaged deflate data and a workbook with no sheet', async () => {
    const sheet = partOf('xl/worksheets/sheet1.xml', SHEET_HEAD + HEADER_ROW + SHEET_TAIL);
    const damaged = { ...sheet, deflated: Buffer.concat([sheet.deflated.subarray(0, 20), Buffer.alloc(40, 0xff)]) };
    await expect(rowsOf(workbookAround(damaged))).rejects.toThrow(/cannot be read/);
    const misnamed = { ...sheet, name: 'xl/worksheets/other.xml' };
    await expect(rowsOf(workbookAround(misnamed))).rejects.toThrow(/no sheet/);
  });
});
