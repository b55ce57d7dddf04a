import { chromium } from 'playwright-core';
import { median as simpleMedian, quantile as simpleQuantile } from 'simple-statistics';
import { BENCH_PASSWORD } from './seed-large';

// simple-statistics throws on an empty list; a run that drew nothing reports NaN.
const median = (values: number[]) => (values.length ? simpleMedian(values) : NaN);
const quantile = (values: number[], p: number) => (values.length ? simpleQuantile(values, p) : NaN);

/**
 * Pans the state map of a large programme in Debian's Chromium. The page records each redraw:
 * from the pan event to just after the frame that shows it (React commit, SVG, canvas). Also
 * printed: the whole step as the harness sees it (pointer move over the DevTools protocol plus
 * two animation frames, an upper bound) and the canvas paint alone.
 */
export async function measureMapPan(url: string, programmeId: number, email: string) {
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'] });
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${url}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(BENCH_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByTestId('signed-in-name').waitFor();
    await page.goto(`${url}/map?programme=${programmeId}`);
    const figure = page.getByRole('img', { name: /^State map/ });
    await figure.waitFor({ timeout: 60_000 });
    const label = (await figure.getAttribute('aria-label')) ?? '';
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await page.waitForTimeout(500);
    await page.evaluate(() => {
      window.__gelwrightMapPaints = [];
      window.__gelwrightMapRedraws = [];
    });
    const box = (await page.locator('[data-testid="state-map"]').boundingBox())!;
    const x = box.x + box.width / 2;
    const y = box.y + box.height / 2;
    await page.mouse.move(x, y);
    await page.mouse.down();
    const steps: number[] = [];
    for (let i = 1; i <= 40; i++) {
      const started = performance.now();
      await page.mouse.move(x - i * 6, y + (i % 2 ? 3 : -3));
      await page.evaluate(() => new Promise<void>((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve()))));
      steps.push(performance.now() - started);
    }
    await page.mouse.up();
    if (process.env.BENCH_PROFILE) {
      const cdp = await page.context().newCDPSession(page);
      await cdp.send('Profiler.enable');
      await cdp.send('Profiler.start');
      await page.mouse.move(x, y);
      await page.mouse.down();
      for (let i = 1; i <= 30; i++) {
        await page.mouse.move(x - i * 6, y);
        await page.evaluate(() => new Promise<void>((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve()))));
      }
      await page.mouse.up();
      const { profile } = (await cdp.send('Profiler.stop')) as { profile: { nodes: { id: number; callFrame: { functionName: string; url: string; lineNumber: number } }[]; samples: number[]; timeDeltas: number[] } };
      const byId = new Map(profile.nodes.map((n) => [n.id, n]));
      const self = new Map<string, number>();
      profile.samples.forEach((id, i) => {
        const n = byId.get(id)!;
        const key = `${n.callFrame.functionName || '(anon)'} ${n.callFrame.url.split('/').pop()}:${n.callFrame.lineNumber}`;
        self.set(key, (self.get(key) ?? 0) + (profile.timeDeltas[i] ?? 0));
      });
      const total = [...self.values()].reduce((a, b) => a + b, 0);
      console.log([...self.entries()].sort((a, b) => b[1] - a[1]).slice(0, 25).map(([k, v]) => `${((v / total) * 100).toFixed(1)}% ${(v / 1000).toFixed(0)}ms ${k}`).join('\n'));
    }
    const paints = await page.evaluate(() => window.__gelwrightMapPaints ?? []);
    const redraws = await page.evaluate(() => window.__gelwrightMapRedraws ?? []);
    return { label, redrawMedian: median(redraws), redrawP90: quantile(redraws, 0.9), redraws: redraws.length, stepMedian: median(steps), stepP90: quantile(steps, 0.9), paintMedian: median(paints), paints: paints.length };
  } finally {
    await browser.close();
  }
}
