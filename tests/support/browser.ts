import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

export const SCREENSHOT_DIR = join(process.cwd(), 'test-results', 'screenshots');

/** Debian's Chromium, headless, with the flags this closed network needs. Never downloads a browser. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  });
}

/** A page at 1280×800 that records console errors and failed requests for the test to check. */
export async function openPage(browser: Browser) {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(`console: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  // A request the page itself cancelled (navigating away) is not a fault.
  page.on('requestfailed', (req) => {
    if (req.failure()?.errorText !== 'net::ERR_ABORTED') problems.push(`request failed: ${req.url()} ${req.failure()?.errorText ?? ''}`);
  });
  return { page, context, problems };
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

/** Signs in through the form, as a person would. */
export async function signInThroughForm(page: Page, baseUrl: string, email: string, password: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('signed-in-name').waitFor();
}

/**
 * openPage plus `unexpected()`: the console and network problems seen so far, less the statuses
 * a test expects (e.g. 403 when it checks a refusal).
 */
export async function openCheckedPage(browser: Browser) {
  const opened = await openPage(browser);
  const unexpected = (expected: number[] = []) => opened.problems.filter((p) => !expected.some((status) => p.includes(`status of ${status} `)));
  return { ...opened, unexpected };
}
