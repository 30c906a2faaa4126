import { decodeQuotedPrintable, startFakeSmtp, type FakeSmtp } from '../../src/mail/fake-smtp-server.js';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** A fake SMTP server on a free port with its own mail folder (removed on close), for one e2e file. */
export async function startTestSmtp(): Promise<FakeSmtp> {
  const dir = mkdtempSync(join(tmpdir(), 'linesmith-mail-'));
  const smtp = await startFakeSmtp({ port: 0, dir });
  return { ...smtp, close: () => smtp.close().then(() => rmSync(dir, { recursive: true, force: true })) };
}

/** The token of the last link to `path` e-mailed to `to`. */
export function tokenFromMail(smtp: FakeSmtp, to: string, path: string): string {
  const mail = smtp
    .messages()
    .filter((message) => message.to.includes(to))
    .at(-1);
  if (!mail) throw new Error(`no mail to ${to}`);
  const match = new RegExp(`/${path}\\?token=([A-Za-z0-9_-]+)`).exec(decodeQuotedPrintable(mail.raw));
  if (!match) throw new Error(`no ${path} link in the mail to ${to}`);
  return match[1];
}

export interface MailAttachmentPart {
  filename: string;
  contentType: string;
  content: Buffer;
}

/** The base64 attachments of a raw multipart message (headers unfolded per RFC 5322 §2.2.3). */
export function attachmentsOf(raw: string): MailAttachmentPart[] {
  const boundary = /boundary="?([^";\r\n]+)"?/i.exec(raw)?.[1];
  if (!boundary) return [];
  return raw
    .split(`--${boundary}`)
    .flatMap((part): MailAttachmentPart[] => {
      const [head, ...body] = part.split(/\r?\n\r?\n/);
      const headers = head.replace(/\r?\n[ \t]+/g, ' ');
      const filename = /Content-Disposition:\s*attachment;\s*filename="?([^"\r\n]+)"?/i.exec(headers)?.[1];
      if (!filename) return [];
      return [{
        filename,
        contentType: /Content-Type:\s*([^;\r\n]+)/i.exec(headers)?.[1].trim() ?? '',
        content: Buffer.from(body.join('\n\n').replace(/\s+/g, ''), 'base64'),
      }];
    });
}
