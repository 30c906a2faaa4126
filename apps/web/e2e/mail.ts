import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

// The messages the fake SMTP server stored as .eml files in $MAIL_DIR (scripts/lib/server.sh).

export interface StoredMail {
  file: string;
  /** Header block, folded lines joined (RFC 5322 §2.2.3). */
  headers: string;
  raw: string;
}

export interface MailAttachment {
  filename: string;
  contentType: string;
  content: Buffer;
}

function mailDir(): string {
  const dir = process.env.MAIL_DIR;
  if (!dir) throw new Error('MAIL_DIR is not set: start the fake SMTP server and export its mail folder (see scripts/test.sh).');
  return dir;
}

function readMail(file: string): StoredMail {
  const raw = readFileSync(file, 'utf8');
  const head = raw.split(/\r?\n\r?\n/, 1)[0];
  return { file, raw, headers: head.replace(/\r?\n[ \t]+/g, ' ') };
}

export function allMail(): StoredMail[] {
  const dir = mailDir();
  return readdirSync(dir)
    .filter((name) => name.endsWith('.eml'))
    .sort()
    .map((name) => readMail(join(dir, name)));
}

/** The first stored message to `to` that `matches`, polling until it arrives or the time is up. */
export async function waitForMail(to: string, matches: (mail: StoredMail) => boolean = () => true, timeoutMs = 15_000): Promise<StoredMail> {
  const deadline = Date.now() + timeoutMs;
  const addressed = (mail: StoredMail) => new RegExp(`^To:.*${to.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`, 'im').test(mail.headers);
  for (;;) {
    const found = allMail().find((mail) => addressed(mail) && matches(mail));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} in ${mailDir()} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

/** Quoted-printable soft line breaks and =XX escapes undone (RFC 2045 §6.7). */
export function decodeQuotedPrintable(text: string): string {
  const bytes = text
    .replace(/=\r?\n/g, '')
    .replace(/=([0-9A-F]{2})/gi, (_, hex: string) => String.fromCharCode(parseInt(hex, 16)));
  return Buffer.from(bytes, 'latin1').toString('utf8');
}

/** The base64 attachments of a multipart message (RFC 2046 §5.1, RFC 2183). */
export function attachmentsOf(mail: StoredMail): MailAttachment[] {
  const boundaries = [...mail.raw.matchAll(/boundary="?([^";\r\n]+)"?/gi)].map((m) => m[1]);
  const parts = boundaries.reduce<string[]>((chunks, boundary) => chunks.flatMap((chunk) => chunk.split(`--${boundary}`)), [mail.raw]);
  return parts.flatMap((part): MailAttachment[] => {
    const [head, ...body] = part.replace(/^\r?\n/, '').split(/\r?\n\r?\n/);
    const headers = head.replace(/\r?\n[ \t]+/g, ' ');
    const filename = /Content-Disposition:\s*attachment;.*?filename="?([^";\r\n]+)"?/i.exec(headers)?.[1];
    if (!filename || !/Content-Transfer-Encoding:\s*base64/i.test(headers)) return [];
    return [
      {
        filename,
        contentType: /Content-Type:\s*([^;\r\n]+)/i.exec(headers)?.[1].trim() ?? '',
        content: Buffer.from(body.join('\n\n').replace(/\s+/g, ''), 'base64'),
      },
    ];
  });
}

/** Local file headers of a zip archive (an .xlsx is one) start with "PK\x03\x04" (PKWARE APPNOTE.TXT §4.3.7). */
export function isZip(bytes: Buffer): boolean {
  return bytes.length > 4 && bytes.subarray(0, 4).equals(Buffer.from([0x50, 0x4b, 0x03, 0x04]));
}
