import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { syntheticObservations } from '../../shared/calibration/test-support/synthetic-observations';
import { PHYSICS_MODEL_VERSION } from '../../shared/physics';
import { BAND_Z, plannedRecipeInput } from '../../shared/planning';
import { deriveRecipe, type RecipeMaterials } from '../../shared/recipe-derivation';
import type { PlanInput } from '../../shared/schemas/plans';
import { cachedStateMap } from '../../shared/state-map-cache';
import type { PlanSummaryView, PlanView } from '../../shared/views/plan';
import type { MapPoints } from '../../shared/views/map-points';
import type { RecipeView } from '../../shared/views/recipe';
import type { ShortlistView } from '../../shared/views/shortlist';
import { AuditEvent, Calibration, ParticleSystem, Plan, Recipe, type Programme } from '../../server/models';
import { presentDepletant, presentParticle, presentSalt, presentSolvent } from '../../server/presenters/materials';
import { agentsForEveryRole } from '../support/builders';
import { buildLibrary, buildProgramme, type Library } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

// The planner's science and statistics are checked in shared/planning/*.test.ts (Halton 1960,
// Fritsch & Carlson 1980, the probit approximation of MacKay 1992, hand-computed costs). Here:
// the routes, what a plan stores, recipes and shortlists made from it in one transaction, and
// that every stored prediction is what shared/recipe-derivation gives. All data invented.

let stack: TestStack;
let lib: Library;
let agents: Awaited<ReturnType<typeof agentsForEveryRole>>;
let programme: Programme;

beforeAll(async () => {
  stack = await startTestStack();
  lib = await buildLibrary();
  programme = await buildProgramme({ goalState: 'gel', attractionSource: 'depletion' });
  agents = await agentsForEveryRole(stack.app);
});
afterAll(() => stack.close());

function planBody(overrides: Partial<PlanInput> = {}): PlanInput {
  return {
    programmeId: programme.id,
    particleId: lib.particle.id,
    solventId: lib.solvent.id,
    temperatureC: 25,
    attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: { min: 0, max: 12 } },
    phi: { min: 0.05, max: 0.4 },
    targetState: 'gel',
    minMargin: 0.15,
    candidateCount: 5,
    experimentCount: 3,
    ...overrides,
  };
}

async function plan(overrides: Partial<PlanInput> = {}, agent = agents.formulator.agent) {
  const response = await agent.post('/api/plans').send(planBody(overrides));
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body.plan as PlanView;
}

const materials = (): RecipeMaterials => ({ particle: presentParticle(lib.particle), solvent: presentSolvent(lib.solvent), depletant: presentDepletant(lib.depletant), salt: presentSalt(lib.salt) });

describe('POST /api/plans', () => {
  it('plans gels, stores inputs, model version and outcome, and every candidate is what the recipe derivation gives', async () => {
    const before = await AuditEvent.count({ where: { action: 'plan.created' } });
    const stored = await plan();
    expect(stored.outcome.feasible).toBe(true);
    expect(stored.outcome.candidates).toHaveLength(5);
    expect(stored.modelVersion).toBe(PHYSICS_MODEL_VERSION);
    expect(stored.calibration).toBeNull();
    expect(stored.uncertainty).toMatchObject({ source: 'default', standardError: 0.4, shift: 0 });
    expect(stored.inputs).toMatchObject({ minMargin: 0.15, candidateCount: 5, targetState: 'gel' });
    expect(stored.createdBy?.id).toBe(agents.formulator.user.id);
    expect(stored.outcome.counts.sampled).toBe(10_000);
    const template = { programmeId: programme.id, particleId: lib.particle.id, solventId: lib.solvent.id, temperatureC: 25, attraction: { source: 'depletion' as const, depletantId: lib.depletant.id } };
    for (const c of stored.outcome.candidates) {
      expect(c.phi).toBeGreaterThanOrEqual(0.05);
      expect(c.phi).toBeLessThanOrEqual(0.4);
      const recipe = plannedRecipeInput(template, c.phi, c.level, 'check');
      const { derived } = deriveRecipe(recipe, materials());
      expect(derived.predictedState).toBe('gel');
      expect(derived.margin).toBeGreaterThanOrEqual(0.15);
      expect(c.derived.predictedState).toBe(derived.predictedState);
      expect(c.derived.margin).toBeCloseTo(derived.margin!, 9);
      // Cost by hand from the library prices: particles 120, solvent 0.01, PEG 40 per kg (team-builders).
      expect(c.costPerLitre.total).toBeCloseTo(c.phi * 2.0 * 120 + (1 - c.phi) * 0.997 * 0.01 + ((c.level * (1 - c.phi)) / 1000) * 40, 10);
    }
    expect(stored.prices.particles).toEqual({ pricePerKg: 120, source: 'library' });
    expect(stored.outcome.window.feasible.length).toBeGreaterThan(0);
    expect(stored.outcome.experiments.items.length).toBeGreaterThan(0);
    expect(stored.outcome.experiments.summary[0]).toMatch(/No accepted calibration/);
    expect(await AuditEvent.count({ where: { action: 'plan.created' } })).toBe(before + 1);

    const again = await agents.viewer.agent.get(`/api/plans/${stored.id}`);
    expect(again.status).toBe(200);
    expect(again.body.plan.outcome.candidates).toEqual(stored.outcome.candidates);
    const list = await agents.viewer.agent.get(`/api/plans?programme=${programme.id}`);
    expect(list.status).toBe(200);
    const mine = (list.body.items as PlanSummaryView[]).find((p) => p.id === stored.id);
    expect(mine).toMatchObject({ targetState: 'gel', source: 'depletion', feasible: true, candidateCount: 5, recipeCount: 0 });
  });

  it('uses a price given for the plan instead of the library’s, and says so', async () => {
    const stored = await plan({ prices: { particles: 10 }, candidateCount: 2, experimentCount: 0 });
    expect(stored.prices.particles).toEqual({ pricePerKg: 10, source: 'plan' });
    expect(stored.prices.polymer).toEqual({ pricePerKg: 40, source: 'library' });
    const c = stored.outcome.candidates[0];
    expect(c.costPerLitre.parts.particles).toBeCloseTo(c.phi * 2.0 * 10, 12);
  });

  it('answers a target it cannot meet with advice on what to relax, and stores that too', async () => {
    const stored = await plan({ attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: { min: 0, max: 3 } }, experimentCount: 0 });
    expect(stored.outcome.feasible).toBe(false);
    expect(stored.outcome.candidates).toEqual([]);
    const raise = stored.outcome.advice.find((a) => a.constraint === 'level.max');
    expect(raise?.to).toBeGreaterThan(3);
    expect(raise?.message).toMatch(/Raise the polymer limit to/);
    const relaxed = await plan({ attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: { min: 0, max: raise!.to! } }, experimentCount: 0 });
    expect(relaxed.outcome.feasible).toBe(true);
  });

  it('plans salt gels too, with B2* from DLVO', async () => {
    const stored = await plan({ attraction: { source: 'salt', saltId: lib.salt.id, concentrationMM: { min: 50, max: 1500 } }, minMargin: 0.05, candidateCount: 3, experimentCount: 0 });
    expect(stored.source).toBe('salt');
    expect(stored.levelUnit).toBe('mM');
    expect(stored.outcome.candidates.length).toBeGreaterThan(0);
    for (const c of stored.outcome.candidates) {
      expect(c.derived.predictedState).toBe('gel');
      expect(c.derived.debyeLengthNm).toBeCloseTo(0.304011912660618 / Math.sqrt(c.level / 1000), 6);
    }
  });

  it('refuses bad input with a 400 naming the field, and writes nothing', async () => {
    const bare = await ParticleSystem.create({ name: 'Uncharged test spheres', coreMaterial: 'latex', radiusNm: 150, polydispersityPct: 3, densityGcm3: 1.05, stabilisation: 'steric', surfacePotentialMv: null, hamakerZj: null, pricePerKg: null, notes: null, createdBy: null });
    const cases: [Partial<PlanInput> | Record<string, unknown>, string][] = [
      [{ phi: { min: 0.3, max: 0.2 } }, 'phi.max'],
      [{ phi: { min: 0.001, max: 0.2 } }, 'phi.min'],
      [{ attraction: { source: 'depletion', depletantId: 999999999, concentrationGL: { min: 0, max: 5 } } }, 'attraction.depletantId'],
      [{ attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: { min: 5, max: 5 } } }, 'attraction.concentrationGL.max'],
      [{ candidateCount: 0 }, 'candidateCount'],
      [{ minMargin: -0.1 }, 'minMargin'],
      [{ targetState: 'separated' as never }, 'targetState'],
      [{ programmeId: 999999999 }, 'programmeId'],
      [{ particleId: bare.id, attraction: { source: 'salt', saltId: lib.salt.id, concentrationMM: { min: 10, max: 100 } } }, 'particleId'],
      [{ ranking: { margin: 0, cost: 0, evidence: 0 } }, 'ranking.margin'],
      [{ colour: 'blue' } as Record<string, unknown>, 'body'],
    ];
    for (const [overrides, field] of cases) {
      const counts = await tableCounts(stack.sequelize);
      const response = await agents.formulator.agent.post('/api/plans').send({ ...planBody(), ...overrides });
      expect(response.status, `${field}: ${JSON.stringify(response.body)}`).toBe(400);
      expect(response.body.error.field ?? 'body').toBe(field);
      expect(await tableCounts(stack.sequelize)).toEqual(counts);
    }
  });
});

describe('POST /api/plans/:id/recipes', () => {
  it('turns two candidates into recipes with the plan as origin and a new draft shortlist, in one step', async () => {
    const stored = await plan({ candidateCount: 4, experimentCount: 0 });
    const before = await AuditEvent.count({ where: { action: 'plan.recipes_made', entityId: String(stored.id) } });
    const response = await agents.formulator.agent.post(`/api/plans/${stored.id}/recipes`).send({ candidates: [0, 2], shortlist: { mode: 'new', title: 'Planned gels for the shelf test' } });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    const recipes = response.body.recipes as RecipeView[];
    const shortlist = response.body.shortlist as ShortlistView;
    expect(recipes.map((r) => r.origin)).toEqual([`plan:${stored.id}`, `plan:${stored.id}`]);
    for (const [k, index] of [0, 2].entries()) {
      const candidate = stored.outcome.candidates[index];
      expect(recipes[k].fraction).toEqual({ kind: 'volume', value: candidate.phi });
      expect(recipes[k].attraction).toEqual({ source: 'depletion', depletantId: lib.depletant.id, concentrationGL: candidate.level });
      expect(recipes[k].derived.predictedState).toBe('gel');
      expect(recipes[k].derived.margin).toBeCloseTo(candidate.derived.margin!, 9);
      expect(recipes[k].notes).toContain(`From plan ${stored.id}`);
    }
    expect(shortlist).toMatchObject({ status: 'draft', targetState: 'gel', title: 'Planned gels for the shelf test', programmeId: programme.id });
    expect(shortlist.items.map((i) => i.recipeId)).toEqual(recipes.map((r) => r.id));
    expect(shortlist.items[0].reason).toMatch(new RegExp(`^From plan ${stored.id}: predicted gel with margin`));
    expect(await AuditEvent.count({ where: { action: 'plan.recipes_made', entityId: String(stored.id) } })).toBe(before + 1);

    const seen = (await agents.manager.agent.get(`/api/plans/${stored.id}`)).body.plan as PlanView;
    expect(seen.recipes.map((r) => [r.kind, r.index, r.code])).toEqual([['candidate', 0, recipes[0].code], ['candidate', 2, recipes[1].code]]);
    expect(seen.outcome.candidates[2].recipe).toEqual({ id: recipes[1].id, code: recipes[1].code });
    expect(seen.outcome.candidates[1].recipe).toBeNull();
    const points = (await agents.viewer.agent.get(`/api/map-points?programme=${programme.id}`)).body as MapPoints;
    expect(points.recipes.rows.map((r) => r[1])).toEqual(expect.arrayContaining(recipes.map((r) => r.code)));
    expect((await agents.viewer.agent.get(`/api/plans?programme=${programme.id}`)).body.items.find((p: PlanSummaryView) => p.id === stored.id).recipeCount).toBe(2);
  });

  it('appends to an existing draft shortlist, and refuses a candidate already made (409) without writing', async () => {
    const stored = await plan({ candidateCount: 3, experimentCount: 0 });
    const first = await agents.formulator.agent.post(`/api/plans/${stored.id}/recipes`).send({ candidates: [0], shortlist: { mode: 'new', title: 'Growing list' } });
    expect(first.status).toBe(201);
    const second = await agents.formulator.agent.post(`/api/plans/${stored.id}/recipes`).send({ candidates: [1], shortlist: { mode: 'existing', shortlistId: first.body.shortlist.id } });
    expect(second.status, JSON.stringify(second.body)).toBe(201);
    expect((second.body.shortlist as ShortlistView).items.map((i) => i.recipeId)).toEqual([first.body.recipes[0].id, second.body.recipes[0].id]);
    const counts = await tableCounts(stack.sequelize);
    const twice = await agents.formulator.agent.post(`/api/plans/${stored.id}/recipes`).send({ candidates: [2, 0] });
    expect(twice.status).toBe(409);
    expect(twice.body.error.message).toContain(first.body.recipes[0].code);
    expect(await tableCounts(stack.sequelize)).toEqual(counts);
  });

  it('rolls everything back when the shortlist step fails: a shortlist of another programme is a 400 naming it', async () => {
    const stored = await plan({ candidateCount: 2, experimentCount: 0 });
    const other = await buildProgramme();
    const foreign = await agents.formulator.agent.post('/api/shortlists').send({ programmeId: other.id, title: 'Elsewhere', targetState: 'gel', items: [] });
    expect(foreign.status).toBe(201);
    const counts = await tableCounts(stack.sequelize);
    const response = await agents.formulator.agent.post(`/api/plans/${stored.id}/recipes`).send({ candidates: [0, 1], shortlist: { mode: 'existing', shortlistId: foreign.body.shortlist.id } });
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('shortlist.shortlistId');
    expect(await tableCounts(stack.sequelize)).toEqual(counts);
    for (const [body, field] of [[{ candidates: [7] }, 'candidates.0'], [{ candidates: [] }, 'candidates'], [{ candidates: [0, 0] }, 'candidates'], [{ candidates: [0], shortlist: { mode: 'existing', shortlistId: 999999999 } }, 'shortlist.shortlistId']] as const) {
      const bad = await agents.formulator.agent.post(`/api/plans/${stored.id}/recipes`).send(body);
      expect(bad.status, field).toBe(400);
      expect(bad.body.error.field).toBe(field);
    }
    expect(await tableCounts(stack.sequelize)).toEqual(counts);
    expect((await agents.formulator.agent.post('/api/plans/999999999/recipes').send({ candidates: [0] })).status).toBe(404);
  });
});

describe('POST /api/plans/:id/next-experiments/recipes', () => {
  it('sends proposed experiments to the bench as recipes with the note and why each was chosen', async () => {
    const stored = await plan({ candidateCount: 1, experimentCount: 3 });
    const items = stored.outcome.experiments.items;
    expect(items.length).toBeGreaterThanOrEqual(2);
    const response = await agents.admin.agent.post(`/api/plans/${stored.id}/next-experiments/recipes`).send({ experiments: [0, 1], note: 'Mix on Monday; look at 1 and 7 days.' });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    const recipes = response.body.recipes as RecipeView[];
    expect(recipes).toHaveLength(2);
    for (const [k, r] of recipes.entries()) {
      expect(r.origin).toBe(`plan:${stored.id}`);
      expect(r.notes).toMatch(/^Mix on Monday; look at 1 and 7 days\.\n\nNext experiment \d of plan/);
      expect(r.notes).toContain('narrows the boundary');
      expect(r.fraction.value).toBe(items[k].phi);
    }
    const again = await agents.admin.agent.post(`/api/plans/${stored.id}/next-experiments/recipes`).send({ experiments: [1] });
    expect(again.status).toBe(409);
    const seen = (await agents.viewer.agent.get(`/api/plans/${stored.id}`)).body.plan as PlanView;
    expect(seen.recipes.filter((r) => r.kind === 'experiment').map((r) => r.index)).toEqual([0, 1]);
    expect(await Recipe.count({ where: { origin: `plan:${stored.id}` } })).toBe(2);
  });
});

describe('plans of a calibrated programme', () => {
  it('use the accepted calibration: its id is stored, and next experiments stay within ŝ ± 1.96 SE of its shift', async () => {
    const calibrated = await buildProgramme({ goalState: 'gel', attractionSource: 'depletion' });
    const generated = syntheticObservations({ map: cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }), count: 60, seed: 7, truth: { attractionShift: 0.6 }, noiseScale: 0.2, phi: [0.04, 0.45], b2: [-5, 0] });
    for (const o of generated) {
      const response = await agents.scientist.agent.post('/api/observations').send({ adhoc: { programmeId: calibrated.id, phi: o.phi, reducedB2: o.reducedB2, description: 'invented test composition' }, mixedAt: '2026-02-02', ageDays: 3, observedState: o.observedState, method: 'visual' });
      expect(response.status).toBe(201);
    }
    const fitted = await agents.manager.agent.post(`/api/programmes/${calibrated.id}/calibrations`).send({ parameters: ['attractionShift'] });
    expect(fitted.status, JSON.stringify(fitted.body)).toBe(201);
    const accepted = await agents.manager.agent.post(`/api/programmes/${calibrated.id}/calibrations/${fitted.body.calibration.id}/accept`).send({});
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
    // What the classifier uses is the stored row (programmeParameters reads it), not the raw estimate.
    const row = (await Calibration.findByPk(fitted.body.calibration.id))!;
    const shift = { value: row.attractionShift, standardError: row.attractionShiftSe };

    const stored = await plan({ programmeId: calibrated.id, experimentCount: 4 });
    expect(stored.calibration?.id).toBe(fitted.body.calibration.id);
    expect(stored.uncertainty).toMatchObject({ source: 'calibration', shift: shift.value, standardError: shift.standardError });
    expect(stored.map.parameters.attractionShift).toBe(shift.value);
    expect(stored.outcome.experiments.summary[0]).toMatch(/accepted calibration/);
    for (const e of stored.outcome.experiments.items) expect(Math.abs(e.boundaryOffset)).toBeLessThanOrEqual(BAND_Z * shift.standardError + 1e-9);
    for (const c of stored.outcome.candidates) expect(c.derived.calibration?.id).toBe(fitted.body.calibration.id);
    expect((await Plan.findByPk(stored.id))!.calibrationId).toBe(fitted.body.calibration.id);
  });
});
