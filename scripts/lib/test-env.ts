import { randomBytes } from 'node:crypto';

/** How many vitest workers run at once; each gets its own database. */
export const TEST_WORKERS = 2;
export const TEST_DB_PREFIX = 'gelwright_test';

export const testDatabases = () => Array.from({ length: TEST_WORKERS }, (_, i) => `${TEST_DB_PREFIX}_${i + 1}`);

/**
 * The environment every test process sees: its own MariaDB port and databases (never the
 * demo's), fresh secrets per run, the lowest bcrypt cost the server accepts.
 */
export function testEnvironment(): Record<string, string> {
  return {
    NODE_ENV: 'test',
    NO_COLOR: '1',
    HOST: '127.0.0.1',
    PORT: '4199',
    PUBLIC_URL: 'http://127.0.0.1:4199',
    DB_HOST: '127.0.0.1',
    // Replaced by scripts/test.ts with the free port of this run's own instance.
    DB_PORT: '3392',
    DB_NAME: `${TEST_DB_PREFIX}_1`,
    DB_USER: 'gelwright_test',
    DB_PASSWORD: process.env.GELWRIGHT_TEST_DB_PASSWORD ?? randomBytes(18).toString('base64url'),
    DB_POOL_MAX: '10',
    TEST_DB_PREFIX,
    TEST_WORKERS: String(TEST_WORKERS),
    SESSION_SECRET: randomBytes(32).toString('base64url'),
    SESSION_HOURS: '2',
    COOKIE_SECURE: 'auto',
    BCRYPT_COST: '10',
    SIGNIN_LIMIT_PER_ACCOUNT: '5',
    SIGNIN_LIMIT_PER_ADDRESS: '30',
    SIGNIN_WINDOW_MINUTES: '15',
    MAIL_CATCHER: 'true',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: '2599',
    MAIL_FROM: 'Gelwright test <gelwright@test.localhost>',
    DATA_DIR: '.data/test-files',
    UPLOAD_MAX_BYTES: String(2 * 1024 * 1024),
    UPLOAD_MAX_FILES: '4',
  };
}
