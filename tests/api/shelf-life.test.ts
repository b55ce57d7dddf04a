import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { seededRandom } from '../../shared/seeded-random';
import { fitShelfLifeModel } from '../../shared/shelf-life';
import type { ProgrammeShelfLifeView } from '../../shared/views/shelf-life';
import type { RecipeView } from '../../shared/views/recipe';
import { agentsForEveryRole } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';
import { startTestStack, type TestStack } from '../support/test-stack';

// All bench data invented. The statistics are checked in shared/shelf-life/*.test.ts against the
// remission trial (Freireich et al. 1963) and independent implementations; here: the route, its
// permissions, what it reads from the bench, and that the curves are the product-limit estimate of
// the samples this test recorded (a naive loop written here).

let stack: TestStack;
let lib: Library;
let agents: Awaited<ReturnType<typeof agentsForEveryRole>>;
let enough: { id: number };
let few: { id: number };
const recorded = new Map<number, { timeDays: number; collapsed: boolean; sampleHeightMm: number | null }[]>();
const recipes: RecipeView[] = [];

/** Product-limit estimate as a plain loop over distinct collapse times (Kaplan & Meier 1958). */
function naiveProductLimit(records: { timeDays: number; collapsed: boolean }[], t: number): number {
  const times = [...new Set(records.filter((r) => r.collapsed && r.timeDays <= t).map((r) => r.timeDays))];
  return times.reduce((s, time) => s * (1 - records.filter((r) => r.collapsed && r.timeDays === time).length / records.filter((r) => r.timeDays >= time).length), 1);
}

/**
 * One sample: a gel check at day 2, then collapsed at `timeDays` or still a gel there. With
 * `heights`, the first check records the fill height and the last one, when given, a corrected
 * height; the sample's height is the latest recorded (docs/shelf-life.md), else the first.
 */
async function recordSample(recipeId: number, mixedAt: string, timeDays: number, collapsed: boolean, heights?: { first: number; corrected?: number }) {
  const checks = [
    { ageDays: 2, observedState: 'gel', sampleHeightMm: heights?.first },
    { ageDays: timeDays, observedState: collapsed ? 'collapsed' : 'gel', sampleHeightMm: heights?.corrected },
  ];
  for (const check of checks) {
    const response = await agents.scientist.agent.post('/api/observations').send({ recipeId, mixedAt, method: 'visual', ...check });
    expect(response.status).toBe(201);
  }
  const list = recorded.get(recipeId) ?? [];
  list.push({ timeDays, collapsed, sampleHeightMm: heights ? heights.corrected ?? heights.first : null });
  recorded.set(recipeId, list);
}

beforeAll(async () => {
  stack = await startTestStack();
  agents = await agentsForEveryRole(stack.app);
  lib = await buildLibrary();
  const programme = await buildProgramme({ name: 'Shelf-life route test', goalState: 'gel' });
  enough = programme;
  const random = seededRandom(1414);
  // Invented fill heights, 20–80 mm, from their own sequence (the collapse times stay as they were).
  const heightRandom = seededRandom(2002);
  // Eight recipes of rising polymer dose (stronger attraction); invented collapse hazard falls with it.
  for (let i = 0; i < 8; i++) {
    const created = await agents.formulator.agent.post('/api/recipes').send(recipeInput(programme, lib, { fraction: { kind: 'volume', value: 0.12 + 0.01 * i }, attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: 6 + 1.5 * i } }));
    expect(created.status).toBe(201);
    recipes.push(created.body.recipe);
  }
  for (const [index, recipe] of recipes.entries()) {
    for (let s = 0; s < 4; s++) {
      const collapseDay = 3 + Math.ceil(-Math.log(1 - random()) * 8 * (1 + index / 2));
      const lastCheck = 20 + Math.floor(random() * 40);
      const first = 20 + Math.round(heightRandom() * 60);
      // Every fourth sample's height is corrected at its last check.
      await recordSample(recipe.id, `2026-0${1 + s}-1${index}`, Math.min(collapseDay, lastCheck), collapseDay <= lastCheck, { first, corrected: s === 3 ? first + 3 : undefined });
    }
  }
  few = await buildProgramme({ name: 'Shelf-life route test, little bench' });
  const lone = await agents.formulator.agent.post('/api/recipes').send(recipeInput(few as never, lib));
  expect(lone.status).toBe(201);
  await recordSample(lone.body.recipe.id, '2026-03-01', 12, true);
  await recordSample(lone.body.recipe.id, '2026-03-02', 15, true);
  await recordSample(lone.body.recipe.id, '2026-03-03', 30, false);
}, 120_000);

afterAll(async () => {
  await stack?.close();
});

describe('GET /api/programmes/:id/shelf-life', () => {
  it('lets every role read it, refuses anyone signed out, and answers 404 for an unknown programme', async () => {
    expect((await agents.viewer.agent.get(`/api/programmes/${few.id}/shelf-life`)).status).toBe(200);
    expect((await request(stack.app).get(`/api/programmes/${few.id}/shelf-life`)).status).toBe(401);
    expect((await agents.viewer.agent.get('/api/programmes/999999999/shelf-life')).status).toBe(404);
  });

  it('refuses a malformed recipe with a 400 naming it, and a recipe of another programme with a 404', async () => {
    const bad = await agents.viewer.agent.get(`/api/programmes/${enough.id}/shelf-life?recipe=1e3`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('recipe');
    const other = await agents.viewer.agent.get(`/api/programmes/${few.id}/shelf-life?recipe=${recipes[0].id}`);
    expect(other.status).toBe(404);
  });

  it('gives each recipe the product-limit curve of the samples the bench recorded for it, and the fit of what drives collapse with each sample\'s latest height', async () => {
    const response = await agents.formulator.agent.get(`/api/programmes/${enough.id}/shelf-life`);
    expect(response.status).toBe(200);
    const body = response.body as ProgrammeShelfLifeView;
    const all = [...recorded].filter(([id]) => recipes.some((r) => r.id === id)).flatMap(([, list]) => list);
    expect(body.sampleCount).toBe(32);
    expect(body.collapseCount).toBe(all.filter((r) => r.collapsed).length);
    expect(body.collapseCount).toBeGreaterThanOrEqual(10);
    for (const entry of body.recipes) {
      const mine = recorded.get(entry.recipeId)!;
      expect(entry.curve.sampleCount).toBe(mine.length);
      for (const step of entry.curve.steps) expect(step.survival).toBeCloseTo(naiveProductLimit(mine, step.timeDays), 12);
    }
    expect(body.drivers.status).toBe('fitted');
    if (body.drivers.status !== 'fitted') return;
    // The same fit from the recipes' stored derivation as the recipe route presents it.
    const expected = fitShelfLifeModel(
      recipes.flatMap((r) =>
        recorded.get(r.id)!.map((s) => ({
          ...s,
          covariates: { attractionKt: r.derived.contactEnergyKT, phi: r.derived.phi, log10Peclet: Math.log10(r.derived.timescales.gravitationalPeclet!), sampleHeightMm: s.sampleHeightMm },
        })),
      ),
    );
    expect(expected.status).toBe('fitted');
    if (expected.status !== 'fitted') return;
    expect(body.drivers.terms.map((t) => t.key)).toEqual(expected.terms.map((t) => t.key));
    body.drivers.terms.forEach((t, i) => expect(t.coefficient).toBeCloseTo(expected.terms[i].coefficient, 9));
    // Every sample has a height, so the fit uses it, per 10 mm; one particle system: the Péclet number does not vary.
    expect(body.drivers.terms.find((t) => t.key === 'sampleHeightMm')).toMatchObject({ label: 'sample height', unit: 'mm', step: 10, reading: expect.stringMatching(/^each \+10 mm of sample height multiplies the collapse hazard by /) });
    expect(body.drivers.omitted.map((o) => o.key)).toEqual(['log10Peclet']);
    expect(body.context).toMatch(/Starrs, Poon, Hibberd & Robins.*Manley et al\./);
  });

  it('for one recipe gives its group curve (similar recipes pooled) and the region curves, programme-wide', async () => {
    const focus = recipes[3];
    const response = await agents.viewer.agent.get(`/api/programmes/${enough.id}/shelf-life?recipe=${focus.id}`);
    expect(response.status).toBe(200);
    const body = response.body as ProgrammeShelfLifeView;
    expect(body.recipes.map((r) => r.recipeId)).toEqual([focus.id]);
    const [group] = body.groups;
    expect(group.recipeIds).toContain(focus.id);
    const pooled = group.recipeIds.flatMap((id) => recorded.get(id) ?? []);
    expect(group.curve.sampleCount).toBe(pooled.length);
    for (const step of group.curve.steps) expect(step.survival).toBeCloseTo(naiveProductLimit(pooled, step.timeDays), 12);
    const region = body.regions.find((r) => r.region === body.recipes[0].region)!;
    const inRegion = recipes.filter((r) => (r.derived.predictedState ?? 'unpredicted') === region.region).flatMap((r) => recorded.get(r.id)!);
    expect(region.curve.sampleCount).toBe(inRegion.length);
    for (const step of region.curve.steps) expect(step.survival).toBeCloseTo(naiveProductLimit(inRegion, step.timeDays), 12);
    expect(body.recipes[0].predicted?.reading).toMatch(/^the model predicts .*, for a sample filled to the programme's typical [\d.]+ mm$/);
  });

  it('refuses the fit in plain words when the programme has seen too few collapses, and still gives the curves', async () => {
    const response = await agents.viewer.agent.get(`/api/programmes/${few.id}/shelf-life`);
    expect(response.status).toBe(200);
    const body = response.body as ProgrammeShelfLifeView;
    expect(body.drivers).toMatchObject({ status: 'refused', reason: 'too-few-events', message: 'Cannot fit what drives collapse: 2 collapses seen; at least 10 are needed.' });
    // None of its samples has a recorded height.
    expect(body.drivers.omitted).toContainEqual({ key: 'sampleHeightMm', label: 'sample height', why: 'not recorded on the bench log for 3 of 3 samples' });
    expect(body.recipes[0].summary).toMatch(/^half collapsed by 15 days/);
  });
});
