/**
 * Caps on the text parts of every multipart upload (multer/busboy limits): a few short fields at
 * most. Without them a client can send megabytes of "form fields" that are buffered in memory.
 */
export const MULTIPART_TEXT_LIMITS = {
  /** Bytes of one text field's value. */
  fieldSize: 16 * 1024,
  fieldNameSize: 100,
  fields: 10,
  parts: 12,
} as const;
