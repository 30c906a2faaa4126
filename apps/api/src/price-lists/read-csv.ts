import { analyse } from 'chardet';
import iconv from 'iconv-lite';
import Papa from 'papaparse';
import { AppError } from '../common/errors/app-error.js';
import { CSV_DELIMITERS, CSV_DELIMITER_NAMES, CSV_ENCODINGS, type CsvDelimiter, type CsvEncoding } from './csv-formats.js';
import { PriceListFileError } from './price-list-errors.js';
import type { RowVisitor } from './read-xlsx.js';

export interface CsvChoice {
  encoding?: CsvEncoding;
  delimiter?: CsvDelimiter;
}

export interface CsvReading {
  encoding: CsvEncoding;
  encodingDetected: boolean;
  delimiter: CsvDelimiter;
  delimiterDetected: boolean;
}

const CHARDET_SAMPLE_BYTES = 256 * 1024;

/** chardet's names of the encodings it can tell apart, for those Linesmith reads. */
const FROM_CHARDET: Record<string, CsvEncoding> = {
  'UTF-8': 'utf-8',
  'UTF-16LE': 'utf-16le',
  'UTF-16BE': 'utf-16be',
  // ISO-8859-1 differs from Windows-1252 only in 0x80–0x9F, control codes no text uses there;
  // WHATWG's Encoding Standard reads the label "latin1" as windows-1252 for the same reason.
  'ISO-8859-1': 'windows-1252',
  'windows-1252': 'windows-1252',
  'windows-1250': 'windows-1250',
  'ISO-8859-2': 'iso-8859-2',
};

/**
 * A byte-order mark decides (Unicode Standard §23.8); text that is valid UTF-8 is UTF-8 (plain
 * ASCII included); otherwise chardet's likeliest encoding among those above, and Windows-1252
 * when it names none of them.
 */
export function detectEncoding(data: Buffer): CsvEncoding {
  if (data[0] === 0xef && data[1] === 0xbb && data[2] === 0xbf) return 'utf-8';
  if (data[0] === 0xff && data[1] === 0xfe) return 'utf-16le';
  if (data[0] === 0xfe && data[1] === 0xff) return 'utf-16be';
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(data);
    return 'utf-8';
  } catch {
    // not UTF-8: ask chardet below
  }
  // chardet reads a sample: 256 kB from just before the first byte outside ASCII.
  const firstHigh = data.findIndex((byte) => byte >= 0x80);
  const from = Math.max(0, firstHigh - 1024);
  for (const match of analyse(data.subarray(from, from + CHARDET_SAMPLE_BYTES))) {
    const known = FROM_CHARDET[match.name];
    if (known && known !== 'utf-8') return known;
  }
  return 'windows-1252';
}

/** papaparse's guess among comma, semicolon and tab from the first ten non-empty records; comma when none fits. */
function guessDelimiter(text: string): CsvDelimiter {
  const { meta } = Papa.parse(text.slice(0, 64 * 1024), {
    delimitersToGuess: CSV_DELIMITER_NAMES.map((name) => CSV_DELIMITERS[name].char),
    skipEmptyLines: 'greedy',
    preview: 10,
  });
  return CSV_DELIMITER_NAMES.find((name) => CSV_DELIMITERS[name].char === meta.delimiter) ?? 'comma';
}

/**
 * Decodes the file (detected or chosen encoding) and parses it with papaparse, guessing the
 * separator among comma, semicolon and tab unless one is chosen. Every record goes to `visit` with
 * its 1-based number (blank records are counted, not visited); a visitor that throws (the row limit) stops the parser there.
 */
export function readCsvRows(data: Buffer, choice: CsvChoice, visit: RowVisitor): CsvReading {
  const encoding = choice.encoding ?? detectEncoding(data);
  if (!(encoding in CSV_ENCODINGS)) throw new PriceListFileError('Choose one of the offered text encodings.');
  const text = iconv.decode(data, encoding);
  if (text.includes('\u0000')) {
    throw new PriceListFileError(`Read as ${CSV_ENCODINGS[encoding]}, the file holds NUL characters: choose its text encoding (UTF-16?).`);
  }
  const delimiter = choice.delimiter ?? guessDelimiter(text);
  let record = 0;
  let stopped: unknown;
  Papa.parse<string[]>(text, {
    delimiter: CSV_DELIMITERS[delimiter].char,
    skipEmptyLines: false,
    step: (result, parser) => {
      record += 1;
      const quoteError = result.errors.find((error) => error.type === 'Quotes');
      try {
        if (quoteError) {
          throw new PriceListFileError(`Row ${record} has a quoted value that is not closed or is followed by stray text; check its quotes.`);
        }
        if (result.data.some((value) => value !== '')) visit(record, result.data);
      } catch (error) {
        stopped = error;
        parser.abort();
      }
    },
  });
  if (stopped instanceof AppError) throw stopped;
  if (stopped) throw new PriceListFileError('The price list cannot be read as CSV.');
  return { encoding, encodingDetected: !choice.encoding, delimiter, delimiterDetected: !choice.delimiter };
}
