import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { Programme } from '../../server/models';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, latestMailTo, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';

let programme: Programme;
let formulator: TestUser;
let manager: TestUser;
let formulatorAgent: Awaited<ReturnType<typeof signedInAgent>>;
const recipes: { id: number; code: string; name: string }[] = [];

const suite = withBrowserStack();

beforeAll(async () => {
  const lib = await buildLibrary();
  programme = await buildProgramme({ name: 'Shelf-stable gels', goalState: 'gel' });
  formulator = await buildUser({ role: 'formulator', name: 'Farah Formulator' });
  manager = await buildUser({ role: 'manager', name: 'Mads Manager' });
  formulatorAgent = await signedInAgent(suite.stack.app, formulator);
  for (const concentrationGL of [6, 12]) {
    const created = await formulatorAgent.post('/api/recipes').send(recipeInput(programme, lib, { attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL } }));
    expect(created.status).toBe(201);
    recipes.push(created.body.recipe);
  }
});

async function expectAccessible(page: Page) {
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}


async function signOut(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
}

describe('a shortlist from draft to approval', () => {
  it('a formulator creates and submits a shortlist, a manager approves it, and the approval mail reaches the author', async () => {
    const [first, second] = recipes;
    const title = `Thirty-day shelf candidates ${Date.now().toString(36)}`;
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.goto(`${suite.stack.url}/shortlists?programme=${programme.id}`);
    await page.getByText('No shortlist in this programme yet').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'shortlists-empty');

    await page.getByRole('button', { name: 'New shortlist' }).click();
    const form = page.getByRole('form', { name: 'New shortlist' });
    await form.getByLabel('Title').fill(title);
    await form.getByLabel('Purpose').fill('Two gels for the thirty-day shelf test at 40 °C.');
    expect(await form.getByLabel('Target state').inputValue()).toBe('gel');
    await form.getByLabel('Find recipes to add').fill(first.code);
    await form.getByRole('button', { name: `Add ${first.code}` }).click();
    await form.getByLabel(`Reason for ${first.code}`).fill('Widest margin to the fluid side');
    await form.getByLabel('Find recipes to add').fill(second.code);
    await form.getByRole('button', { name: `Add ${second.code}` }).click();
    await form.getByRole('button', { name: 'Create the draft' }).click();
    await form.getByText('Reason is required').waitFor();
    await form.getByLabel(`Reason for ${second.code}`).fill('More polymer: a stiffer network if the first is too weak');
    await expectAccessible(page);
    await screenshot(page, 'shortlist-form');
    await form.getByRole('button', { name: 'Create the draft' }).click();

    await page.waitForURL(/\/shortlists\/\d+$/);
    await page.getByRole('heading', { name: title }).waitFor();
    const detail = page.getByRole('main');
    await detail.getByText('Draft', { exact: true }).first().waitFor();
    const items = page.getByRole('list', { name: 'Recipes on the shortlist' });
    expect(await items.getByRole('listitem').count()).toBe(2);
    expect(await items.textContent()).toContain('Widest margin to the fluid side');
    await expect.poll(() => page.getByText('Not observed on the bench yet.').count()).toBe(2);
    await expectAccessible(page);
    await screenshot(page, 'shortlist-draft');

    await page.getByRole('button', { name: 'Submit for review' }).click();
    await detail.getByText('Waiting for review').first().waitFor();
    expect(await page.getByRole('button', { name: 'Approve' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Edit the draft' }).count()).toBe(0);
    await expect.poll(async () => (await latestMailTo(manager.email))?.subject).toBe(`Shortlist waiting for review: ${title}`);
    const detailUrl = page.url();
    await signOut(page);

    await signInThroughForm(page, suite.stack.url, manager.email, manager.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Shortlists' }).click();
    await page.getByRole('heading', { name: 'Shortlists', level: 1 }).waitFor();
    await page.getByLabel('Programme').selectOption(String(programme.id));
    await page.waitForURL(new RegExp(`/shortlists\\?programme=${programme.id}$`));
    const waiting = page.getByRole('table', { name: 'Shortlists: Waiting for review' });
    await waiting.getByRole('link', { name: title }).click();
    await page.waitForURL(detailUrl);
    expect(await page.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
    await page.getByRole('button', { name: 'Approve' }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'shortlist-review');
    await page.getByLabel('Comment for the author').fill('Go ahead with both; start the shelf test on Monday.');
    await page.getByRole('button', { name: 'Approve' }).click();
    await detail.getByText('Approved', { exact: true }).first().waitFor();
    expect(await page.getByRole('button', { name: 'Approve' }).count()).toBe(0);
    const history = await page.getByRole('list', { name: 'Status history' }).textContent();
    expect(history).toContain('Draft → Waiting for review');
    expect(history).toContain('Waiting for review → Approved');
    expect(history).toContain('Go ahead with both');
    await expectAccessible(page);
    await screenshot(page, 'shortlist-approved');

    await expect.poll(async () => (await latestMailTo(formulator.email))?.subject).toBe(`Shortlist approved: ${title}`);
    expect((await latestMailTo(formulator.email))?.textBody).toContain('Go ahead with both');
    expect(unexpected()).toEqual([]);
    await context.close();
  });

  it('a manager cannot return without a comment; with one, the author reopens the draft', async () => {
    // Signing out in the browser above ended every session of the formulator, this agent's too.
    formulatorAgent = await signedInAgent(suite.stack.app, formulator);
    const created = await formulatorAgent.post('/api/shortlists').send({ programmeId: programme.id, title: `Return me ${Date.now().toString(36)}`, targetState: 'gel', items: [{ recipeId: recipes[0].id, reason: 'only candidate' }] });
    expect(created.status).toBe(201);
    const id = created.body.shortlist.id;
    expect((await formulatorAgent.post(`/api/shortlists/${id}/submit`)).status).toBe(200);

    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, manager.email, manager.password);
    await page.goto(`${suite.stack.url}/shortlists/${id}`);
    await page.getByRole('button', { name: 'Return to the author' }).click();
    await page.getByText('Say what the author should change: returning needs a comment').waitFor();
    await page.getByLabel('Comment for the author').fill('Add a recipe on the dense side too.');
    await page.getByRole('button', { name: 'Return to the author' }).click();
    await page.getByRole('main').getByText('Returned for changes').first().waitFor();
    await screenshot(page, 'shortlist-returned');
    await signOut(page);

    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.goto(`${suite.stack.url}/shortlists/${id}`);
    await page.getByText('Add a recipe on the dense side too.').first().waitFor();
    await page.getByRole('button', { name: 'Reopen as a draft' }).click();
    await page.getByRole('button', { name: 'Edit the draft' }).waitFor();
    await expectAccessible(page);
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
