import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { Plan, Recipe, Shortlist, type Programme } from '../../server/models';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';

// All data invented. The planner's science is checked in shared/planning/*.test.ts.

let lib: Library;
let programme: Programme;
let formulator: TestUser;
let viewer: TestUser;

const suite = withBrowserStack();

beforeAll(async () => {
  lib = await buildLibrary();
  programme = await buildProgramme({ name: 'Planned primer gels', goalState: 'gel', attractionSource: 'depletion' });
  formulator = await buildUser({ role: 'formulator', name: 'Pia Planner' });
  viewer = await buildUser({ role: 'viewer', name: 'Vic Viewer' });
  // One recipe on the bench already, observed as a gel, so the list has evidence to show.
  const scientist = await buildUser({ role: 'scientist' });
  const recipe = await (await signedInAgent(suite.stack.app, formulator)).post('/api/recipes').send(recipeInput(programme, lib, { fraction: { kind: 'volume', value: 0.2 }, attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: 11 } }));
  expect(recipe.status).toBe(201);
  const observed = await (await signedInAgent(suite.stack.app, scientist)).post('/api/observations').send({ recipeId: recipe.body.recipe.id, mixedAt: '2026-03-02', ageDays: 7, observedState: 'gel', method: 'visual' });
  expect(observed.status).toBe(201);
});

async function expectAccessible(page: Page) {
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}

async function fillRequest(page: Page, values: { polymerTo: string; margin: string; candidates: string }) {
  const form = page.getByRole('form', { name: 'Plan' });
  await form.getByLabel('Target state', { exact: true }).selectOption('gel');
  await form.getByLabel('Particle system', { exact: true }).selectOption({ label: `${lib.particle.name} (radius ${lib.particle.radiusNm} nm)` });
  await form.getByLabel('Solvent', { exact: true }).selectOption({ label: lib.solvent.name });
  await form.getByLabel('Polymer (depletant)').selectOption({ label: lib.depletant.name });
  await form.getByLabel('φ from').fill('0.05');
  await form.getByLabel('φ to').fill('0.4');
  await form.getByLabel('Polymer from (g/L)').fill('0');
  await form.getByLabel('Polymer to (g/L)').fill(values.polymerTo);
  await form.getByLabel('Smallest margin').fill(values.margin);
  await form.getByLabel('Candidates to list').fill(values.candidates);
  return form;
}

describe('planning gels', () => {
  it('a formulator plans gels, turns two candidates into recipes and a shortlist, and finds them on the map and in the shortlist', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Planner' }).click();
    await page.getByRole('heading', { name: 'Planner', level: 1 }).waitFor();
    await page.goto(`${suite.stack.url}/plan?programme=${programme.id}`);
    await page.getByText('No plan open').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'planner-empty');

    const form = await fillRequest(page, { polymerTo: '12', margin: '0.15', candidates: '5' });
    await form.getByLabel('Stays a gel for at least (days)').fill('30');
    await form.getByRole('button', { name: 'Plan compositions' }).click();
    await page.waitForURL(/plan=\d+/);
    const planId = Number(new URL(page.url()).searchParams.get('plan'));
    await page.getByRole('heading', { name: new RegExp(`^Plan ${planId} · `) }).waitFor();
    const rows = page.locator('tr[data-candidate]');
    await expect.poll(() => rows.count()).toBe(5);
    // Every listed candidate is predicted gel with at least the margin asked, as stored.
    const stored = (await Plan.findByPk(planId))!;
    expect(stored.outcome.outcome.candidates.every((c) => c.derived.predictedState === 'gel' && c.derived.margin! >= 0.15)).toBe(true);
    expect(await rows.first().textContent()).toContain('Gel');
    // One bench check and no collapse: the shelf-life minimum cannot be honoured, and the plan says so.
    expect(await page.getByTestId('plan-shelf-life-note').textContent()).toMatch(/^Asked to stay a gel for at least 30 days: cannot be honoured\. Cannot fit what drives collapse: 0 collapses seen/);
    expect(await page.getByRole('columnheader', { name: 'Shelf life (predicted)' }).count()).toBe(1);
    await page.getByRole('img', { name: new RegExp(`^State map of plan ${planId}`) }).waitFor();
    expect(await page.locator('[data-plan-window]').count()).toBe(1);
    expect(await page.locator('[data-plan-candidate]').count()).toBe(5);
    expect(await page.getByTestId('experiment-summary').textContent()).toMatch(/straddle the edge of the gel region|sits on the edge of the gel region/);
    await expectAccessible(page);
    await screenshot(page, 'planner-plan');

    await page.getByLabel('Choose candidate 1').check();
    await page.getByLabel('Choose candidate 2').check();
    await page.getByLabel('Shortlist title').fill('Planned gels for the shelf test');
    await page.getByRole('button', { name: 'Make recipes and shortlist' }).click();
    await page.getByText('2 recipes made').waitFor();
    const made = await Recipe.findAll({ where: { origin: `plan:${planId}` }, order: [['id', 'ASC']] });
    expect(made).toHaveLength(2);
    const codes = made.map((r) => r.code);
    for (const code of codes) await page.locator('tr[data-candidate]').getByRole('link', { name: code }).waitFor();
    expect(await page.locator('[data-plan-candidate] circle[fill="#1c2630"]').count()).toBe(2);
    await expectAccessible(page);
    await screenshot(page, 'planner-recipes-made');

    await page.getByRole('link', { name: 'Planned gels for the shelf test' }).click();
    await page.waitForURL(/\/shortlists\/\d+$/);
    const shortlist = (await Shortlist.findByPk(Number(page.url().split('/').pop())))!;
    expect(shortlist.status).toBe('draft');
    for (const code of codes) await page.getByText(code).first().waitFor();
    await page.getByText(`From plan ${planId}: predicted gel`).first().waitFor();
    await expectAccessible(page);
    await screenshot(page, 'planner-shortlist');

    await page.goto(`${suite.stack.url}/map?programme=${programme.id}`);
    await page.getByRole('img', { name: /^State map of Planned primer gels/ }).waitFor();
    await page.getByText(/^List the \d+ points? on this map$/).click();
    for (const recipe of made) await expect.poll(() => page.locator(`tr[data-point="r${recipe.id}"]`).textContent()).toContain(recipe.code);
    await expectAccessible(page);
    await screenshot(page, 'planner-recipes-on-map');

    await page.goto(`${suite.stack.url}/recipes/${codes[0]}`);
    await page.getByRole('link', { name: `From plan ${planId}` }).click();
    await page.waitForURL(new RegExp(`/plan\\?programme=${programme.id}&plan=${planId}$`));
    await page.getByRole('heading', { name: new RegExp(`^Plan ${planId} · `) }).waitFor();
    expect(unexpected()).toEqual([]);
    await context.close();
  });

  it('advises what to relax when nothing fits, plans again with it, and sends next experiments to the bench; a viewer reads the plans', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.goto(`${suite.stack.url}/plan?programme=${programme.id}`);
    const form = await fillRequest(page, { polymerTo: '3', margin: '0.1', candidates: '4' });
    await form.getByRole('button', { name: 'Plan compositions' }).click();
    await page.getByText('Nothing in these ranges meets the request').waitFor();
    const advice = page.locator('li[data-advice="level.max"]');
    expect(await advice.textContent()).toMatch(/Raise the polymer limit to [\d.]+ g\/L/);
    await expectAccessible(page);
    await screenshot(page, 'planner-advice');
    const before = page.url();
    await advice.getByRole('button', { name: 'Plan again with this' }).click();
    await expect.poll(() => page.url()).not.toBe(before);
    await expect.poll(() => page.locator('tr[data-candidate]').count()).toBeGreaterThan(0);

    const experiments = page.locator('tr[data-experiment]');
    await expect.poll(() => experiments.count()).toBeGreaterThan(0);
    const planId = Number(new URL(page.url()).searchParams.get('plan'));
    await page.getByLabel('Note for the bench (optional)').fill('Mix on Monday; look at day 1 and day 7.');
    await page.getByRole('button', { name: 'Send to the bench as draft recipes' }).click();
    await page.getByText(/recipes? sent to the bench/).waitFor();
    const sent = await Recipe.findAll({ where: { origin: `plan:${planId}` } });
    expect(sent.length).toBe(await experiments.count());
    expect(sent.every((r) => r.notes!.startsWith('Mix on Monday; look at day 1 and day 7.'))).toBe(true);
    await expectAccessible(page);
    await screenshot(page, 'planner-experiments-sent');
    expect(unexpected()).toEqual([]);
    await context.close();

    const reader = await openCheckedPage(suite.browser);
    await signInThroughForm(reader.page, suite.stack.url, viewer.email, viewer.password);
    await reader.page.goto(`${suite.stack.url}/plan?programme=${programme.id}&plan=${planId}`);
    await reader.page.getByRole('heading', { name: new RegExp(`^Plan ${planId} · `) }).waitFor();
    await reader.page.getByText('Plans are made by formulators').waitFor();
    expect(await reader.page.getByRole('form', { name: 'Plan' }).count()).toBe(0);
    expect(await reader.page.getByRole('button', { name: 'Send to the bench as draft recipes' }).count()).toBe(0);
    expect(await reader.page.locator('tr[data-plan]').count()).toBeGreaterThanOrEqual(2);
    await expectAccessible(reader.page);
    await screenshot(reader.page, 'planner-viewer');
    expect(reader.unexpected()).toEqual([]);
    await reader.context.close();
  });
});
