import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { STATE_DESCRIPTIONS, STATE_LABELS, type PredictedState } from '../../shared/states';
import type { RecipeDerived } from '../../shared/views/recipe';
import type { Programme } from '../../server/models';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';

let lib: Library;
let programme: Programme;
let viewer: TestUser;
let recipe: { id: number; code: string; name: string; derived: RecipeDerived };
let shortlistId: number;

const suite = withBrowserStack();

beforeAll(async () => {
  lib = await buildLibrary();
  programme = await buildProgramme({ name: 'Thixotropic primers' });
  const formulator = await signedInAgent(suite.stack.app, await buildUser({ role: 'formulator' }));
  const created = await formulator
    .post('/api/recipes')
    .send(recipeInput(programme, lib, { name: 'Primer base with silica', notes: 'Sag-resistant primer base; thins when brushed, sets again within a minute.' }));
  expect(created.status).toBe(201);
  recipe = created.body.recipe;
  const shortlist = await formulator.post('/api/shortlists').send({ programmeId: programme.id, title: 'Primer candidates', targetState: 'gel', items: [{ recipeId: recipe.id, reason: 'sets again quickly' }] });
  expect(shortlist.status).toBe(201);
  shortlistId = shortlist.body.shortlist.id;
  expect((await formulator.post(`/api/shortlists/${shortlistId}/submit`)).status).toBe(200);
  const scientist = await signedInAgent(suite.stack.app, await buildUser({ role: 'scientist' }));
  const observed = await scientist.post('/api/observations').send({ recipeId: recipe.id, mixedAt: '2026-01-20', ageDays: 14, observedState: 'gel', method: 'rheology', storageModulusPa: 120 });
  expect(observed.status).toBe(201);
  viewer = await buildUser({ role: 'viewer', name: 'Vera Newhire' });
});

async function expectAccessible(page: Page) {
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}


/** Every button in the page's main region: a viewer's may only search, filter, page or retry. */
async function mainButtons(page: Page) {
  return (await page.getByRole('main').getByRole('button').allTextContents()).map((t) => t.trim());
}
const READING_BUTTONS = new Set(['Find', 'Clear filters', 'Newer', 'Older', 'Try again']);

describe('a viewer looks things up', () => {
  it('finds a recipe by its code and reads where it sits, why, how close to a boundary, what the bench saw, and the cautions', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, viewer.email, viewer.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Find' }).click();
    await page.getByRole('heading', { name: 'Find', level: 1 }).waitFor();
    await expectAccessible(page);

    await page.getByLabel('Recipe code, name or words from its notes').fill(recipe.code.toLowerCase());
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: `${recipe.code} · ${recipe.name}` }).waitFor();
    const predicted = recipe.derived.predictedState as PredictedState;
    expect(predicted).not.toBeNull();
    expect(await page.getByTestId('predicted-state').textContent()).toBe(`${STATE_LABELS[predicted]}. ${STATE_DESCRIPTIONS[predicted]}`);
    if (recipe.derived.reason) expect(await page.getByTestId('prediction-reason').textContent()).toContain(recipe.derived.reason);
    if (recipe.derived.nearestBoundary) expect(await page.getByTestId('nearest-boundary').textContent()).toContain(recipe.derived.nearestBoundary.label);
    // Symbols are typeset (φ_p^R as φ with sub- and superscript), so the page's text has no _ or ^.
    if (recipe.derived.marginDescription) expect(await page.getByTestId('margin-description').textContent()).toBe(`In map terms: ${recipe.derived.marginDescription.replace(/[_^]/g, '')}`);
    expect(await page.getByTestId('bench-summary').textContent()).toMatch(/^Observed once: 1 gel\. /);
    await page.getByRole('complementary', { name: 'Cautions' }).getByText('safety data sheet').waitFor();
    expect(await page.getByRole('link', { name: `Open the full recipe ${recipe.code}` }).getAttribute('href')).toBe(`/recipes/${recipe.code}`);
    expect([...(await mainButtons(page))].filter((b) => !READING_BUTTONS.has(b))).toEqual([]);
    await expectAccessible(page);
    await screenshot(page, 'find-by-code');

    await page.getByLabel('Recipe code, name or words from its notes').fill('thins when brushed');
    await page.keyboard.press('Enter');
    const results = page.getByRole('list', { name: 'Matching recipes' });
    await results.getByRole('link', { name: new RegExp(recipe.code) }).click();
    await page.waitForURL(new RegExp(`code=${recipe.code}`));
    await page.getByRole('heading', { name: `${recipe.code} · ${recipe.name}` }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'find-by-notes');
    expect(unexpected()).toEqual([]);
    await context.close();
  });

  it('sees no edit controls on the library, the bench log or the shortlists, and the server refuses a change anyway', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, viewer.email, viewer.password);

    await page.goto(`${suite.stack.url}/library`);
    for (const tab of ['Particles', 'Depletants', 'Solvents', 'Salts']) {
      await page.getByRole('tab', { name: tab }).click();
      await page.getByRole('table', { name: `${tab} in the library` }).waitFor();
      expect(await mainButtons(page)).toEqual([]);
      await expectAccessible(page);
      await screenshot(page, `library-viewer-${tab.toLowerCase()}`);
    }
    expect(await page.getByRole('table', { name: 'Particles in the library' }).count()).toBe(0);
    await page.getByRole('tab', { name: 'Salts' }).focus();
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => page.getByRole('tab', { name: 'Particles' }).getAttribute('aria-selected')).toBe('true');
    await page.getByRole('table', { name: 'Particles in the library' }).getByRole('cell', { name: lib.particle.name }).waitFor();

    await page.goto(`${suite.stack.url}/bench?programme=${programme.id}`);
    await page.getByRole('table', { name: /Bench log/ }).getByRole('link', { name: recipe.code }).waitFor();
    expect((await mainButtons(page)).filter((b) => !READING_BUTTONS.has(b))).toEqual([]);
    await page.getByRole('link', { name: 'Export these observations as CSV' }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'bench-viewer');

    await page.goto(`${suite.stack.url}/shortlists?programme=${programme.id}`);
    await page.getByRole('link', { name: 'Primer candidates' }).click();
    await page.getByRole('heading', { name: 'Primer candidates' }).waitFor();
    await page.getByRole('list', { name: `Bench observations of ${recipe.code}` }).waitFor();
    expect((await mainButtons(page)).filter((b) => !READING_BUTTONS.has(b))).toEqual([]);
    expect(await page.getByLabel('Comment for the author').count()).toBe(0);
    await expectAccessible(page);
    await screenshot(page, 'shortlist-viewer');

    await page.goto(`${suite.stack.url}/shortlists?programme=${programme.id}`);
    expect((await mainButtons(page)).filter((b) => !READING_BUTTONS.has(b))).toEqual([]);
    await expectAccessible(page);

    const refused = await page.request.post(`${suite.stack.url}/api/materials/salts`, { data: { name: 'Viewer salt', valence: 1 } });
    expect(refused.status()).toBe(403);
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
