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
    const created = await formulator.post('/api/shortlists').send({ programmeId: programme.id, title: 'Dossier round one', purpose: 'Two doses for the shelf test', targetState: 'gel', items: ids.map((recipeId, i) => ({ recipeId, reason: `dose ${i + 1}` })) });
    const id = created.body.shortlist.id;
    await formulator.post(`/api/shortlists/${id}/submit`);
    const manager = await signedInAgent(suite.stack.app, await buildUser({ role: 'manager', name: 'Mona Manager' }));
    expect((await manager.post(`/api/shortlists/${id}/approve`).send({ comment: 'Mix both.' })).status).toBe(200);

    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, author.email, author.password);
    await page.goto(`${suite.stack.url}/shortlists/${id}/dossier`);
    await page.getByRole('img', { name: /^State map of shortlist/ }).waitFor();
    await page.getByText('Day 0').first().waitFor({ timeout: 1000 }).catch(() => {}); // no observations yet is fine
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
    // Screen-only controls stay off paper.
    expect(text).not.toContain('Print or save as PDF');
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
