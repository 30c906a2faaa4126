import { once } from 'node:events';
import { crc32, createDeflateRaw, deflateRawSync } from 'node:zlib';

/**
 * A one-entry zip (PKWARE APPNOTE 4.3.7, 4.3.12, 4.3.16) whose entry inflates to `inflatedBytes`
 * of zeros: tiny on the wire, huge once unpacked. The CRC is left 0; inspection must refuse it
 * before anything tries to inflate it.
 */
export function zipBomb(inflatedBytes: number, name = 'xl/worksheets/sheet1.xml'): Buffer {
  const data = deflateRawSync(Buffer.alloc(inflatedBytes));
  const fileName = Buffer.from(name);
  const local = Buffer.alloc(30);
  local.writeUInt32LE(0x04034b50, 0);
  local.writeUInt16LE(20, 4);
  local.writeUInt16LE(8, 8); // deflate
  local.writeUInt32LE(data.length, 18);
  local.writeUInt32LE(inflatedBytes, 22);
  local.writeUInt16LE(fileName.length, 26);
  const central = Buffer.alloc(46);
  central.writeUInt32LE(0x02014b50, 0);
  central.writeUInt16LE(20, 4);
  central.writeUInt16LE(20, 6);
  central.writeUInt16LE(8, 10);
  central.writeUInt32LE(data.length, 20);
  central.writeUInt32LE(inflatedBytes, 24);
  central.writeUInt16LE(fileName.length, 28);
  central.writeUInt32LE(0, 42);
  const directoryOffset = local.length + fileName.length + data.length;
  const directorySize = central.length + fileName.length;
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(1, 8);
  end.writeUInt16LE(1, 10);
  end.writeUInt32LE(directorySize, 12);
  end.writeUInt32LE(directoryOffset, 16);
  return Buffer.concat([local, fileName, data, central, fileName, end]);
}

export interface ZipPart {
  name: string;
  /** Raw deflate data (method 8). */
  deflated: Buffer;
  crc32: number;
  inflatedBytes: number;
  /** What the archive claims the part inflates to; the true size unless a test lies. */
  declaredBytes?: number;
}

/** A zip of deflated parts with local headers, central directory and end record (APPNOTE 4.3.7, 4.3.12, 4.3.16). */
export function zipOf(parts: readonly ZipPart[]): Buffer {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const part of parts) {
    const name = Buffer.from(part.name);
    const declared = part.declaredBytes ?? part.inflatedBytes;
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(20, 4);
    local.writeUInt16LE(0x0800, 6); // UTF-8 names
    local.writeUInt16LE(8, 8);
    local.writeUInt32LE(part.crc32, 14);
    local.writeUInt32LE(part.deflated.length, 18);
    local.writeUInt32LE(declared, 22);
    local.writeUInt16LE(name.length, 26);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(20, 4);
    central.writeUInt16LE(20, 6);
    central.writeUInt16LE(0x0800, 8);
    central.writeUInt16LE(8, 10);
    central.writeUInt32LE(part.crc32, 16);
    central.writeUInt32LE(part.deflated.length, 20);
    central.writeUInt32LE(declared, 24);
    central.writeUInt16LE(name.length, 28);
    central.writeUInt32LE(offset, 42);
    locals.push(local, name, part.deflated);
    centrals.push(central, name);
    offset += local.length + name.length + part.deflated.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.length, 8);
  end.writeUInt16LE(parts.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, directory, end]);
}

export function partOf(name: string, text: string): ZipPart {
  const data = Buffer.from(text);
  return { name, deflated: deflateRawSync(data), crc32: crc32(data), inflatedBytes: data.length };
}

/**
 * `head`, then `unit` repeated until the part holds `inflatedBytes`, then `tail`, deflated as a
 * stream so the test never holds the inflated text: 300 MB of a short repeated tag deflate to
 * about 300 kB.
 */
export async function repeatedPart(name: string, head: string, unit: string, inflatedBytes: number, tail: string): Promise<ZipPart> {
  const deflater = createDeflateRaw({ level: 9 });
  const out: Buffer[] = [];
  deflater.on('data', (chunk: Buffer) => out.push(chunk));
  const finished = once(deflater, 'end');
  const block = Buffer.from(unit.repeat(Math.max(1, Math.floor((256 * 1024) / unit.length))));
  let crc = 0;
  let written = 0;
  const write = async (chunk: Buffer) => {
    crc = crc32(chunk, crc);
    written += chunk.length;
    if (!deflater.write(chunk)) await once(deflater, 'drain');
  };
  await write(Buffer.from(head));
  const tailBytes = Buffer.from(tail);
  while (written + block.length + tailBytes.length <= inflatedBytes) await write(block);
  await write(tailBytes);
  deflater.end();
  await finished;
  return { name, deflated: Buffer.concat(out), crc32: crc, inflatedBytes: written };
}

const MAIN_NS = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
const REL_NS = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships';
export const SHEET_HEAD = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<worksheet xmlns="${MAIN_NS}"><sheetData>`;
export const SHEET_TAIL = '</sheetData></worksheet>';

/** The smallest parts of a one-sheet .xlsx (ECMA-376 Part 1 §12.3) around a given sheet part. */
export function workbookAround(sheet: ZipPart, sheetName = 'Prices'): Buffer {
  return zipOf([
    partOf(
      '[Content_Types].xml',
      '<?xml version="1.0" encoding="UTF-8"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">' +
        '<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/>' +
        '<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>' +
        '<Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/></Types>',
    ),
    partOf(
      '_rels/.rels',
      '<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">' +
        '<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>',
    ),
    partOf(
      'xl/workbook.xml',
      `<?xml version="1.0" encoding="UTF-8"?><workbook xmlns="${MAIN_NS}" xmlns:r="${REL_NS}"><sheets><sheet name="${sheetName}" sheetId="1" r:id="rId1"/></sheets></workbook>`,
    ),
    partOf(
      'xl/_rels/workbook.xml.rels',
      '<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">' +
        '<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/></Relationships>',
    ),
    sheet,
  ]);
}
