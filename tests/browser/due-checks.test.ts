import { beforeAll, describe, expect, it } from 'vitest';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';

// The sample is mixed ten calendar days before today and last checked at 3 days; with the
// schedule 3, 7, 14 its 7-day check is due (10 ≥ 7) and, once recorded at 10 days, the next is
// at 14 (derived by hand).

const suite = withBrowserStack();
let scientist: TestUser;
let programmeId: number;
let recipe: { id: number; code: string };

const daysAgo = (days: number) => {
  const now = new Date();
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate() - days)).toISOString().slice(0, 10);
};

beforeAll(async () => {
  const lib = await buildLibrary();
  const programme = await buildProgramme({ name: 'Due-check primers' });
  programmeId = programme.id;
  const formulator = await signedInAgent(suite.stack.app, await buildUser({ role: 'formulator' }));
  recipe = (await formulator.post('/api/recipes').send(recipeInput(programme, lib, { name: 'Watched primer gel' }))).body.recipe;
  scientist = await buildUser({ role: 'scientist', name: 'Wren Watcher' });
  const agent = await signedInAgent(suite.stack.app, scientist);
  const first = await agent.post('/api/observations').send({ recipeId: recipe.id, mixedAt: daysAgo(10), ageDays: 3, observedState: 'gel', method: 'visual' });
  expect(first.status).toBe(201);
});

describe('due checks on the bench log', () => {
  it('a scientist sets a check schedule, sees the sample due, clicks "Still standing", and the check moves from the due list into the log', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, scientist.email, scientist.password);

    await page.goto(`${suite.stack.url}/recipes/${recipe.code}`);
    const schedule = page.getByTestId('check-schedule');
    await schedule.getByText('No check schedule').waitFor();
    const ages = page.getByLabel('Check ages (days after mixing)');
    await ages.fill('7, 3');
    await page.getByRole('button', { name: 'Save check schedule' }).click();
    await page.getByText('Check ages must increase from one to the next').waitFor();
    await ages.fill('3, 7, 14');
    await page.getByRole('button', { name: 'Save check schedule' }).click();
    await page.getByText('Check schedule saved.').waitFor();
    await schedule.getByText('Each sample is checked at 3, 7, 14 days after mixing.').waitFor();
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    await page.goto(`${suite.stack.url}/bench?programme=${programmeId}`);
    const row = page.getByTestId('due-check');
    await row.waitFor();
    expect(await row.count()).toBe(1);
    const cells = await row.getByRole('cell').allTextContents();
    // Recipe, mixed on, last check, due at, age today.
    expect(cells[0]).toContain(recipe.code);
    expect(cells[2]).toContain('at 3 days');
    expect(cells.slice(3, 5)).toEqual(['7', '10']);
    // The log holds the one earlier check.
    const log = page.getByRole('table', { name: /Bench log/ });
    expect(await log.locator('tbody tr').count()).toBe(1);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await screenshot(page, 'bench-due-checks');

    await page.getByRole('button', { name: new RegExp(`^Still standing: ${recipe.code}`) }).click();
    await page.getByTestId('no-due-checks').waitFor();
    await log.locator('tbody tr').nth(1).waitFor();
    const ageCells = await log.locator('tbody tr td:nth-child(3)').allTextContents();
    expect(ageCells.map(Number).sort((a, b) => a - b)).toEqual([3, 10]);
    await screenshot(page, 'bench-due-checks-done');
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
