import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { SMTPServer } from 'smtp-server';

/**
 * A stand-in mail server for development and tests: listens on loopback, accepts every message
 * and stores each one as an .eml file. Never for production.
 */
export interface ReceivedMail {
  from: string;
  to: string[];
  /** The raw message as sent (headers and MIME body). */
  raw: string;
  file: string;
}

export interface FakeSmtp {
  port: number;
  /** Messages received so far, oldest first. */
  messages: () => ReceivedMail[];
  close: () => Promise<void>;
}

export interface FakeSmtpOptions {
  port?: number;
  /** Where the .eml files go; defaults to `<repo>/.data/mail`. */
  dir?: string;
}

const here = typeof __dirname === 'string' ? __dirname : dirname(fileURLToPath(import.meta.url));

/** `<repo>/.data/mail`, from `apps/api/src/mail` or `apps/api/dist/mail`. */
export function defaultMailDir(): string {
  return resolve(here, '../../../../.data/mail');
}

export async function startFakeSmtp(options: FakeSmtpOptions = {}): Promise<FakeSmtp> {
  const dir = options.dir ?? defaultMailDir();
  mkdirSync(dir, { recursive: true });
  const received: ReceivedMail[] = [];
  let counter = 0;
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    allowInsecureAuth: true,
    // Plain text on loopback: no certificate to manage.
    disabledCommands: ['STARTTLS'],
    onAuth: (_auth, _session, callback) => callback(null, { user: 'fake' }),
    onData: (stream, session, callback) => {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const raw = Buffer.concat(chunks).toString('utf8');
        counter += 1;
        const file = join(dir, `${new Date().toISOString().replace(/[:.]/g, '-')}-${process.pid}-${counter}.eml`);
        writeFileSync(file, raw);
        received.push({
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
          raw,
          file,
        });
        callback();
      });
    },
  });
  await new Promise<void>((resolvePromise, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 2525, '127.0.0.1', () => resolvePromise());
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : (options.port ?? 2525);
  return {
    port,
    messages: () => [...received],
    close: () => new Promise<void>((resolvePromise) => server.close(() => resolvePromise())),
  };
}

/** Undoes quoted-printable soft line breaks and escapes, so tests can read links in a raw message. */
export function decodeQuotedPrintable(text: string): string {
  return text.replace(/=\r?\n/g, '').replace(/=([0-9A-F]{2})/g, (_match, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

async function main(): Promise<void> {
  const port = Number(process.env.FAKE_SMTP_PORT ?? process.env.SMTP_PORT ?? 2525);
  const fake = await startFakeSmtp({ port, dir: process.env.MAIL_DIR });
  process.stdout.write(`fake SMTP server on 127.0.0.1:${fake.port}, storing mail in ${process.env.MAIL_DIR ?? defaultMailDir()}\n`);
  const stop = () => void fake.close().then(() => process.exit(0));
  process.once('SIGTERM', stop);
  process.once('SIGINT', stop);
}

const thisFile = typeof __filename === 'string' ? __filename : fileURLToPath(import.meta.url);
if (process.argv[1] && resolve(process.argv[1]) === thisFile) void main();
