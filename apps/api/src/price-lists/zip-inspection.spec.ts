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
  it('accepts a workbook written by exceljs and counts its parts', async () => {
    const verdict = inspectZip(await realWorkbook(), limits);
    expect(verdict).toMatchObject({ ok: true });
    expect(verdict.ok && verdict.entries).toBeGreaterThan(3);
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
