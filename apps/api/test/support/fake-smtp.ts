import { decodeQuotedPrintable, startFakeSmtp, type FakeSmtp } from '../../src/mail/fake-smtp-server.js';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** A fake SMTP server on a free port with its own mail folder, for one e2e file. */
export function startTestSmtp(): Promise<FakeSmtp> {
  return startFakeSmtp({ port: 0, dir: mkdtempSync(join(tmpdir(), 'linesmith-mail-')) });
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
