import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
};

/**
 * Three projects, run together by `npm test` (scripts/test.ts):
 * - unit: pure code (physics, schemas, map geometry); no database.
 * - api: supertest against the real MariaDB instance that scripts/test.ts started.
 * - browser: playwright-core driving Debian's Chromium against a server started by the test file.
 */
export default defineConfig({
  resolve: { alias },
  test: {
    pool: 'forks',
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['shared/**/*.test.ts', 'src/**/*.test.ts', 'server/**/*.test.ts', 'tests/unit/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          setupFiles: ['tests/support/worker-database.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          setupFiles: ['tests/support/worker-database.ts'],
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
