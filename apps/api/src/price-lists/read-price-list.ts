import { CSV_DELIMITERS, CSV_DELIMITER_NAMES, CSV_ENCODINGS, CSV_ENCODING_NAMES, encodingName, type CsvDelimiter, type CsvEncoding } from './csv-formats.js';
import { PriceListFileError } from './price-list-errors.js';
import { PRICE_LIST_MAX_ROWS } from './price-list-limits.js';
import { readCsvRows, type CsvChoice } from './read-csv.js';
import { readXlsxRows, type CellValue } from './read-xlsx.js';

export type { CellValue } from './read-xlsx.js';

/** How the file was read, in plain words for the preview, and what may be chosen instead. */
export type PriceListReading =
  | { format: 'xlsx'; sheetName: string; summary: string }
  | {
      format: 'csv';
      encoding: CsvEncoding;
      encodingDetected: boolean;
      delimiter: CsvDelimiter;
      delimiterDetected: boolean;
      summary: string;
      choices: { encodings: Array<{ value: CsvEncoding; label: string }>; delimiters: Array<{ value: CsvDelimiter; label: string }> };
    };

export interface PriceListSheet {
  headers: string[];
  /** Data rows below the header row; `row` is the 1-based row number in the file. */
  rows: Array<{ row: number; cells: CellValue[] }>;
  readAs: PriceListReading;
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

const CSV_CHOICES = {
  encodings: CSV_ENCODING_NAMES.map((value) => ({ value, label: CSV_ENCODINGS[value] })),
  delimiters: CSV_DELIMITER_NAMES.map((value) => ({ value, label: CSV_DELIMITERS[value].label })),
};

/**
 * Reads the first sheet (or the CSV): the first row holding a value is the header row, every later
 * such row is data. Reading stops at the row after the limit, so the rest of a huge file is never
 * parsed.
 */
export async function readPriceList(file: UploadedFile, choice: CsvChoice = {}): Promise<PriceListSheet> {
  let headers: string[] | undefined;
  const rows: PriceListSheet['rows'] = [];
  const visit = (row: number, raw: readonly CellValue[]) => {
    const cells = raw.map((cell) => (typeof cell === 'string' ? cell.trim() || null : cell));
    if (cells.every((cell) => cell === null)) return;
    if (!headers) {
      headers = cells.map((cell, index) => (cell === null ? `Column ${index + 1}` : String(cell)));
      return;
    }
    if (rows.length === PRICE_LIST_MAX_ROWS) {
      throw new PriceListFileError(
        `The price list has more than ${PRICE_LIST_MAX_ROWS.toLocaleString('en-US')} rows; at most ${PRICE_LIST_MAX_ROWS.toLocaleString('en-US')} are taken at a time. Split it into smaller files.`,
      );
    }
    rows.push({ row, cells });
  };
  let readAs: PriceListReading;
  if (kindOf(file) === 'csv') {
    const reading = readCsvRows(file.buffer, choice, visit);
    const chosen = (detected: boolean) => (detected ? '' : ' (as chosen)');
    readAs = {
      format: 'csv',
      ...reading,
      summary: `Read as ${encodingName(reading.encoding)}${chosen(reading.encodingDetected)}, separated by ${CSV_DELIMITERS[reading.delimiter].words}${chosen(reading.delimiterDetected)}.`,
      choices: CSV_CHOICES,
    };
  } else {
    const { sheetName } = await readXlsxRows(file.buffer, visit);
    readAs = { format: 'xlsx', sheetName, summary: `Read the first sheet, “${sheetName}”.` };
  }
  if (!headers) throw new PriceListFileError('The price list is empty.');
  return { headers, rows, readAs };
}
