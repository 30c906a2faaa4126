import { z } from 'zod';

/** HS256 keys shorter than the hash output weaken it (RFC 7518 §3.2: a key of at least 256 bits). */
export const MIN_JWT_SECRET_BYTES = 32;

const booleanFromEnv = z
  .enum(['true', 'false', '1', '0'])
  .default('false')
  .transform((value) => value === 'true' || value === '1');

export const appConfigSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    DATABASE_URL: z.url({ protocol: /^postgres(ql)?$/, error: 'must be a postgres:// URL' }),
    PORT: z.coerce.number().int().min(1).max(65535).default(3000),
    /** Loopback unless an operator opens the API to the network on purpose. */
    HOST: z.string().min(1).default('127.0.0.1'),
    /**
     * Express `trust proxy`: `false` (default: the socket's address is the client), a hop count, or
     * a comma list of proxy addresses/subnets (`loopback`, `10.0.0.0/8`, …). Only then is
     * X-Forwarded-For believed, so without a proxy the client address cannot be spoofed.
     */
    TRUST_PROXY: z
      .string()
      .regex(/^(false|\d{1,2}|[\w.:/]+(\s*,\s*[\w.:/]+)*)$/, 'false, a hop count, or a comma list of proxy addresses')
      .default('false')
      .transform((value): boolean | number | string[] =>
        value === 'false' ? false : /^\d+$/.test(value) ? Number(value) : value.split(',').map((part) => part.trim()),
      ),
    /** No built-in default: `npm start`/`npm test` generate one per installation (scripts/lib/common.sh). */
    JWT_SECRET: z
      .string({ error: 'is required (npm start and npm test generate one into .data/secrets.env)' })
      .refine((secret) => Buffer.byteLength(secret, 'utf8') >= MIN_JWT_SECRET_BYTES, {
        message: `must be at least ${MIN_JWT_SECRET_BYTES} bytes`,
      }),
    /** The OpenAPI pages: served in development and tests, off in production unless asked for. */
    API_DOCS: z.enum(['on', 'off']).optional(),
    JWT_ACCESS_TTL_SEC: z.coerce.number().int().positive().default(900),
    REFRESH_TTL_DAYS: z.coerce.number().int().positive().default(14),
    /** Attempts per minute per client address on each public auth route (sign-in, links, reset). */
    LOGIN_RATE_LIMIT: z.coerce.number().int().positive().default(10),
    /** Sign-in attempts per account in 15 minutes before it is locked for the rest of the window. */
    LOGIN_ACCOUNT_LIMIT: z.coerce.number().int().positive().default(10),
    COOKIE_SECURE: booleanFromEnv,
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
    WEB_DIST_DIR: z.string().min(1).optional(),
    STORAGE_DRIVER: z.enum(['local', 's3']).default('local'),
    /** Local driver folder; defaults to `<repo>/.data/uploads`. */
    STORAGE_DIR: z.string().min(1).optional(),
    S3_ENDPOINT: z.url().optional(),
    S3_BUCKET: z.string().min(1).optional(),
    S3_REGION: z.string().min(1).default('us-east-1'),
    S3_ACCESS_KEY_ID: z.string().min(1).optional(),
    S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
    S3_FORCE_PATH_STYLE: booleanFromEnv,
    /** Outgoing mail; the defaults point at the fake SMTP server of `npm start` / `npm test`. */
    SMTP_HOST: z.string().min(1).default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
    SMTP_FROM: z.string().min(3).default('Linesmith <no-reply@linesmith.example>'),
    SMTP_USER: z.string().min(1).optional(),
    SMTP_PASS: z.string().min(1).optional(),
    /** The web app's address, used in the links of invitation and password-reset e-mails. */
    APP_URL: z.url().default('http://localhost:3000'),
    /** Password-reset e-mails per address and hour (further requests still answer 202). */
    RESET_RATE_LIMIT: z.coerce.number().int().positive().default(5),
  })
  .superRefine((config, ctx) => {
    if (config.STORAGE_DRIVER === 's3' && !config.S3_BUCKET) {
      ctx.addIssue({ code: 'custom', path: ['S3_BUCKET'], message: 'is required when STORAGE_DRIVER=s3' });
    }
    if (Boolean(config.S3_ACCESS_KEY_ID) !== Boolean(config.S3_SECRET_ACCESS_KEY)) {
      ctx.addIssue({ code: 'custom', path: ['S3_SECRET_ACCESS_KEY'], message: 'set both S3 keys or neither' });
    }
  })
  .transform((config) => ({ ...config, API_DOCS: config.API_DOCS ?? (config.NODE_ENV === 'production' ? 'off' : 'on') }));

export type AppConfig = z.output<typeof appConfigSchema>;

export class ConfigValidationError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid configuration:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'ConfigValidationError';
  }
}

/** Parses environment variables; the error names every offending variable. */
export function parseAppConfig(env: Record<string, unknown>): AppConfig {
  const result = appConfigSchema.safeParse(env);
  if (result.success) return result.data;
  const problems = result.error.issues.map((issue) => `${issue.path.join('.') || '(environment)'}: ${issue.message}`);
  throw new ConfigValidationError(problems);
}
