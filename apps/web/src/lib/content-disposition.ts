/**
 * The file name of a `Content-Disposition` header (RFC 6266): the UTF-8 `filename*` form wins
 * over the plain `filename`; null when the header names no file.
 */
export function fileNameFromContentDisposition(header: string | null): string | null {
  if (!header) return null;
  const extended = /filename\*\s*=\s*UTF-8'[^']*'([^;]+)/i.exec(header);
  if (extended) {
    try {
      return decodeURIComponent(extended[1].trim());
    } catch {
      // A malformed escape: fall back to the plain name below.
    }
  }
  const quoted = /(?:^|;)\s*filename\s*=\s*"((?:[^"\\]|\\.)*)"/i.exec(header);
  if (quoted) return quoted[1].replace(/\\(.)/g, '$1');
  const token = /(?:^|;)\s*filename\s*=\s*([^";\s]+)/i.exec(header);
  return token ? token[1] : null;
}
