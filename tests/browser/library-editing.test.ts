import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ParticleSystem } from '../../server/models';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { buildUser, unique } from '../support/builders';

const suite = withBrowserStack();

async function expectAccessible(page: Page) {
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}


describe('editing the library', () => {
  it('a formulator adds a particle system (errors next to the fields first), replaces it, archives and restores it', async () => {
    const name = unique('Latex 250 nm');
    const formulator = await buildUser({ role: 'formulator' });
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.goto(`${suite.stack.url}/library`);
    await page.getByRole('button', { name: 'Add a particle system' }).click();
    const form = page.getByRole('form', { name: 'Add a particle system' });
    await form.getByLabel('Name').fill(name);
    await form.getByLabel('Radius (nm)').fill('0.2');
    await form.getByRole('button', { name: 'Add particle system' }).click();
    await form.getByText('Radius must be between 1 and 50000 nm').waitFor();
    await form.getByText('Core material is required').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'library-form-errors');

    await form.getByLabel('Core material').fill('polystyrene');
    await form.getByLabel('Radius (nm)').fill('250');
    await form.getByLabel('Polydispersity (%)').fill('3');
    await form.getByLabel('Density (g/cm³)').fill('1.05');
    await form.getByLabel('Kept apart by').selectOption('steric');
    await form.getByLabel('Hamaker constant (zJ)').fill('9.5');
    await form.getByRole('button', { name: 'Add particle system' }).click();
    await page.getByText(`Saved ${name}.`).waitFor();
    const row = page.getByRole('table', { name: 'Particles in the library' }).getByRole('row').filter({ hasText: name });
    expect(await row.textContent()).toContain('Steric (polymer layer)');
    const stored = await ParticleSystem.findOne({ where: { name } });
    expect(stored).toMatchObject({ radiusNm: 250, hamakerZj: 9.5, surfacePotentialMv: null, pricePerKg: null });

    // PUT replaces the whole entry: clearing a box clears the stored value.
    await page.getByRole('button', { name: `Edit ${name}` }).click();
    const edit = page.getByRole('form', { name: `Edit ${name}` });
    expect(await edit.getByLabel('Hamaker constant (zJ)').inputValue()).toBe('9.5');
    await edit.getByLabel('Hamaker constant (zJ)').fill('');
    await edit.getByLabel('Price (/kg)').fill('85');
    await expectAccessible(page);
    await edit.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(`Saved ${name}.`).waitFor();
    await stored!.reload();
    expect(stored).toMatchObject({ hamakerZj: null, pricePerKg: 85, radiusNm: 250 });

    await page.getByRole('button', { name: `Archive ${name}` }).click();
    await page.getByText(`Archived ${name}.`).waitFor();
    expect(await row.count()).toBe(0);
    await page.getByLabel('Show archived entries').check();
    await page.getByRole('button', { name: `Restore ${name}` }).click();
    await page.getByText(`Restored ${name}.`).waitFor();
    await stored!.reload();
    expect(stored!.archivedAt).toBeNull();
    await expectAccessible(page);
    await screenshot(page, 'library-formulator');
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
