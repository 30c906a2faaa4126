/**
 * Reads the table of contents of a .xlsx (a zip, ECMA-376 Part 2) without inflating anything: a
 * file that is not a zip, is cut short (no end-of-central-directory record), is encrypted, uses a
 * method other than stored or deflate, or declares far more data than it weighs is refused.
 * The declared sizes are only a first screen: they can lie, so `openZipEntry` counts what is
 * really inflated. Offsets and signatures from the PKWARE APPNOTE, sections 4.3.7 (local file
 * header), 4.3.12 (central directory header) and 4.3.16 (end of central directory record).
 */
const LOCAL_HEADER = 0x04034b50;
const CENTRAL_HEADER = 0x02014b50;
const END_OF_CENTRAL_DIRECTORY = 0x06054b50;
const LOCAL_HEADER_BYTES = 30;
const CENTRAL_HEADER_BYTES = 46;
const EOCD_MIN_BYTES = 22;
const MAX_COMMENT_BYTES = 0xffff;
/** APPNOTE 4.4.5: 0 = stored, 8 = deflated. */
export const ZIP_STORED = 0;
export const ZIP_DEFLATED = 8;
/** APPNOTE 4.4.4, general purpose bit 0: the entry is encrypted. */
const ENCRYPTED_FLAG = 0x0001;

export interface ZipLimits {
  /** Sum of the entries' declared inflated sizes (the real count is kept while inflating). */
  maxInflatedBytes: number;
  /** Declared inflated ÷ compressed size of any single entry. */
  maxRatio: number;
  maxEntries: number;
}

export interface ZipEntry {
  name: string;
  method: number;
  compressedBytes: number;
  /** What the archive says the entry inflates to; not trusted. */
  declaredBytes: number;
  /** Where the entry's (compressed) data starts in the file. */
  dataOffset: number;
}

export type ZipVerdict = { ok: true; entries: ZipEntry[]; inflatedBytes: number } | { ok: false; reason: string };

const NOT_A_WORKBOOK = 'The file is not an .xlsx workbook.';
const DAMAGED = 'The workbook is damaged: its table of contents cannot be read.';

export function inspectZip(data: Buffer, limits: ZipLimits): ZipVerdict {
  if (data.length < EOCD_MIN_BYTES || data.readUInt32LE(0) !== LOCAL_HEADER) return { ok: false, reason: NOT_A_WORKBOOK };
  const searchFrom = Math.max(0, data.length - EOCD_MIN_BYTES - MAX_COMMENT_BYTES);
  let eocd = -1;
  for (let at = data.length - EOCD_MIN_BYTES; at >= searchFrom; at -= 1) {
    if (data.readUInt32LE(at) === END_OF_CENTRAL_DIRECTORY) {
      eocd = at;
      break;
    }
  }
  if (eocd < 0) return { ok: false, reason: 'The workbook is incomplete (cut short while saving or sending?).' };
  const count = data.readUInt16LE(eocd + 10);
  const directoryOffset = data.readUInt32LE(eocd + 16);
  if (count > limits.maxEntries) return { ok: false, reason: 'The workbook has too many parts to be a price list.' };
  const entries: ZipEntry[] = [];
  let at = directoryOffset;
  let inflatedBytes = 0;
  for (let index = 0; index < count; index += 1) {
    if (at + CENTRAL_HEADER_BYTES > data.length || data.readUInt32LE(at) !== CENTRAL_HEADER) return { ok: false, reason: DAMAGED };
    const flags = data.readUInt16LE(at + 8);
    const method = data.readUInt16LE(at + 10);
    const compressedBytes = data.readUInt32LE(at + 20);
    const declaredBytes = data.readUInt32LE(at + 24);
    const nameBytes = data.readUInt16LE(at + 28);
    const localOffset = data.readUInt32LE(at + 42);
    if (at + CENTRAL_HEADER_BYTES + nameBytes > data.length) return { ok: false, reason: DAMAGED };
    const name = data.toString('utf8', at + CENTRAL_HEADER_BYTES, at + CENTRAL_HEADER_BYTES + nameBytes);
    if (flags & ENCRYPTED_FLAG) return { ok: false, reason: 'The workbook is password-protected. Save it without a password and send it again.' };
    if (method !== ZIP_STORED && method !== ZIP_DEFLATED) return { ok: false, reason: DAMAGED };
    inflatedBytes += declaredBytes;
    if (inflatedBytes > limits.maxInflatedBytes || declaredBytes > Math.max(compressedBytes, 1) * limits.maxRatio) {
      return { ok: false, reason: 'The workbook would unpack to far more data than a price list holds; it was refused.' };
    }
    if (localOffset + LOCAL_HEADER_BYTES > data.length || data.readUInt32LE(localOffset) !== LOCAL_HEADER) return { ok: false, reason: DAMAGED };
    const dataOffset = localOffset + LOCAL_HEADER_BYTES + data.readUInt16LE(localOffset + 26) + data.readUInt16LE(localOffset + 28);
    if (dataOffset + compressedBytes > data.length) return { ok: false, reason: DAMAGED };
    entries.push({ name, method, compressedBytes, declaredBytes, dataOffset });
    at += CENTRAL_HEADER_BYTES + nameBytes + data.readUInt16LE(at + 30) + data.readUInt16LE(at + 32);
  }
  return { ok: true, entries, inflatedBytes };
}
