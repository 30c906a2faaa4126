/** The image types a sketch background may be, recognised by their leading bytes. */
export type PhotoMimeType = 'image/jpeg' | 'image/png' | 'image/webp';

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function startsWith(bytes: Uint8Array, expected: number[], offset = 0): boolean {
  return bytes.length >= offset + expected.length && expected.every((byte, i) => bytes[offset + i] === byte);
}

function ascii(text: string): number[] {
  return [...text].map((char) => char.charCodeAt(0));
}

/**
 * Magic numbers: JPEG starts with the SOI marker FF D8 followed by another marker FF (ITU-T T.81
 * Annex B.1.1.3, B.2.1); PNG with its 8-byte signature (ISO/IEC 15948, PNG spec §5.2); WebP is a
 * RIFF container whose form type at offset 8 is "WEBP" (RFC 9649 §2.5).
 */
export function sniffPhotoType(bytes: Uint8Array): PhotoMimeType | undefined {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return 'image/jpeg';
  if (startsWith(bytes, PNG_SIGNATURE)) return 'image/png';
  if (startsWith(bytes, ascii('RIFF')) && startsWith(bytes, ascii('WEBP'), 8)) return 'image/webp';
  return undefined;
}

/** What a sender may call each type, in its Content-Type or in its file name. */
export const PHOTO_TYPE_ALIASES: Readonly<Record<PhotoMimeType, { mimeTypes: string[]; extensions: string[] }>> = {
  'image/jpeg': { mimeTypes: ['image/jpeg', 'image/jpg', 'image/pjpeg'], extensions: ['jpg', 'jpeg', 'jpe', 'jfif'] },
  'image/png': { mimeTypes: ['image/png'], extensions: ['png'] },
  'image/webp': { mimeTypes: ['image/webp'], extensions: ['webp'] },
};
