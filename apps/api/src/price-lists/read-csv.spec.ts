import iconv from 'iconv-lite';
import { PriceListFileError } from './price-list-errors.js';
import { detectEncoding, readCsvRows, type CsvChoice } from './read-csv.js';
import type { CellValue } from './read-xlsx.js';

function read(data: Buffer, choice: CsvChoice = {}) {
  const rows: Array<{ row: number; cells: CellValue[] }> = [];
  const reading = readCsvRows(data, choice, (row, cells) => {
    rows.push({ row, cells });
  });
  return { reading, rows };
}

const latin1 = (text: string) => iconv.encode(text, 'latin1');

describe('detectEncoding', () => {
  it('follows a byte-order mark, takes valid UTF-8 (and plain ASCII) as UTF-8, and Latin-1 text as Windows-1252', () => {
    expect(detectEncoding(Buffer.from([0xef, 0xbb, 0xbf, 0x41]))).toBe('utf-8');
    expect(detectEncoding(Buffer.from([0xff, 0xfe, 0x41, 0x00]))).toBe('utf-16le');
    expect(detectEncoding(Buffer.from([0xfe, 0xff, 0x00, 0x41]))).toBe('utf-16be');
    expect(detectEncoding(Buffer.from('Part No,Price\nA,1\n'))).toBe('utf-8');
    expect(detectEncoding(Buffer.from('Part No,Description\nA,Dörr Ø 3/8\n'))).toBe('utf-8');
    expect(detectEncoding(latin1('Artikelnr;Beschreibung;Preis\r\nHX-100;Dörr-Anschluss Ø 3/8;12,50\r\nHX-101;Schlauch für Öl;3,20\r\n'))).toBe('windows-1252');
    // 0x80 is € only in Windows-1252 (in ISO-8859-1 it is a control code).
    expect(detectEncoding(Buffer.from([...Buffer.from('Part,Price\nA,'), 0x80, 0x31, 0x0a]))).toBe('windows-1252');
  });
});

describe('readCsvRows', () => {
  it('reads a semicolon-separated Latin-1 file: separator and encoding detected, text intact', () => {
    const { reading, rows } = read(latin1('Artikelnr;Beschreibung;Preis\r\nHX-100;Dörr-Anschluss Ø 3/8;12,50\r\n'));
    expect(reading).toEqual({ encoding: 'windows-1252', encodingDetected: true, delimiter: 'semicolon', delimiterDetected: true });
    expect(rows).toEqual([
      { row: 1, cells: ['Artikelnr', 'Beschreibung', 'Preis'] },
      { row: 2, cells: ['HX-100', 'Dörr-Anschluss Ø 3/8', '12,50'] },
    ]);
  });

  it('detects tabs and commas, keeps quoted separators and line breaks inside a value, numbers stay text', () => {
    expect(read(Buffer.from('Part No\tPrice\nA\t1.50\n')).reading.delimiter).toBe('tab');
    const { reading, rows } = read(Buffer.from('Part No,Description,Price\n0123,"Hose, -8\n2-wire",1.50\n'));
    expect(reading.delimiter).toBe('comma');
    expect(rows[1]).toEqual({ row: 2, cells: ['0123', 'Hose, -8\n2-wire', '1.50'] });
  });

  it('takes the chosen encoding and separator over what it would detect', () => {
    const data = latin1('Part No;Description\nA;Dörr\n');
    const chosen = read(data, { encoding: 'windows-1250', delimiter: 'comma' });
    expect(chosen.reading).toEqual({ encoding: 'windows-1250', encodingDetected: false, delimiter: 'comma', delimiterDetected: false });
    expect(chosen.rows[0].cells).toEqual(['Part No;Description']);
    expect(read(Buffer.from('a;b\n'), { encoding: 'utf-16le' as never }).reading.encoding).toBe('utf-16le');
  });

  it('refuses an unclosed quote with its row, and NUL characters with a hint at the encoding', () => {
    expect(() => read(Buffer.from('Part No,Price\nA,1\n"B,2\n'))).toThrow(/Row 3 has a quoted value/);
    expect(() => read(iconv.encode('Part No,Price\nA,1\n', 'utf-16le'), { encoding: 'windows-1252' })).toThrow(/NUL characters/);
  });

  it('stops parsing where the visitor throws', () => {
    const data = Buffer.from(['Part No,Price', ...Array.from({ length: 10_000 }, (_, index) => `P${index},1`)].join('\n'));
    let visited = 0;
    expect(() =>
      readCsvRows(data, {}, () => {
        visited += 1;
        if (visited === 100) throw new PriceListFileError('enough');
      }),
    ).toThrow('enough');
    expect(visited).toBe(100);
  });
});
