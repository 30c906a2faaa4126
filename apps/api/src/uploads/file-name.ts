const MAX_LENGTH = 200;

/**
 * The sender's file name, fit to show and to store: no folder parts (either slash), no control
 * characters, trimmed, at most 200 characters (keeping the extension). Never used as a storage key.
 */
export function sanitizeFileName(raw: string | undefined, fallback: string): string {
  const base = (raw ?? '').split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, '').trim().replace(/^\.+/, '');
  if (!clean) return fallback;
  if (clean.length <= MAX_LENGTH) return clean;
  const dot = clean.lastIndexOf('.');
  const extension = dot > 0 && clean.length - dot <= 10 ? clean.slice(dot) : '';
  return clean.slice(0, MAX_LENGTH - extension.length) + extension;
}

/** The lower-case extension of a file name, or '' when it has none. */
export function extensionOf(fileName: string): string {
  const dot = fileName.lastIndexOf('.');
  return dot > 0 ? fileName.slice(dot + 1).toLowerCase() : '';
}

/** `inline` with an ASCII fallback name and the exact UTF-8 name (RFC 6266 §4.3, RFC 8187). */
export function inlineContentDisposition(fileName: string): string {
  const fallback = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  const encoded = encodeURIComponent(fileName).replace(/['()*]/g, (char) => `%${char.charCodeAt(0).toString(16).toUpperCase()}`);
  return `inline; filename="${fallback}"; filename*=UTF-8''${encoded}`;
}
