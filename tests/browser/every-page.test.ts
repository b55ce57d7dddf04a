import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { seriousAccessibilityViolations } from '../support/axe';
import { buildUser, signedInAgent } from '../support/builders';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildLibrary, buildProgramme, pngBytes, recipeInput } from '../support/team-builders';

const suite = withBrowserStack();

/** Waits for the page's main heading (or the sign-in frame), so the screenshot shows a settled page. */
async function settled(page: Page) {
  await page.locator('h1').first().waitFor();
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(300);
}

describe('every page', () => {
  it('passes axe-core without serious or critical violations, and is saved as a screenshot', async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme({ name: 'Tour programme' });
    const admin = await buildUser({ role: 'admin', name: 'Tova Tour' });
    const api = await signedInAgent(suite.stack.app, admin);
    const recipe = (await api.post('/api/recipes').send(recipeInput(programme, lib, { name: 'Tour gel', attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: 9 } }))).body.recipe;
    const observation = (await api.post('/api/observations').send({ recipeId: recipe.id, mixedAt: '2026-11-01', ageDays: 7, observedState: 'gel', method: 'microscopy', notes: 'network visible' })).body.observation;
    await api.post(`/api/observations/${observation.id}/attachments`).attach('files', pngBytes(64, 48), 'tour micrograph.png');
    const shortlist = (await api.post('/api/shortlists').send({ programmeId: programme.id, title: 'Tour shortlist', targetState: 'gel', items: [{ recipeId: recipe.id, reason: 'widest margin' }] })).body.shortlist;

    const visited: string[] = [];
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    const check = async (path: string, name: string) => {
      await page.goto(`${suite.stack.url}${path}`);
      await settled(page);
      const violations = await seriousAccessibilityViolations(page);
      expect(violations, `${path}: ${JSON.stringify(violations, null, 1)}`).toEqual([]);
      await screenshot(page, `page-${name}`);
      visited.push(path);
    };
    for (const [path, name] of [
      ['/sign-in', 'sign-in'],
      ['/forgot-password', 'forgot-password'],
      ['/reset-password?token=not-a-real-token-value-000', 'reset-password'],
      ['/accept-invitation', 'accept-invitation-without-link'],
    ] as const) {
      await check(path, name);
    }
    await signInThroughForm(page, suite.stack.url, admin.email, admin.password);
    const p = `programme=${programme.id}`;
    for (const [path, name] of [
      ['/', 'overview'],
      [`/map?${p}`, 'map'],
      [`/recipes?${p}`, 'recipes'],
      [`/recipes/new?${p}`, 'recipe-new'],
      [`/recipes/${recipe.code}`, 'recipe-detail'],
      [`/recipes/${recipe.code}/edit`, 'recipe-edit'],
      [`/bench?${p}`, 'bench'],
      [`/shortlists?${p}`, 'shortlists'],
      [`/shortlists/${shortlist.id}`, 'shortlist-detail'],
      [`/shortlists/${shortlist.id}/dossier`, 'shortlist-dossier'],
      ['/library', 'library'],
      [`/find?q=${recipe.code}`, 'find'],
      [`/calibrate?${p}`, 'calibrate'],
      [`/plan?${p}`, 'plan'],
      ['/team', 'team-people'],
      ['/team?section=audit', 'team-audit'],
      ['/team?section=outbox', 'team-outbox'],
      ['/no-such-page', 'not-found'],
    ] as const) {
      await check(path, name);
    }
    // Every screen in the rail was visited.
    const rail = await page.getByRole('navigation', { name: 'Main' }).getByRole('link').evaluateAll((links) => links.map((a) => new URL((a as HTMLAnchorElement).href).pathname));
    for (const screen of rail) expect(visited.some((v) => v.split('?')[0] === screen), `rail screen ${screen} not visited`).toBe(true);
    expect(unexpected([404])).toEqual([]);
    await context.close();
  });
});
