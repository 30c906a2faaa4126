/**
 * Looks at a .xlsx (a zip, ECMA-376 Part 2) before any parser inflates it: a file that is not a
 * zip, is cut short (no end-of-central-directory record) or would inflate to far more than it
 * weighs is refused. Offsets and signatures from the PKWARE APPNOTE, sections 4.3.12 and 4.3.16.
 */
const LOCAL_HEADER = 0x04034b50;
const CENTRAL_HEADER = 0x02014b50;
const END_OF_CENTRAL_DIRECTORY = 0x06054b50;
const EOCD_MIN_BYTES = 22;
const MAX_COMMENT_BYTES = 0xffff;

export interface ZipLimits {
  /** Sum of the entries' inflated sizes. */
  maxInflatedBytes: number;
  /** Inflated ÷ compressed size of any single entry. */
  maxRatio: number;
  maxEntries: number;
}

export type ZipVerdict = { ok: true; entries: number; inflatedBytes: number } | { ok: false; reason: string };

export function inspectZip(data: Buffer, limits: ZipLimits): ZipVerdict {
  if (data.length < EOCD_MIN_BYTES || data.readUInt32LE(0) !== LOCAL_HEADER) {
    return { ok: false, reason: 'The file is not an .xlsx workbook.' };
  }
  const searchFrom = Math.max(0, data.length - EOCD_MIN_BYTES - MAX_COMMENT_BYTES);
  let eocd = -1;
  for (let at = data.length - EOCD_MIN_BYTES; at >= searchFrom; at -= 1) {
    if (data.readUInt32LE(at) === END_OF_CENTRAL_DIRECTORY) {
      eocd = at;
      break;
    }
  }
  if (eocd < 0) return { ok: false, reason: 'The workbook is incomplete (cut short while saving or sending?).' };
  const entries = data.readUInt16LE(eocd + 10);
  const directoryOffset = data.readUInt32LE(eocd + 16);
  if (entries > limits.maxEntries) return { ok: false, reason: 'The workbook has too many parts to be a price list.' };
  let at = directoryOffset;
  let inflatedBytes = 0;
  for (let index = 0; index < entries; index += 1) {
    if (at + 46 > data.length || data.readUInt32LE(at) !== CENTRAL_HEADER) {
      return { ok: false, reason: 'The workbook is damaged: its table of contents cannot be read.' };
    }
    const compressed = data.readUInt32LE(at + 20);
    const inflated = data.readUInt32LE(at + 24);
    inflatedBytes += inflated;
    if (inflatedBytes > limits.maxInflatedBytes || inflated > Math.max(compressed, 1) * limits.maxRatio) {
      return { ok: false, reason: 'The workbook would unpack to far more data than a price list holds; it was refused.' };
    }
    at += 46 + data.readUInt16LE(at + 28) + data.readUInt16LE(at + 30) + data.readUInt16LE(at + 32);
  }
  return { ok: true, entries, inflatedBytes };
}
