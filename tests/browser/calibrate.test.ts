import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { gelOnset } from '../../shared/calibration';
import { syntheticObservations } from '../../shared/calibration/test-support/synthetic-observations';
import { squareWellDepthFromReducedB2 } from '../../shared/physics';
import { cachedStateMap } from '../../shared/state-map-cache';
import { Calibration, Recipe, type Programme } from '../../server/models';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';

// Invented bench: ad-hoc compositions "observed" with the classifier at a known attraction
// shift of +0.8 and logistic noise (shared/calibration test support), and four square-well
// recipes at φ = 0.2 just on the weak side of the theory's spinodal.

let programme: Programme;
let small: Programme;
let manager: TestUser;
let scientist: TestUser;
const recipeIds: number[] = [];

/** Invented bench outcomes below the attractive-glass line (φ_g ≈ 0.40), on both sides of the gel boundary. */
async function recordBench(agent: Awaited<ReturnType<typeof signedInAgent>>, target: Programme, count: number, seed: number) {
  const map = cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });
  for (const o of syntheticObservations({ map, count, seed, truth: { attractionShift: 0.8 }, noiseScale: 0.2, phi: [0.04, 0.38], b2: [-4, 1] })) {
    const response = await agent.post('/api/observations').send({ adhoc: { programmeId: target.id, phi: o.phi, reducedB2: o.reducedB2 }, mixedAt: '2026-03-02', ageDays: 2, observedState: o.observedState, method: 'visual' });
    expect(response.status).toBe(201);
  }
}

const suite = withBrowserStack();

beforeAll(async () => {
  const lib = await buildLibrary();
  programme = await buildProgramme({ name: 'Tacky coating base', attractionSource: 'direct', goalState: 'gel' });
  small = await buildProgramme({ name: 'Fresh pilot line', attractionSource: 'direct', goalState: 'gel' });
  manager = await buildUser({ role: 'manager', name: 'Malin Manager' });
  scientist = await buildUser({ role: 'scientist', name: 'Sami Scientist' });
  const formulatorAgent = await signedInAgent(suite.stack.app, await buildUser({ role: 'formulator' }));
  const scientistAgent = await signedInAgent(suite.stack.app, scientist);
  const onset = gelOnset(cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }), 0.2).spinodalB2!;
  for (const [i, weaker] of [0.25, 0.45, 1.5, -0.5].entries()) {
    const input = recipeInput(programme, lib, { name: `Coating base ${i + 1}`, fraction: { kind: 'volume', value: 0.2 }, attraction: { source: 'direct', contactEnergyKT: squareWellDepthFromReducedB2(onset + weaker, 1.1), rangeSigma: 0.1 } });
    const response = await formulatorAgent.post('/api/recipes').send(input);
    expect(response.status).toBe(201);
    recipeIds.push(response.body.recipe.id);
  }
  await recordBench(scientistAgent, programme, 48, 3);
  await recordBench(scientistAgent, small, 5, 4);
});

async function expectAccessible(page: Page) {
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}

describe('calibrating a programme to its bench', () => {
  it('a manager fits and accepts a calibration; the map is drawn calibrated with a switch back to the theory; withdrawing restores it', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, manager.email, manager.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calibrate' }).click();
    await page.getByRole('heading', { name: 'Calibrate', level: 1 }).waitFor();
    await page.getByLabel('Programme').selectOption(String(programme.id));
    await page.waitForURL(new RegExp(`programme=${programme.id}`));
    await page.getByTestId('calibration-in-use').getByText('Uncalibrated theory').waitFor();
    await page.getByText('No calibration fitted yet').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'calibrate-empty');

    await page.getByRole('button', { name: 'Fit to the bench' }).click();
    const result = page.getByTestId('calibration-result');
    await result.waitFor();
    expect(await result.getByText('Proposed', { exact: true }).count()).toBe(1);
    const stored = await Calibration.findOne({ where: { programmeId: programme.id }, order: [['id', 'DESC']] });
    expect(stored).not.toBeNull();
    expect(await result.textContent()).toContain(`${stored!.observationCount} of 48`);
    expect(await page.getByTestId('calibration-verdict').textContent()).toMatch(/held-out|theory/);
    expect(await page.getByRole('table', { name: 'Before: published theory' }).count()).toBe(1);
    expect(await page.getByRole('table', { name: 'After: calibrated' }).count()).toBe(1);
    expect(await page.getByRole('table', { name: 'Calibration history' }).getByRole('row').count()).toBe(2);
    await expectAccessible(page);
    await screenshot(page, 'calibrate-fitted');

    const stateBefore = (await Recipe.findByPk(recipeIds[0]))!.predictedState;
    await page.getByRole('button', { name: 'Accept this calibration…' }).click();
    await page.getByRole('button', { name: 'Accept and recompute predictions' }).click();
    await page.getByText(/^Calibration accepted: 4 recipes and 48 ad-hoc observations predicted again/).waitFor();
    const inUse = page.getByTestId('calibration-in-use');
    await inUse.getByText(/^Calibrated \d{1,2} \w{3} \d{4}, accepted by Malin Manager$/).waitFor();
    expect(await result.getByText('In use', { exact: true }).count()).toBe(1);
    expect((await Recipe.findByPk(recipeIds[0]))!.predictedState).toBe('gel');
    expect(stateBefore).not.toBe('gel');
    await expectAccessible(page);
    await screenshot(page, 'calibrate-accepted');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'State map' }).click();
    await page.getByRole('heading', { name: 'State map', level: 1 }).waitFor();
    await page.getByLabel('Programme').selectOption(String(programme.id));
    await page.getByRole('img', { name: /^State map of Tacky coating base/ }).waitFor();
    const switcher = page.getByTestId('calibration-switch');
    const calibratedOption = switcher.getByRole('radio', { name: /^Calibrated \d{1,2} \w{3} \d{4}/ });
    expect(await calibratedOption.isChecked()).toBe(true);
    expect(await page.getByTestId('map-model-note').textContent()).toMatch(/Calibrated \d{1,2} \w{3} \d{4} to the team's bench: still approximate/);
    await expect.poll(() => page.locator('[data-line="calibrated-gel"]').count()).toBe(1);
    expect(await page.locator('[data-line="calibrated-gel-weak"]').count()).toBe(1);
    expect(await page.locator('[data-line="theory-gel"]').count()).toBe(1);
    expect(await page.locator('[data-line="calibrated-gel-weak"]').getAttribute('stroke-dasharray')).toBe('6 4');
    await expectAccessible(page);
    await screenshot(page, 'map-calibrated');

    // The view lives in the URL, which the router updates a moment after the click.
    await switcher.getByRole('radio', { name: 'Uncalibrated theory' }).click();
    await page.waitForURL(/calibrated=false/);
    await expect.poll(() => page.getByTestId('map-model-note').textContent()).toContain('Drawn with the uncalibrated theory');
    await expect.poll(() => page.locator('[data-line="theory-gel"]').count()).toBe(0);
    expect(await page.locator('[data-line="calibrated-gel"]').count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, 'map-uncalibrated-with-calibration');
    // The calibrated layer can be switched off.
    await page.getByLabel('Calibrated boundary').click();
    await expect.poll(() => page.locator('[data-line="calibrated-gel"]').count()).toBe(0);

    await page.goto(`${suite.stack.url}/calibrate?programme=${programme.id}`);
    await page.getByRole('button', { name: 'Withdraw the calibration…' }).waitFor();
    // The history offers the same way back on the calibration in use.
    await page.getByRole('table', { name: 'Calibration history' }).getByRole('button', { name: 'Withdraw…' }).click();
    await page.getByRole('button', { name: 'Withdraw and use the theory' }).click();
    await page.getByText(/^Back to the uncalibrated theory: 4 recipes/).waitFor();
    await page.getByTestId('calibration-in-use').getByText('Uncalibrated theory').waitFor();
    expect(await page.getByRole('table', { name: 'Calibration history' }).textContent()).toContain('Withdrawn');
    expect((await Recipe.findByPk(recipeIds[0]))!.predictedState).toBe(stateBefore);
    await expectAccessible(page);
    await screenshot(page, 'calibrate-withdrawn');
    expect(unexpected()).toEqual([]);
    await context.close();
  });

  it('a scientist may fit but not accept, and is told how many observations a fit needs', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, scientist.email, scientist.password);
    await page.goto(`${suite.stack.url}/calibrate?programme=${small.id}`);
    await page.getByRole('button', { name: 'Fit to the bench' }).click();
    await page.getByText('Not enough to fit yet').waitFor();
    expect(await page.getByRole('alert').filter({ hasText: 'needs at least 8 observations on each side of the gel boundary' }).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, 'calibrate-refused');

    await page.goto(`${suite.stack.url}/calibrate?programme=${programme.id}`);
    await page.getByTestId('calibration-result').waitFor();
    expect(await page.getByRole('button', { name: /^Accept/ }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Withdraw/ }).count()).toBe(0);
    await expectAccessible(page);
    expect(unexpected([422])).toEqual([]);
    await context.close();
  });
});
