import { beforeAll, describe, expect, it } from 'vitest';
import { seriousAccessibilityViolations } from '../support/axe';
import { openCheckedPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';
import { seededRandom } from '../../shared/seeded-random';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';

// Expected figures by hand from the product-limit rule (Kaplan & Meier 1958): three samples,
// collapsed at 21 and 35 days, one standing at 28 → Ŝ = 2/3 after day 21, 0 after day 35, so
// half have collapsed by day 35 (derived).

const suite = withBrowserStack();
let formulator: TestUser;
let code: string;
let programmeId: number;
let agedProgrammeId: number;

beforeAll(async () => {
  const lib = await buildLibrary();
  const programme = await buildProgramme({ name: 'Shelf-watched primers', goalState: 'gel', attractionSource: 'depletion' });
  formulator = await buildUser({ role: 'formulator' });
  const created = await (await signedInAgent(suite.stack.app, formulator)).post('/api/recipes').send(recipeInput(programme, lib, { name: 'Weak primer gel' }));
  expect(created.status).toBe(201);
  code = created.body.recipe.code;
  programmeId = programme.id;
  const scientist = await signedInAgent(suite.stack.app, await buildUser({ role: 'scientist' }));
  // G′ of the gel checks rises with age: 100, 110, 130, 150 Pa at 7, 7, 14, 28 days.
  const checks: Array<[string, number, string, number | null]> = [
    ['2026-01-05', 7, 'gel', 100], ['2026-01-05', 21, 'collapsed', null],
    ['2026-01-12', 7, 'gel', 110], ['2026-01-12', 28, 'gel', 150],
    ['2026-01-19', 14, 'gel', 130], ['2026-01-19', 35, 'collapsed', null],
  ];
  for (const [mixedAt, ageDays, observedState, storageModulusPa] of checks) {
    const response = await scientist.post('/api/observations').send({ recipeId: created.body.recipe.id, mixedAt, ageDays, observedState, method: 'rheology', ...(storageModulusPa === null ? {} : { storageModulusPa }) });
    expect(response.status).toBe(201);
  }
  // A second, invented programme with enough collapses for the model: eight recipes of rising
  // polymer dose, four samples each, the collapse hazard falling with the dose.
  const aged = await buildProgramme({ name: 'Aged primer series', goalState: 'gel', attractionSource: 'depletion' });
  agedProgrammeId = aged.id;
  const formulatorAgent = await signedInAgent(suite.stack.app, formulator);
  const random = seededRandom(1414);
  // Invented fill heights (20–80 mm), recorded at each sample's first check, from their own sequence.
  const heights = seededRandom(2002);
  for (let i = 0; i < 8; i++) {
    const recipe = await formulatorAgent.post('/api/recipes').send(recipeInput(aged, lib, { fraction: { kind: 'volume', value: 0.12 + 0.01 * i }, attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: 6 + 1.5 * i } }));
    expect(recipe.status).toBe(201);
    for (let s = 0; s < 4; s++) {
      const collapseDay = 3 + Math.ceil(-Math.log(1 - random()) * 8 * (1 + i / 2));
      const lastCheck = 20 + Math.floor(random() * 40);
      const end = Math.min(collapseDay, lastCheck);
      const sampleHeightMm = 20 + Math.round(60 * heights());
      for (const [ageDays, observedState] of [[2, 'gel'], [end, collapseDay <= lastCheck ? 'collapsed' : 'gel']] as const) {
        const check = await scientist.post('/api/observations').send({ recipeId: recipe.body.recipe.id, mixedAt: `2026-0${1 + s}-1${i}`, ageDays, observedState, method: 'visual', ...(ageDays === 2 ? { sampleHeightMm } : {}) });
        expect(check.status).toBe(201);
      }
    }
  }
}, 120_000);

describe('shelf life on the recipe page', () => {
  it('shows how long the recipe\'s gels lasted on the bench: the survival curve with its band and the median in words', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.goto(`${suite.stack.url}/recipes/${code}`);
    const panel = page.getByTestId('bench-survival');
    await panel.waitFor();
    expect(await panel.textContent()).toContain('Half collapsed by 35 days');
    expect(await panel.textContent()).toContain('2 collapses in 3 samples');
    await panel.getByRole('img', { name: /this recipe's gel samples still standing against age/ }).waitFor();
    expect(await page.getByTestId('stiffening').textContent()).toMatch(/G′ rises by [\d.]+ Pa per tenfold age .*it stiffens as it ages/);
    // Gels like it: the recipe is alone in its group and its region, so both curves are its own (same figures).
    const similar = page.getByTestId('similar-survival');
    await similar.waitFor();
    expect(await similar.getByRole('region', { name: 'Similar recipes' }).textContent()).toContain('Half collapsed by 35 days');
    await page.getByRole('img', { name: /similar recipes' gel samples still standing/ }).waitFor();
    // Two collapses are far below the ten a proportional-hazards fit needs (MIN_COX_EVENTS).
    const drivers = page.getByTestId('collapse-drivers');
    expect(await drivers.getByTestId('collapse-drivers-refused').textContent()).toContain('Cannot fit what drives collapse: 2 collapses seen; at least 10 are needed.');
    // No check of its three samples gave a fill height, so the (refused) fit would leave it out.
    expect(await drivers.textContent()).toMatch(/sample height \(not recorded on the bench log for 3 of 3 samples\).*Starrs, Poon, Hibberd & Robins/);
    await page.getByText("Where this map's lines come from").click();
    expect(await page.getByTestId('line-sources').textContent()).toContain('mode-coupling');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await screenshot(page, 'recipe-shelf-life');
    expect(unexpected()).toEqual([]);
    await context.close();
  });

  it('colours the state map by predicted median days to collapse when the shelf-life layer is on, and says why it is off when the model is refused', async () => {
    const { page, context, unexpected } = await openCheckedPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, formulator.email, formulator.password);
    await page.goto(`${suite.stack.url}/map?programme=${agedProgrammeId}`);
    // click, not check(): the box follows the address, which the router updates in a transition,
    // so it may show the old state for a frame after the click.
    await page.getByLabel('Predicted median days to collapse').click();
    await page.waitForURL(/shelf=median/);
    await expect.poll(() => page.getByLabel('Predicted median days to collapse').isChecked()).toBe(true);
    const key = page.getByTestId('shelf-life-key');
    await key.waitFor();
    expect(await key.textContent()).toMatch(/Predicted median days to collapse.*too thin.*Cox model/);
    // Every sample of this programme has a fill height, so the model uses it and the layer holds it at the typical one.
    expect(await key.textContent()).toMatch(/sample height at the programme's typical \d+(\.\d+)? mm/);
    expect(await page.getByTestId('shelf-life-layer').locator('rect').count()).toBeGreaterThan(100);
    await screenshot(page, 'map-shelf-life-layer');
    // The first programme has two collapses: the layer is off and says why.
    await page.goto(`${suite.stack.url}/map?programme=${programmeId}&shelf=median`);
    await page.getByTestId('shelf-life-key').waitFor();
    expect(await page.getByTestId('shelf-life-key').textContent()).toBe('Shelf-life layer off: 2 collapses seen; at least 10 are needed.');
    expect(await page.getByTestId('shelf-life-layer').count()).toBe(0);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    expect(unexpected()).toEqual([]);
    await context.close();
  });
});
