import { describe, expect, it } from 'vitest';
import { STATE_LABELS } from '../../shared/states';
import { seriousAccessibilityViolations } from '../support/axe';
import { buildUser } from '../support/builders';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildLibrary, buildProgramme } from '../support/team-builders';
import { Recipe } from '../../server/models';

const suite = withBrowserStack();

describe('from a new recipe to the map', () => {
  it('a formulator composes a recipe with a live prediction, saves it, and finds it on the map with its predicted state', async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme({ name: 'Map walk programme' });
    const formulator = await buildUser({ role: 'formulator' });
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.goto(`${suite.stack.url}/recipes/new?programme=${programme.id}`);
    const form = page.getByRole('form', { name: 'Recipe' });
    await form.getByLabel('Name').fill('Walk-through gel');
    await form.getByLabel('Particle system').selectOption({ label: `${lib.particle.name} (radius ${lib.particle.radiusNm} nm)` });
    await form.getByLabel('Solvent').selectOption({ label: lib.solvent.name });
    await form.getByLabel('Fraction (0 to 0.74)').fill('0.25');
    await form.getByText('Non-adsorbing polymer (depletion)').click();
    await form.getByLabel('Polymer (depletant)').selectOption({ label: lib.depletant.name });
    await form.getByLabel('Polymer concentration (g per litre of solvent)').fill('9');
    const live = page.getByTestId('live-derivation');
    await live.waitFor();
    const livePrediction = (await live.getByText(/^Predicted:/).locator('..').textContent()) ?? '';
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await screenshot(page, 'recipe-new-live');
    await form.getByRole('button', { name: `Create in ${programme.name}` }).click();
    await page.waitForURL(/\/recipes\/[A-Z]+-\d{4}$/);
    const code = page.url().split('/').pop()!;
    const stored = await Recipe.findOne({ where: { code } });
    const predicted = STATE_LABELS[stored!.predictedState!];
    // The browser's live prediction and the server's stored one agree.
    expect(livePrediction).toContain(predicted);
    await page.getByText(`Predicted ${predicted}`).first().waitFor();
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await screenshot(page, 'recipe-detail');

    await page.getByRole('link', { name: 'On the programme map' }).click();
    await page.waitForURL(/\/map\?programme=/);
    await page.getByRole('img', { name: /^State map of Map walk programme/ }).waitFor();
    await page.getByText(/^List the \d+ points? on this map$/).click();
    const row = page.locator(`tr[data-point="r${stored!.id}"]`);
    await expect.poll(() => row.textContent()).toContain(predicted);
    expect(await row.textContent()).toContain(code);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await screenshot(page, 'map-with-new-recipe');
    expect(unexpected()).toEqual([]);
    await context.close();
  });

  it('keeps both of two view changes made before the map renders again', async () => {
    const programme = await buildProgramme({ name: 'Two quick changes', attractionSource: 'salt' });
    const viewer = await buildUser({ role: 'viewer' });
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, viewer.email, viewer.password);
    await page.goto(`${suite.stack.url}/map?programme=${programme.id}`);
    await page.getByRole('img', { name: /^State map of Two quick changes/ }).waitFor();
    const axis = await page.getByLabel('Attraction axis').elementHandle();
    const theory = await page.getByLabel('Fluid–fluid theory').elementHandle();
    // Both changes in one task, as a fast hand or a script makes them: React renders once after both.
    await page.evaluate(([a, t]) => {
      (a as HTMLSelectElement).value = 'inverseTau';
      a!.dispatchEvent(new Event('change', { bubbles: true }));
      (t as HTMLSelectElement).value = 'baxterPY';
      t!.dispatchEvent(new Event('change', { bubbles: true }));
    }, [axis, theory] as const);
    await expect.poll(() => new URL(page.url()).searchParams.get('theory')).toBe('baxterPY');
    expect(new URL(page.url()).searchParams.get('axis')).toBe('inverseTau');
    await expect.poll(() => page.getByLabel('Attraction axis').inputValue()).toBe('inverseTau');
    expect(unexpected()).toEqual([]);
    await context.close();
  });

  it("restores the map's view from its URL: axis, theory, layers and zoom", async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme({ name: 'URL view programme', attractionSource: 'salt' });
    const viewer = await buildUser({ role: 'viewer' });
    void lib;
    const first = await openCheckedPage(suite.browser);
    await signInThroughForm(first.page, suite.stack.url, viewer.email, viewer.password);
    await first.page.goto(`${suite.stack.url}/map?programme=${programme.id}`);
    await first.page.getByRole('img', { name: /^State map of URL view programme/ }).waitFor();
    await first.page.getByLabel('Attraction axis').selectOption('inverseTau');
    await first.page.getByLabel('Fluid–fluid theory').selectOption('baxterPY');
    // The layer switches live in the URL, which the router updates a moment after the click.
    await first.page.getByLabel('Shaded regions').click();
    await expect.poll(() => first.page.getByLabel('Shaded regions').isChecked()).toBe(false);
    await first.page.getByRole('button', { name: 'Zoom in' }).click();
    await first.page.waitForURL(/zoom=/);
    const url = first.page.url();
    const label = await first.page.getByRole('img', { name: /^State map/ }).getAttribute('aria-label');
    // The view is its axes: the tick labels say which part of the map is shown.
    await first.page.waitForTimeout(300);
    const ticks = await first.page.locator('[data-testid="state-map"] [data-axis-tick]').allTextContents();
    expect(ticks.length).toBeGreaterThan(6);
    await first.context.close();

    const second = await openCheckedPage(suite.browser);
    await signInThroughForm(second.page, suite.stack.url, viewer.email, viewer.password);
    await second.page.goto(url);
    await second.page.getByRole('img', { name: /^State map/ }).waitFor();
    expect(await second.page.getByLabel('Attraction axis').inputValue()).toBe('inverseTau');
    expect(await second.page.getByLabel('Fluid–fluid theory').inputValue()).toBe('baxterPY');
    expect(await second.page.getByLabel('Shaded regions').isChecked()).toBe(false);
    expect(await second.page.getByRole('img', { name: /^State map/ }).getAttribute('aria-label')).toBe(label);
    await expect.poll(() => second.page.locator('[data-testid="state-map"] [data-axis-tick]').allTextContents()).toEqual(ticks);
    expect(await second.page.locator('[data-region]').count()).toBe(0);
    await screenshot(second.page, 'map-restored-from-url');
    expect(second.unexpected()).toEqual([]);
    await second.context.close();
  });
});
