import { crc32, deflateSync } from 'node:zlib';

function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typeAndData = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

/**
 * A real, decodable grey PNG (PNG spec, ISO/IEC 15948: signature §5.2, IHDR §11.2.2 with bit depth 8
 * and colour type 0, IDAT of filter-byte-prefixed scanlines §9, IEND; CRC-32 over type and data).
 */
export function pngBytes(width: number, height: number): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 0, 0, 0, 0], 8);
  const scanlines = Buffer.alloc(height * (width + 1), 0x80);
  for (let row = 0; row < height; row++) scanlines[row * (width + 1)] = 0;
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', header),
    pngChunk('IDAT', deflateSync(scanlines)),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/**
 * The marker structure of a baseline JPEG as an image reader walks it (ITU-T T.81 Annex B): SOI,
 * an APP1 "Exif" segment whose little-endian TIFF header (TIFF 6.0 §2) points at IFD0 holding one
 * entry, tag 0x0112 Orientation, type SHORT, count 1 (Exif 2.32 / CIPA DC-008 §4.6.4), then SOF0
 * with the stored height and width, and EOI. `width` and `height` are the stored (sensor) size.
 */
export function jpegWithOrientation(width: number, height: number, orientation: number): Buffer {
  const tiff = Buffer.alloc(8 + 2 + 12 + 4);
  tiff.write('II', 0, 'ascii');
  tiff.writeUInt16LE(42, 2);
  tiff.writeUInt32LE(8, 4);
  tiff.writeUInt16LE(1, 8);
  tiff.writeUInt16LE(0x0112, 10);
  tiff.writeUInt16LE(3, 12);
  tiff.writeUInt32LE(1, 14);
  tiff.writeUInt16LE(orientation, 18);
  tiff.writeUInt32LE(0, 22);
  const exif = Buffer.concat([Buffer.from('Exif\0\0', 'binary'), tiff]);
  const app1 = Buffer.concat([Buffer.from([0xff, 0xe1]), u16(exif.length + 2), exif]);
  const sofBody = Buffer.concat([Buffer.from([8]), u16(height), u16(width), Buffer.from([1, 1, 0x11, 0])]);
  const sof0 = Buffer.concat([Buffer.from([0xff, 0xc0]), u16(sofBody.length + 2), sofBody]);
  return Buffer.concat([Buffer.from([0xff, 0xd8]), app1, sof0, Buffer.from([0xff, 0xd9])]);
}

function u16(value: number): Buffer {
  const bytes = Buffer.alloc(2);
  bytes.writeUInt16BE(value);
  return bytes;
}
