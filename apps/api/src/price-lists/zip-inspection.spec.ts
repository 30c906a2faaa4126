import ExcelJS from 'exceljs';
import { deflateRawSync } from 'node:zlib';
import { inspectZip } from './zip-inspection.js';

const limits = { maxInflatedBytes: 10 * 1024 * 1024, maxRatio: 200, maxEntries: 50 };

async function realWorkbook(): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.addWorksheet('Prices').addRow(['Part No', 'Price']);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

describe('inspectZip (PKWARE APPNOTE 4.3.12 central directory, 4.3.16 end record)', () => {
  it('accepts a workbook written by exceljs and lists its parts with where their data starts', async () => {
    const data = await realWorkbook();
    const verdict = inspectZip(data, limits);
    if (!verdict.ok) throw new Error(verdict.reason);
    const sheet = verdict.entries.find((entry) => entry.name === 'xl/worksheets/sheet1.xml');
    expect(sheet).toMatchObject({ method: 8 });
    // The local header (APPNOTE 4.3.7) sits 30 bytes plus name and extra field before the data.
    expect(data.toString('latin1', sheet!.dataOffset - 'xl/worksheets/sheet1.xml'.length, sheet!.dataOffset)).toBe('xl/worksheets/sheet1.xml');
    expect(verdict.entries.map((entry) => entry.name)).toEqual(expect.arrayContaining(['xl/workbook.xml', 'xl/_rels/workbook.xml.rels', 'xl/sharedStrings.xml']));
  });

  it('refuses an encrypted entry and a local header that is not where the directory says', async () => {
    const data = Buffer.from(await realWorkbook());
    const verdict = inspectZip(data, limits);
    if (!verdict.ok) throw new Error(verdict.reason);
    const directory = data.indexOf(Buffer.from([0x50, 0x4b, 0x01, 0x02]));
    const encrypted = Buffer.from(data);
    encrypted.writeUInt16LE(encrypted.readUInt16LE(directory + 8) | 1, directory + 8);
    expect(inspectZip(encrypted, limits)).toMatchObject({ ok: false, reason: expect.stringMatching(/password/) });
    const moved = Buffer.from(data);
    moved.writeUInt32LE(7, directory + 42);
    expect(inspectZip(moved, limits)).toMatchObject({ ok: false, reason: expect.stringMatching(/damaged/) });
  });

  it('refuses what is not a zip, a zip cut short, and an entry that inflates too far', async () => {
    expect(inspectZip(Buffer.from('Part No,Price\nA,1\n'), limits)).toMatchObject({ ok: false, reason: expect.stringMatching(/not an \.xlsx/) });
    const workbook = await realWorkbook();
    expect(inspectZip(workbook.subarray(0, workbook.length - 30), limits)).toMatchObject({ ok: false });
    // 8 MB of zeros deflate to a few kB: a ratio far above 200.
    const zeros = deflateRawSync(Buffer.alloc(8 * 1024 * 1024));
    expect(zeros.length * 200).toBeLessThan(8 * 1024 * 1024);
    const entry = Buffer.alloc(46);
    entry.writeUInt32LE(0x02014b50, 0);
    entry.writeUInt32LE(zeros.length, 20);
    entry.writeUInt32LE(8 * 1024 * 1024, 24);
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    const end = Buffer.alloc(22);
    end.writeUInt32LE(0x06054b50, 0);
    end.writeUInt16LE(1, 10);
    end.writeUInt32LE(local.length + zeros.length, 16);
    const bomb = Buffer.concat([local, zeros, entry, end]);
    expect(inspectZip(bomb, limits)).toMatchObject({ ok: false, reason: expect.stringMatching(/unpack/) });
  });
});
