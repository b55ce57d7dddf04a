import { execFileSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildUser, signedInAgent } from '../support/builders';
import { openCheckedPage, screenshot, signInThroughForm, SCREENSHOT_DIR } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { seriousAccessibilityViolations } from '../support/axe';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';

const suite = withBrowserStack();

describe('the shortlist dossier', () => {
  it('prints to PDF with its map, every recipe, the approval history and the cautions', async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme({ name: 'Dossier programme' });
    const author = await buildUser({ role: 'formulator', name: 'Dora Dossier' });
    const formulator = await signedInAgent(suite.stack.app, author);
    const codes: string[] = [];
    const ids: number[] = [];
    for (const grams of [3, 8]) {
      const recipe = (await formulator.post('/api/recipes').send(recipeInput(programme, lib, { name: `Dossier gel ${grams} g/L`, attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: grams } }))).body.recipe;
      codes.push(recipe.code);
      ids.push(recipe.id);
    }
    // The second recipe's bench (8 g/L, predicted gel): two gel samples, one collapsed at 21 days, one standing at 28, G′
    // measured at 7, 14 and 28 days. By hand from the product-limit rule (Kaplan & Meier 1958): at
    // 21 days 2 at risk, 1 collapse → Ŝ = 1/2, so half have collapsed by 21 days (derived). G′ of
    // 100, 110, 115, 140 Pa at 7, 7, 14, 28 days: least squares on log10 age gives 55.87 Pa per
    // decade, SE 13.51, 95 % interval 55.87 ± 4.303 × 13.51 = −2.24 to 114 (computed separately with
    // Python's statistics module; t₀.₉₇₅ with 2 degrees of freedom = 4.303 from a published t table),
    // so no clear trend yet (derived).
    const scientist = await signedInAgent(suite.stack.app, await buildUser({ role: 'scientist' }));
    const checks: Array<[string, number, string, number | null]> = [
      ['2026-03-02', 7, 'gel', 100], ['2026-03-02', 14, 'gel', 115], ['2026-03-02', 21, 'collapsed', null],
      ['2026-03-09', 7, 'gel', 110], ['2026-03-09', 28, 'gel', 140],
    ];
    for (const [mixedAt, ageDays, observedState, storageModulusPa] of checks) {
      const response = await scientist.post('/api/observations').send({ recipeId: ids[1], mixedAt, ageDays, observedState, method: 'rheology', ...(storageModulusPa === null ? {} : { storageModulusPa }) });
      expect(response.status).toBe(201);
    }
    const created = await formulator.post('/api/shortlists').send({ programmeId: programme.id, title: 'Dossier round one', purpose: 'Two doses for the shelf test', targetState: 'gel', items: ids.map((recipeId, i) => ({ recipeId, reason: `dose ${i + 1}` })) });
    const id = created.body.shortlist.id;
    await formulator.post(`/api/shortlists/${id}/submit`);
    const manager = await signedInAgent(suite.stack.app, await buildUser({ role: 'manager', name: 'Mona Manager' }));
    expect((await manager.post(`/api/shortlists/${id}/approve`).send({ comment: 'Mix both.' })).status).toBe(200);

    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, author.email, author.password);
    await page.goto(`${suite.stack.url}/shortlists/${id}/dossier`);
    await page.getByRole('img', { name: /^State map of shortlist/ }).waitFor();
    // The summary's shelf-life column: the first recipe has no checks, the second's survival in words.
    const cells = page.getByTestId('dossier-shelf-life-cell');
    await page.getByText('no bench checks yet').first().waitFor();
    await cells.nth(1).getByText(/half collapsed by 21 days/).waitFor();
    expect(await cells.allTextContents()).toEqual(['no bench checks yet', expect.stringMatching(/^half collapsed by 21 days \(95 % interval .*; 1 collapse in 2 samples\)$/)]);
    const checkedBlock = page.getByTestId('dossier-shelf-life').nth(1);
    expect(await checkedBlock.textContent()).toContain('Stiffening: G′ +55.9 Pa per tenfold age (95 % interval -2.24 to 114 Pa): no clear trend.');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await screenshot(page, 'shortlist-dossier');

    mkdirSync(SCREENSHOT_DIR, { recursive: true });
    const pdfPath = join(SCREENSHOT_DIR, 'shortlist-dossier.pdf');
    await page.emulateMedia({ media: 'print' });
    await page.pdf({ path: pdfPath, format: 'A4', printBackground: true });
    const info = execFileSync('pdfinfo', [pdfPath], { encoding: 'utf8' });
    const pages = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
    expect(pages).toBeGreaterThanOrEqual(1);
    const text = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
    expect(text).toContain('Dossier round one');
    for (const code of codes) expect(text).toContain(code);
    // The map is in the PDF: its axis title and tick labels are printed text.
    expect(text).toContain('Volume fraction');
    expect(text).toMatch(/Approval history[\s\S]*approved[\s\S]*Mona Manager/);
    expect(text).toContain('Mix both.');
    expect(text).toContain('Before you mix');
    expect(text).toMatch(/Shelf life on the bench/i); // printed headings are upper-cased by CSS
    expect(text).toMatch(/half collapsed by 21\s+days/);
    // Screen-only controls stay off paper.
    expect(text).not.toContain('Print or save as PDF');
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
