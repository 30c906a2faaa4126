import { describe, expect, it } from 'vitest';
import { fileNameFromContentDisposition } from './content-disposition';

// Expected names: RFC 6266 (Use of the Content-Disposition Header Field in HTTP), section 5 "Examples".
describe('fileNameFromContentDisposition', () => {
  it('reads a token file name (RFC 6266 §5, first example)', () => {
    expect(fileNameFromContentDisposition('Attachment; filename=example.html')).toBe('example.html');
  });

  it('reads a quoted file name with a space, case-insensitive parameter (RFC 6266 §5, second example)', () => {
    expect(fileNameFromContentDisposition('INLINE; FILENAME= "an example.html"')).toBe('an example.html');
  });

  it('decodes the UTF-8 extended form (RFC 6266 §5, third example: "€ rates")', () => {
    expect(fileNameFromContentDisposition("attachment; filename*= UTF-8''%e2%82%ac%20rates")).toBe('€ rates');
  });

  it('prefers filename* over filename (RFC 6266 §5, fourth example)', () => {
    expect(
      fileNameFromContentDisposition('attachment; filename="EURO rates"; filename*=utf-8\'\'%e2%82%ac%20rates'),
    ).toBe('€ rates');
  });

  it('is null when no file is named', () => {
    expect(fileNameFromContentDisposition(null)).toBeNull();
    expect(fileNameFromContentDisposition('inline')).toBeNull();
  });
});
