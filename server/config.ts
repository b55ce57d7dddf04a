import { z } from 'zod';

const flag = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'], { error: 'must be true or false' })
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const port = z.coerce.number({ error: 'must be a port number' }).int().min(1).max(65535);

/** Every setting Gelwright reads; .env.example documents each one. */
const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('production'),
  PORT: port.default(4180),
  HOST: z.string().default('127.0.0.1'),
  PUBLIC_URL: z.url({ error: 'must be a URL such as http://127.0.0.1:4180' }),
  /** Host names answered besides PUBLIC_URL's and loopback, comma-separated (e.g. a second DNS name). */
  ALLOWED_HOSTS: z.string().default(''),
  DB_HOST: z.string().min(1).default('127.0.0.1'),
  DB_PORT: port,
  DB_NAME: z.string().regex(/^[A-Za-z0-9_]{1,64}$/, 'letters, digits and _ only'),
  DB_USER: z.string().regex(/^[A-Za-z0-9_]{1,32}$/, 'letters, digits and _ only'),
  DB_PASSWORD: z.string().min(12, 'must be at least 12 characters'),
  DB_POOL_MAX: z.coerce.number().int().min(1).max(200).default(10),
  SESSION_SECRET: z.string().min(32, 'must be at least 32 characters'),
  SESSION_HOURS: z.coerce.number().min(0.01).max(24 * 30).default(10),
  COOKIE_SECURE: z.enum(['auto', 'true', 'false']).default('auto'),
  TRUST_PROXY: flag.default(false),
  BCRYPT_COST: z.coerce.number().int().min(10, 'must be 10 or more').max(15).default(11),
  SIGNIN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  SIGNIN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(30),
  SIGNIN_WINDOW_MINUTES: z.coerce.number().min(0.1).default(15),
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  SMTP_PORT: port.default(2525),
  SMTP_SECURE: flag.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Gelwright <gelwright@localhost>'),
  MAIL_CATCHER: flag.default(true),
  DATA_DIR: z.string().min(1).default('.data/files'),
  UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).default(10 * 1024 * 1024),
  UPLOAD_MAX_FILES: z.coerce.number().int().min(1).max(50).default(8),
  /** A whole multipart request (all its files): larger ones are cut off while they stream. */
  UPLOAD_MAX_REQUEST_BYTES: z.coerce.number().int().min(1024).default(25 * 1024 * 1024),
  LOG_REQUESTS: flag.default(false),
  /** A fit or plan running longer than this in its worker thread is stopped (503). */
  HEAVY_JOB_SECONDS: z.coerce.number().min(0.001).max(3600).default(60),
  /** Fits, plans and exports one user may have running at once (429 beyond). */
  HEAVY_JOBS_PER_USER: z.coerce.number().int().min(1).max(50).default(2),
});

export type Config = z.infer<typeof configSchema>;

export class ConfigError extends Error {}

/**
 * Reads and checks the configuration. A missing or malformed setting stops start-up
 * with one line per setting naming it and saying what is expected.
 */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const result = configSchema.safeParse(env);
  if (result.success) return result.data;
  const lines = result.error.issues.map((issue) => {
    const name = issue.path.join('.');
    const missing = env[name] === undefined || env[name] === '';
    return `  ${name}: ${missing ? 'missing' : issue.message}`;
  });
  throw new ConfigError(`Gelwright cannot start; fix these settings (see .env.example):\n${lines.join('\n')}`);
}
