import { afterAll, beforeAll } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser';
import { startTestStack, type TestStack } from './test-stack';

/**
 * A browser test file's fixtures: the real server listening on a free port (with this worker's
 * database and a mail catcher) and Debian's Chromium, started before the file's tests and
 * closed after them. Read `suite.stack` and `suite.browser` inside tests.
 */
export function withBrowserStack(): { stack: TestStack; browser: Browser } {
  const suite = {} as { stack: TestStack; browser: Browser };
  beforeAll(async () => {
    suite.stack = await startTestStack({ listen: true });
    suite.browser = await launchBrowser();
  });
  afterAll(async () => {
    await suite.browser?.close();
    await suite.stack?.close();
  });
  return suite;
}
