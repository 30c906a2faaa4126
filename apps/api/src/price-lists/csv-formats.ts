/**
 * The text encodings and separators a price-list CSV may be read with: one place for the request
 * schema, the detection and the words of the preview. Names are iconv-lite's.
 */
export const CSV_ENCODINGS = {
  'utf-8': 'UTF-8',
  'utf-16le': 'UTF-16 (little-endian)',
  'utf-16be': 'UTF-16 (big-endian)',
  'windows-1252': 'Windows-1252 (Western European)',
  'iso-8859-15': 'ISO-8859-15 (Western European with €)',
  'windows-1250': 'Windows-1250 (Central European)',
  'iso-8859-2': 'ISO-8859-2 (Central European)',
  macintosh: 'Mac Roman',
} as const;
export type CsvEncoding = keyof typeof CSV_ENCODINGS;
export const CSV_ENCODING_NAMES = Object.keys(CSV_ENCODINGS) as [CsvEncoding, ...CsvEncoding[]];

export const CSV_DELIMITERS = {
  comma: { char: ',', label: 'Comma (,)', words: 'commas' },
  semicolon: { char: ';', label: 'Semicolon (;)', words: 'semicolons' },
  tab: { char: '\t', label: 'Tab', words: 'tabs' },
} as const;
export type CsvDelimiter = keyof typeof CSV_DELIMITERS;
export const CSV_DELIMITER_NAMES = Object.keys(CSV_DELIMITERS) as [CsvDelimiter, ...CsvDelimiter[]];

/** The short name used in sentences: "Windows-1252", not its region. */
export function encodingName(encoding: CsvEncoding): string {
  return CSV_ENCODINGS[encoding].replace(/ \(.*\)$/, '');
}
