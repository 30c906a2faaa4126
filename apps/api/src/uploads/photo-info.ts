import { imageSize } from 'image-size';
import { ValidationError } from '../common/errors/app-error.js';
import { extensionOf } from './file-name.js';
import { PHOTO_TYPE_ALIASES, sniffPhotoType, type PhotoMimeType } from './file-sniffer.js';

export interface PhotoInfo {
  mimeType: PhotoMimeType;
  /** As the photo is displayed, after its EXIF orientation. */
  widthPx: number;
  heightPx: number;
}

/**
 * A photo's decoded size is width × height × 4 bytes whoever displays it (the browser, the shop
 * sheet's print): 50 megapixels is well above any camera a shop uses and below what a tablet can
 * decode. Sides beyond 20,000 px or a ratio over 20:1 are not photos of a vehicle.
 */
export const PHOTO_MAX_PIXELS = 50_000_000;
export const PHOTO_MAX_SIDE_PX = 20_000;
export const PHOTO_MAX_ASPECT = 20;

/** Content-Types that make no claim about the file. */
const NO_CLAIM = new Set(['', 'application/octet-stream']);

function rejected(message: string): ValidationError {
  return new ValidationError([{ path: 'file', message }], message);
}

/**
 * EXIF orientations 5–8 store the picture turned a quarter turn (Exif 2.32, CIPA DC-008, tag 0x0112
 * "Orientation"): the displayed width is the stored height.
 */
export function displayedSize(width: number, height: number, orientation: number | undefined): { widthPx: number; heightPx: number } {
  return orientation !== undefined && orientation >= 5 && orientation <= 8
    ? { widthPx: height, heightPx: width }
    : { widthPx: width, heightPx: height };
}

/**
 * Identifies a photo by its bytes and measures it. The sender's Content-Type and file extension
 * must agree with the bytes: a text file named .jpg, or a PNG sent as image/jpeg, is refused.
 */
export function readPhoto(bytes: Buffer, fileName: string, declaredType: string | undefined): PhotoInfo {
  const mimeType = sniffPhotoType(bytes);
  if (!mimeType) throw rejected('This file is not a JPEG, PNG or WebP photo.');
  const aliases = PHOTO_TYPE_ALIASES[mimeType];
  const declared = (declaredType ?? '').split(';')[0].trim().toLowerCase();
  if (!NO_CLAIM.has(declared) && !aliases.mimeTypes.includes(declared)) {
    throw rejected(`The file was sent as ${declared} but its contents are ${mimeType}.`);
  }
  const extension = extensionOf(fileName);
  if (extension && !aliases.extensions.includes(extension)) {
    throw rejected(`The file is named .${extension} but its contents are ${mimeType}.`);
  }
  let size: ReturnType<typeof imageSize>;
  try {
    size = imageSize(bytes);
  } catch {
    throw rejected('The photo could not be read; it may be damaged or cut short.');
  }
  if (!size.width || !size.height) throw rejected('The photo has no width or height.');
  const { width, height } = size;
  if (width > PHOTO_MAX_SIDE_PX || height > PHOTO_MAX_SIDE_PX || width * height > PHOTO_MAX_PIXELS) {
    throw rejected(
      `The photo is ${width} × ${height} px; photos up to ${PHOTO_MAX_PIXELS / 1e6} megapixels (and ${PHOTO_MAX_SIDE_PX} px a side) are accepted. Save it smaller and upload again.`,
    );
  }
  if (Math.max(width, height) / Math.min(width, height) > PHOTO_MAX_ASPECT) {
    throw rejected(`The photo is ${width} × ${height} px, an implausible shape for a photo; it may be damaged.`);
  }
  return { mimeType, ...displayedSize(size.width, size.height, size.orientation) };
}
