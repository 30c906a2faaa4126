import ExcelJS from 'exceljs';
import { Readable } from 'node:stream';
import { PriceListFileError } from './price-list-errors.js';
import { PRICE_LIST_MAX_ROWS, PRICE_LIST_ZIP_LIMITS } from './price-list-limits.js';
import { inspectZip } from './zip-inspection.js';

export type CellValue = string | number | null;

export interface PriceListSheet {
  headers: string[];
  /** Data rows below the header row; `row` is the 1-based row number in the file. */
  rows: Array<{ row: number; cells: CellValue[] }>;
}

export interface UploadedFile {
  buffer: Buffer;
  originalname: string;
  mimetype: string;
}

function kindOf(file: UploadedFile): 'csv' | 'xlsx' {
  const name = file.originalname.toLowerCase();
  if (name.endsWith('.csv') || file.mimetype === 'text/csv') return 'csv';
  if (name.endsWith('.xlsx') || file.buffer.subarray(0, 2).toString('latin1') === 'PK') return 'xlsx';
  throw new PriceListFileError('Send the price list as an .xlsx workbook or a .csv file.');
}

/** Plain text or number of a cell; formulas are refused (a price list carries values only). */
function plainValue(cell: ExcelJS.Cell): CellValue {
  const value = cell.value;
  if (value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'string') return value;
  if (typeof value === 'boolean') return String(value);
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if ('formula' in value || 'sharedFormula' in value) {
    throw new PriceListFileError(`Cell ${cell.address} holds a formula. Save the price list with values only and send it again.`);
  }
  if ('richText' in value) return value.richText.map((run) => run.text).join('');
  if ('text' in value && typeof value.text === 'string') return value.text;
  if ('error' in value) return String(value.error);
  return null;
}

async function loadWorkbook(file: UploadedFile, kind: 'csv' | 'xlsx'): Promise<ExcelJS.Worksheet> {
  const workbook = new ExcelJS.Workbook();
  if (kind === 'csv') {
    // Keep every field as text (the default map turns "0123" into 123 and some numbers into dates).
    return workbook.csv.read(Readable.from([file.buffer]), { map: (datum: string) => (datum === '' ? null : datum) } as never);
  }
  const verdict = inspectZip(file.buffer, PRICE_LIST_ZIP_LIMITS);
  if (!verdict.ok) throw new PriceListFileError(verdict.reason);
  try {
    await workbook.xlsx.load(file.buffer as never);
  } catch {
    throw new PriceListFileError('The workbook cannot be read; it may be damaged. Save it again as .xlsx and retry.');
  }
  const sheet = workbook.worksheets[0];
  if (!sheet) throw new PriceListFileError('The workbook has no sheet.');
  return sheet;
}

/** Reads the first sheet: the first non-empty row is the header row, every later non-empty row is data. */
export async function readPriceList(file: UploadedFile): Promise<PriceListSheet> {
  const sheet = await loadWorkbook(file, kindOf(file));
  if (sheet.actualRowCount > PRICE_LIST_MAX_ROWS + 1) {
    throw new PriceListFileError(
      `The price list has ${(sheet.actualRowCount - 1).toLocaleString('en-US')} rows; at most ${PRICE_LIST_MAX_ROWS.toLocaleString('en-US')} are taken at a time. Split it into smaller files.`,
    );
  }
  let headers: string[] | undefined;
  const rows: PriceListSheet['rows'] = [];
  sheet.eachRow({ includeEmpty: false }, (row, number) => {
    const width = Math.max(row.cellCount, headers?.length ?? 0);
    const cells: CellValue[] = [];
    for (let column = 1; column <= width; column += 1) {
      const value = plainValue(row.getCell(column));
      cells.push(typeof value === 'string' ? value.trim() || null : value);
    }
    if (cells.every((cell) => cell === null)) return;
    if (!headers) headers = cells.map((cell, index) => (cell === null ? `Column ${index + 1}` : String(cell)));
    else rows.push({ row: number, cells });
  });
  if (!headers) throw new PriceListFileError('The price list is empty.');
  return { headers, rows };
}
