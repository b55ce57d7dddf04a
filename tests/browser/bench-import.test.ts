import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { IMPORT_COLUMNS } from '../../shared/schemas/observations';
import type { Programme } from '../../server/models';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, pngBytes, recipeInput } from '../support/team-builders';

let programme: Programme;
let scientist: TestUser;
let scientistAgent: Awaited<ReturnType<typeof signedInAgent>>;
const recipes: { id: number; code: string; derived: { predictedState: string | null } }[] = [];

const suite = withBrowserStack();

beforeAll(async () => {
  const lib = await buildLibrary();
  programme = await buildProgramme({ name: 'Bench import primers' });
  const formulator = await signedInAgent(suite.stack.app, await buildUser({ role: 'formulator' }));
  for (const concentrationGL of [3, 9]) {
    const created = await formulator.post('/api/recipes').send(recipeInput(programme, lib, { attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL } }));
    expect(created.status).toBe(201);
    recipes.push(created.body.recipe);
  }
  scientist = await buildUser({ role: 'scientist', name: 'Sana Bench' });
  scientistAgent = await signedInAgent(suite.stack.app, scientist);
});

const csv = (rows: string[][]) => Buffer.from([IMPORT_COLUMNS.join(','), ...rows.map((r) => r.join(','))].join('\n') + '\n');
const countFor = async (recipeId: number) => (await scientistAgent.get(`/api/observations?recipe=${recipeId}`)).body.total as number;

async function expectAccessible(page: Page) {
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}


describe('the bench log', () => {
  it('a scientist imports a CSV with one bad row: nothing is imported and the row is shown; the fixed file imports once and its rows are in the log', async () => {
    const [first, second] = recipes;
    expect(first.derived.predictedState && second.derived.predictedState).toBeTruthy();
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, scientist.email, scientist.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Bench log' }).click();
    await page.getByRole('heading', { name: 'Bench log', level: 1 }).waitFor();
    // Other tests' programmes share this database: choose ours, and the URL carries the choice.
    await page.getByLabel('Programme').selectOption(String(programme.id));
    await page.waitForURL(new RegExp(`/bench\\?programme=${programme.id}$`));
    await page.getByText('Nothing recorded for this programme yet').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'bench-empty');

    await page.getByRole('button', { name: 'Import from CSV' }).click();
    const template = await page.getByRole('link', { name: 'Download the CSV template' }).getAttribute('href');
    expect(decodeURIComponent(template!.split(',').slice(1).join(','))).toBe(`${IMPORT_COLUMNS.join(',')}\r\n`);

    const bad = csv([
      [first.code, '2026-02-02', '7', 'gel', 'rheology', '48', '', '', '45', 'first batch'],
      [second.code, '2026-02-02', '7', 'wobbly', 'visual', '', '', '', '', ''],
    ]);
    await page.getByLabel('CSV file to import').setInputFiles({ name: 'primer-batch.csv', mimeType: 'text/csv', buffer: bad });
    const report = page.getByRole('table', { name: 'Problems found in the file' });
    await report.waitFor();
    const cells = await report.getByRole('row').nth(1).getByRole('cell').allTextContents();
    expect(cells.slice(0, 2)).toEqual(['3', 'observed_state']);
    expect(cells[2]).toMatch(/observedState must be one of/);
    await page.getByText(/Nothing was imported: 1 problem in primer-batch\.csv/).waitFor();
    expect(await page.getByRole('button', { name: /^Import \d+ rows?$/ }).count()).toBe(0);
    expect(await countFor(first.id)).toBe(0);
    await expectAccessible(page);
    await screenshot(page, 'bench-import-refused');

    // Each fixed row observes what was predicted, so both agree (the next test relies on that).
    const fixed = csv([
      [first.code, '2026-02-02', '7', first.derived.predictedState!, 'rheology', '48', '', '', '45', 'first batch'],
      [second.code, '2026-02-02', '7', second.derived.predictedState!, 'visual', '', '', '', '', ''],
    ]);
    await page.getByLabel('CSV file to import').setInputFiles({ name: 'primer-batch-fixed.csv', mimeType: 'text/csv', buffer: fixed });
    await page.getByText('All 2 rows of primer-batch-fixed.csv are valid').waitFor();
    expect(await countFor(first.id)).toBe(0);
    await expectAccessible(page);
    await screenshot(page, 'bench-import-checked');
    // A double click must not import the batch twice.
    await page.getByRole('button', { name: 'Import 2 rows' }).dblclick();
    await page.getByText('Imported 2 rows').waitFor();
    expect(await countFor(first.id)).toBe(1);
    expect(await countFor(second.id)).toBe(1);

    const log = page.getByRole('table', { name: /Bench log/ });
    await expect.poll(() => log.getByRole('row').count()).toBe(3);
    const text = await log.textContent();
    expect(text).toContain(first.code);
    expect(text).toContain(second.code);
    expect(text).toContain('G′ 48 Pa');
    expect(text).toContain('fill 45 mm');
    await expectAccessible(page);
    await screenshot(page, 'bench-import-done');
    // The refused file is a 422 by design.
    expect(unexpected([422])).toEqual([]);
    await context.close();
  });

  it('a scientist records an outcome with a micrograph; the thumbnail shows; the filtered log and its export mark the disagreement', async () => {
    const [first] = recipes;
    // "Collapsed gel" is never a predicted state, so it disagrees with whatever was predicted.
    expect(first.derived.predictedState).not.toBeNull();
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, scientist.email, scientist.password);
    await page.goto(`${suite.stack.url}/bench?programme=${programme.id}`);
    await page.getByRole('button', { name: 'Record an outcome' }).click();
    const form = page.getByRole('form', { name: 'Record an outcome' });
    await form.getByLabel('Sample height (mm)').fill('0');
    await form.getByRole('button', { name: 'Save the outcome' }).click();
    await form.getByText('Choose the recipe you observed').waitFor();
    await form.getByText('Choose the state you observed').waitFor();
    await form.getByText('Sample height must be between 1 and 1000 mm').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'bench-record-errors');

    await form.getByLabel('Find the recipe').fill(first.code);
    await expect.poll(() => form.getByLabel('Recipe', { exact: true }).locator('option').count()).toBe(2);
    await form.getByLabel('Recipe', { exact: true }).selectOption(String(first.id));
    await form.getByLabel('Mixed on').fill('2026-02-10');
    await form.getByLabel('Age when observed (days)').fill('30');
    await form.getByLabel('Observed state').selectOption('collapsed');
    await form.getByLabel('Method').selectOption('visual');
    await form.getByLabel('Settled height (% of fill)').fill('62');
    await form.getByLabel('Sample height (mm)').fill('52');
    await form.getByLabel('Notes').fill('clear layer on top after a month');
    await form.getByRole('button', { name: 'Save the outcome' }).click();
    await page.getByText('Outcome recorded').waitFor();

    await page.getByLabel('Files to attach').setInputFiles({ name: 'micrograph.png', mimeType: 'image/png', buffer: pngBytes(32, 24) });
    await page.getByRole('button', { name: 'Attach file' }).click();
    await page.getByText('Attached 1 file.').waitFor();
    const thumbnail = page.getByRole('img', { name: 'Micrograph micrograph.png' });
    await thumbnail.waitFor();
    await expect.poll(() => thumbnail.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(32);
    await expectAccessible(page);
    await screenshot(page, 'bench-record-saved');

    await page.getByRole('button', { name: 'Close' }).click();
    // The filters live in the URL, which the router updates in a transition: click, then wait for it.
    await page.getByLabel('Only outcomes that disagree with the prediction').click();
    await page.waitForURL(/disagreeing=true/);
    await expect.poll(() => page.getByLabel('Only outcomes that disagree with the prediction').isChecked()).toBe(true);
    const log = page.getByRole('table', { name: /Bench log/ });
    await expect.poll(async () => (await log.textContent()) ?? '').toContain('clear layer on top');
    const row = log.getByRole('row').filter({ hasText: 'clear layer on top' });
    expect(await row.textContent()).toContain('Disagrees');
    expect(await row.textContent()).toContain('Collapsed gel');
    expect(await row.getByRole('link', { name: 'micrograph.png' }).count()).toBe(1);
    await expectAccessible(page);
    await screenshot(page, 'bench-log-disagreeing');

    const exportHref = await page.getByRole('link', { name: 'Export these observations as CSV' }).getAttribute('href');
    expect(exportHref).toContain(`programme=${programme.id}`);
    expect(exportHref).toContain('disagreeing=true');
    const exported = await page.request.get(`${suite.stack.url}${exportHref}`);
    expect(exported.status()).toBe(200);
    const body = await exported.text();
    expect(body).toContain('clear layer on top');
    expect(body).not.toContain('first batch');
    const rows = parse(body, { columns: true }) as Record<string, string>[];
    expect(rows.find((r) => r.notes === 'clear layer on top after a month')).toMatchObject({ settled_height_pct: '62', sample_height_mm: '52' });
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
