import { imageSize } from 'image-size';
import { jpegWithOrientation, pngBytes } from '../../test/support/image-bytes.js';
import { ValidationError } from '../common/errors/app-error.js';
import { extensionOf, inlineContentDisposition, sanitizeFileName } from './file-name.js';
import { sniffPhotoType } from './file-sniffer.js';
import { displayedSize, readPhoto } from './photo-info.js';

describe('sniffPhotoType', () => {
  it('recognises the magic numbers of JPEG (T.81 SOI), PNG (ISO/IEC 15948 signature) and WebP (RFC 9649 RIFF/WEBP)', () => {
    expect(sniffPhotoType(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]))).toBe('image/jpeg');
    expect(sniffPhotoType(pngBytes(1, 1))).toBe('image/png');
    expect(sniffPhotoType(Buffer.from('RIFF\x24\x00\x00\x00WEBPVP8 ', 'binary'))).toBe('image/webp');
    expect(sniffPhotoType(Buffer.from('RIFF\x24\x00\x00\x00WAVEfmt ', 'binary'))).toBeUndefined();
    expect(sniffPhotoType(Buffer.from('GIF89a'))).toBeUndefined();
    expect(sniffPhotoType(Buffer.from([0xff, 0xd8]))).toBeUndefined();
    expect(sniffPhotoType(Buffer.alloc(0))).toBeUndefined();
  });
});

describe('displayedSize', () => {
  it('swaps width and height for the quarter-turn EXIF orientations 5–8 only (Exif 2.32, tag 0x0112)', () => {
    for (const orientation of [undefined, 1, 2, 3, 4]) expect(displayedSize(640, 480, orientation)).toEqual({ widthPx: 640, heightPx: 480 });
    for (const orientation of [5, 6, 7, 8]) expect(displayedSize(640, 480, orientation)).toEqual({ widthPx: 480, heightPx: 640 });
  });
});

describe('readPhoto', () => {
  it('agrees with the image-size library on the test JPEG: stored 640×480 with orientation 6', () => {
    const bytes = jpegWithOrientation(640, 480, 6);
    expect(imageSize(bytes)).toMatchObject({ width: 640, height: 480, orientation: 6 });
    expect(readPhoto(bytes, 'bay.jpg', 'image/jpeg')).toEqual({ mimeType: 'image/jpeg', widthPx: 480, heightPx: 640 });
  });

  it('accepts a missing or generic Content-Type and common JPEG aliases', () => {
    expect(readPhoto(pngBytes(3, 2), 'a.png', undefined)).toEqual({ mimeType: 'image/png', widthPx: 3, heightPx: 2 });
    expect(readPhoto(pngBytes(3, 2), 'a', 'application/octet-stream').mimeType).toBe('image/png');
    expect(readPhoto(jpegWithOrientation(2, 2, 1), 'a.JPEG', 'image/jpg').mimeType).toBe('image/jpeg');
  });

  it('refuses text, a type the bytes contradict, and an extension the bytes contradict', () => {
    expect(() => readPhoto(Buffer.from('hello'), 'a.jpg', 'image/jpeg')).toThrow(ValidationError);
    expect(() => readPhoto(pngBytes(2, 2), 'a.png', 'image/webp')).toThrow(/sent as image\/webp/);
    expect(() => readPhoto(pngBytes(2, 2), 'a.gif', 'image/png')).toThrow(/named \.gif/);
    // A JPEG cut off before its frame header has no size to read.
    expect(() => readPhoto(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x04, 0, 0]), 'a.jpg', 'image/jpeg')).toThrow(ValidationError);
  });
});

describe('file names', () => {
  it('drops folder parts of either slash, control characters and leading dots', () => {
    expect(sanitizeFileName('../../etc/passwd', 'photo')).toBe('passwd');
    expect(sanitizeFileName('C:\\Users\\fab\\engine bay.jpg', 'photo')).toBe('engine bay.jpg');
    expect(sanitizeFileName('bad\u0000na\u001fme.png', 'photo')).toBe('badname.png');
    expect(sanitizeFileName('..hidden.png', 'photo')).toBe('hidden.png');
    expect(sanitizeFileName('   ', 'photo')).toBe('photo');
    expect(sanitizeFileName(undefined, 'photo')).toBe('photo');
  });

  it('shortens long names to 200 characters and keeps the extension', () => {
    const name = sanitizeFileName(`${'x'.repeat(300)}.jpeg`, 'photo');
    expect(name).toHaveLength(200);
    expect(name.endsWith('.jpeg')).toBe(true);
    expect(extensionOf(name)).toBe('jpeg');
    expect(extensionOf('README')).toBe('');
  });

  it('writes an RFC 6266 inline disposition with an ASCII fallback and the RFC 8187 UTF-8 name', () => {
    expect(inlineContentDisposition('kühler "1".png')).toBe(
      `inline; filename="k_hler _1_.png"; filename*=UTF-8''k%C3%BChler%20%221%22.png`,
    );
  });
});
