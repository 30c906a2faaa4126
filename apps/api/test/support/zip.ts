import { deflateRawSync } from 'node:zlib';

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
