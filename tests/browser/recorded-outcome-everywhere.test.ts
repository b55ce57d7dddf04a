import { beforeAll, describe, expect, it } from 'vitest';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';
import { Observation } from '../../server/models';

// The screens are opened first so their data is cached, then an outcome is recorded on the bench
// log, and the same screens are reached again by links inside the app (no reload): the map's
// overlay and the recipe's timeline must be asked again, not shown from the cache.

const suite = withBrowserStack();
let scientist: TestUser;
let programme: Awaited<ReturnType<typeof buildProgramme>>;
let recipe: { id: number; code: string };
let earlier: number;

const daysAgo = (days: number) => {
  const now = new Date();
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate() - days)).toISOString().slice(0, 10);
};

beforeAll(async () => {
  const lib = await buildLibrary();
  programme = await buildProgramme({ name: 'Fresh everywhere' });
  const formulator = await signedInAgent(suite.stack.app, await buildUser({ role: 'formulator' }));
  recipe = (await formulator.post('/api/recipes').send(recipeInput(programme, lib, { name: 'Followed gel' }))).body.recipe;
  scientist = await buildUser({ role: 'scientist' });
  const agent = await signedInAgent(suite.stack.app, scientist);
  const first = await agent.post('/api/observations').send({ recipeId: recipe.id, mixedAt: daysAgo(20), ageDays: 3, observedState: 'gel', method: 'visual' });
  expect(first.status).toBe(201);
  earlier = first.body.observation.id;
});

describe('an outcome recorded on the bench log', () => {
  it('shows on the map and on the recipe page reached without a reload', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, scientist.email, scientist.password);

    await page.goto(`${suite.stack.url}/recipes/${recipe.code}`);
    const timeline = page.getByRole('list', { name: 'Observations by age' });
    await timeline.getByText(/^day 3 · visual/).waitFor();
    expect(await timeline.getByText(/^day 17 · /).count()).toBe(0);
    // Set once in this document: still there at the end means no page was loaded again.
    await page.evaluate(() => Object.assign(window, { sameDocument: true }));

    await page.getByRole('link', { name: 'On the programme map' }).click();
    await page.getByRole('img', { name: /^State map of Fresh everywhere/ }).waitFor();
    await page.getByText(/^List the \d+ points? on this map$/).click();
    await page.locator(`tr[data-point="o${earlier}"]`).waitFor();
    const pointsBefore = await page.locator('tr[data-point^="o"]').count();

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Bench log' }).click();
    await page.getByLabel('Programme', { exact: true }).selectOption(String(programme.id));
    await page.getByRole('button', { name: 'Record an outcome' }).click();
    const form = page.getByRole('form', { name: 'Record an outcome' });
    await form.getByLabel('Find the recipe').fill(recipe.code);
    await expect.poll(() => form.getByLabel('Recipe', { exact: true }).locator('option').count()).toBe(2);
    await form.getByLabel('Recipe', { exact: true }).selectOption(String(recipe.id));
    await form.getByLabel('Mixed on').fill(daysAgo(20));
    await form.getByLabel('Age when observed (days)').fill('17');
    await form.getByLabel('Observed state').selectOption('collapsed');
    await form.getByLabel('Method').selectOption('visual');
    await form.getByRole('button', { name: 'Save the outcome' }).click();
    await page.getByText('Outcome recorded').waitFor();
    const recorded = await Observation.findOne({ where: { recipeId: recipe.id, ageDays: 17 } });
    expect(recorded).not.toBeNull();

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'State map' }).click();
    await page.getByLabel('Programme', { exact: true }).selectOption(String(programme.id));
    await page.getByRole('img', { name: /^State map of Fresh everywhere/ }).waitFor();
    await page.getByText(/^List the \d+ points? on this map$/).click();
    const row = page.locator(`tr[data-point="o${recorded!.id}"]`);
    await row.waitFor();
    expect(await row.textContent()).toContain('Collapsed gel');
    expect(await page.locator('tr[data-point^="o"]').count()).toBe(pointsBefore + 1);
    await screenshot(page, 'map-after-recording');

    await row.getByRole('link', { name: recipe.code }).click();
    await page.waitForURL(new RegExp(`/recipes/${recipe.code}$`));
    await timeline.getByText(/^day 17 · visual/).waitFor();
    expect(await timeline.getByText(/^day 3 · visual/).count()).toBe(1);
    await screenshot(page, 'recipe-after-recording');

    expect(await page.evaluate(() => (window as unknown as { sameDocument?: boolean }).sameDocument)).toBe(true);
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
