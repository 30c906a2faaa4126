import ExcelJS from 'exceljs';
import { Readable } from 'node:stream';
import { AppError } from '../common/errors/app-error.js';
import { InflateBudget, openZipEntry } from './inflate-budget.js';
import { PriceListFileError } from './price-list-errors.js';
import {
  PRICE_LIST_IDLE_INFLATE_BYTES,
  PRICE_LIST_INFLATE_BUDGET_BYTES,
  PRICE_LIST_MAX_COLUMNS,
  PRICE_LIST_MAX_SHARED_STRINGS,
  PRICE_LIST_MAX_TOKEN_BYTES,
  PRICE_LIST_ZIP_LIMITS,
} from './price-list-limits.js';
import { inspectZip, type ZipEntry } from './zip-inspection.js';

export type CellValue = string | number | null;

/** Called once per row that holds a value; throwing stops the reading there. */
export type RowVisitor = (row: number, cells: CellValue[]) => void;

/**
 * The parts of exceljs 4.4.0's streaming `WorkbookReader` that parse one entry each. Its own
 * `parse()` unzips with a library that trusts the archive; here every entry comes from
 * `openZipEntry` instead, counted against the budget, and only the entries a price list needs.
 */
interface EntryParsers {
  _parseRels(entry: Readable): Promise<void>;
  _parseWorkbook(entry: Readable): Promise<void>;
  _parseSharedStrings(entry: Readable): AsyncGenerator<{ index: number; text: unknown }>;
  _parseWorksheet(entry: AsyncIterable<unknown>, sheetNo: string): Generator<{ eventType: string; value: AsyncIterable<ExcelJS.Row> }>;
  workbookRels?: Array<{ Id: string; Target: string }>;
  sharedStrings?: unknown[];
  model?: { sheets?: Array<{ name: string; rId: string }> };
}

const DAMAGED = 'The workbook cannot be read; it may be damaged. Save it again as .xlsx and retry.';

/** Plain text or number of a cell; formulas are refused (a price list carries values only). */
export function plainValue(cell: ExcelJS.Cell): CellValue {
  const value = cell.value as ExcelJS.CellValue | { sharedString: number };
  if (value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'string') return value;
  if (typeof value === 'boolean') return String(value);
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if ('formula' in value || 'sharedFormula' in value) {
    throw new PriceListFileError(`Cell ${cell.address} holds a formula. Save the price list with values only and send it again.`);
  }
  if ('richText' in value) return value.richText.map((run) => run.text ?? '').join('');
  if ('text' in value && typeof value.text === 'string') return value.text;
  if ('error' in value) return String(value.error);
  if ('sharedString' in value) throw new PriceListFileError(DAMAGED);
  return null;
}

/** `xl/worksheets/sheet1.xml` from the workbook's relationship target (relative to `xl/`, or absolute). */
function partName(target: string): string {
  return target.startsWith('/') ? target.slice(1) : `xl/${target}`;
}

/**
 * Streams the first sheet of a .xlsx row by row. Only the workbook, its relationships, the shared
 * strings and that sheet are inflated, each through a counting stream that stops at a byte budget
 * the archive's declared sizes cannot change (and that also stops once 1 MB passes without a value);
 * rows are handed to `visit` as they are parsed, so a
 * visitor that throws at a row limit leaves the rest of the sheet unread. Styles are not read, so
 * dates arrive as serial numbers (a price list's columns are text and amounts).
 */
export async function readXlsxRows(data: Buffer, visit: RowVisitor): Promise<{ sheetName: string }> {
  const verdict = inspectZip(data, PRICE_LIST_ZIP_LIMITS);
  if (!verdict.ok) throw new PriceListFileError(verdict.reason);
  const byName = new Map(verdict.entries.map((entry) => [entry.name, entry]));
  const budget = new InflateBudget(PRICE_LIST_INFLATE_BUDGET_BYTES, PRICE_LIST_IDLE_INFLATE_BYTES);
  const opened: Readable[] = [];
  const open = (entry: ZipEntry) => {
    const stream = openZipEntry(data, entry, budget, { maxTokenBytes: PRICE_LIST_MAX_TOKEN_BYTES });
    opened.push(stream);
    return stream;
  };
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(Readable.from([]), {
    worksheets: 'emit',
    sharedStrings: 'emit',
    hyperlinks: 'ignore',
    styles: 'ignore',
    entries: 'ignore',
  }) as unknown as EntryParsers;
  try {
    const workbookEntry = byName.get('xl/workbook.xml');
    if (!workbookEntry) throw new PriceListFileError('The file is not an .xlsx workbook.');
    await reader._parseWorkbook(open(workbookEntry));
    const relsEntry = byName.get('xl/_rels/workbook.xml.rels');
    if (relsEntry) await reader._parseRels(open(relsEntry));
    const first = reader.model?.sheets?.[0];
    const target = first && reader.workbookRels?.find((rel) => rel.Id === first.rId)?.Target;
    const sheetEntry = target ? byName.get(partName(target)) : undefined;
    if (!first || !sheetEntry) throw new PriceListFileError('The workbook has no sheet.');
    const stringsEntry = byName.get('xl/sharedStrings.xml');
    // Emitted one by one (not cached by exceljs) so their number is capped as they come.
    const strings: unknown[] = [];
    if (stringsEntry) {
      for await (const { text } of reader._parseSharedStrings(open(stringsEntry))) {
        if (strings.length === PRICE_LIST_MAX_SHARED_STRINGS) {
          throw new PriceListFileError(`The workbook holds more than ${PRICE_LIST_MAX_SHARED_STRINGS.toLocaleString('en-US')} different texts, far more than a price list has; it was refused.`);
        }
        strings.push(text);
        budget.progress();
      }
    }
    reader.sharedStrings = strings;
    const sheetNo = /sheet(\d+)\.xml$/.exec(sheetEntry.name)?.[1] ?? '1';
    for (const { eventType, value: worksheet } of reader._parseWorksheet(open(sheetEntry), sheetNo)) {
      if (eventType !== 'worksheet') continue;
      let previous = 0;
      for await (const row of worksheet) {
        const number = Number.isInteger(row.number) && row.number > previous ? row.number : previous + 1;
        previous = number;
        const cells: CellValue[] = [];
        row.eachCell({ includeEmpty: false }, (cell, column) => {
          const value = plainValue(cell);
          if (value === null) return;
          if (column > PRICE_LIST_MAX_COLUMNS) {
            throw new PriceListFileError(`Row ${number} has a value in column ${column}; a price list uses at most ${PRICE_LIST_MAX_COLUMNS} columns.`);
          }
          cells[column - 1] = value;
        });
        if (!cells.length) continue;
        budget.progress();
        visit(number, Array.from(cells, (cell) => cell ?? null));
      }
      break;
    }
    return { sheetName: first.name };
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw new PriceListFileError(DAMAGED);
  } finally {
    for (const stream of opened) stream.destroy();
  }
}
