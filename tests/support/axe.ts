import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const axeSource = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: string[];
}

/**
 * Runs axe-core (Deque's accessibility engine, from the npm registry) in the page and returns
 * the serious and critical violations against WCAG 2.1 A and AA rules.
 */
export async function seriousAccessibilityViolations(page: Page): Promise<AxeViolation[]> {
  // Evaluated, not injected as a <script>: the app's content security policy refuses inline scripts.
  await page.evaluate(axeSource);
  const results = (await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }[] }> } }).axe;
    return axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] } });
  })) as { violations: { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }[] };
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.slice(0, 5).map((n) => n.target.join(' ')) }));
}
