import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gelOnset } from '../../shared/calibration';
import { syntheticObservations } from '../../shared/calibration/test-support/synthetic-observations';
import { DEFAULT_CLASSIFIER_PARAMETERS, squareWellDepthFromReducedB2 } from '../../shared/physics';
import { deriveRecipe, type RecipeMaterials } from '../../shared/recipe-derivation';
import type { RecipeInput } from '../../shared/schemas/recipes';
import { cachedStateMap } from '../../shared/state-map-cache';
import type { CalibrationListView, CalibrationView } from '../../shared/views/calibration';
import type { ObservationView } from '../../shared/views/observation';
import type { RecipeView } from '../../shared/views/recipe';
import { AuditEvent, Calibration, ParticleSystem, Recipe, type Programme } from '../../server/models';
import { presentParticle, presentSolvent } from '../../server/presenters/materials';
import { adhocPrediction } from '../../server/services/predictions';
import { agentsForEveryRole } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

// The fit's statistics are checked in shared/calibration/*.test.ts against synthetic data
// (logistic regression: McCullagh & Nelder 1989; Agresti 2013). Here: the routes, the storage,
// and that accepting or withdrawing recomputes the programme's stored predictions exactly as
// shared/recipe-derivation does, in one transaction. All data invented.

let stack: TestStack;
let lib: Library;
let agents: Awaited<ReturnType<typeof agentsForEveryRole>>;
let programme: Programme;
const recipes: { id: number; input: RecipeInput }[] = [];

const TRUE_SHIFT = 0.8;
const RANGE = 0.1; // square well λ = 1.1

/**
 * Bench outcomes of ad-hoc compositions, "observed" with a known shift (see syntheticObservations),
 * below the attractive-glass line (φ_g ≈ 0.40 at strong attraction), where a gel boundary exists.
 */
async function recordBench(target: Programme, count: number, seed: number, truth = { attractionShift: TRUE_SHIFT }) {
  const generated = syntheticObservations({ map: cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }), count, seed, truth, noiseScale: 0.2, phi: [0.04, 0.38], b2: [-5, 0] });
  for (const o of generated) {
    const response = await agents.scientist.agent.post('/api/observations').send({
      adhoc: { programmeId: target.id, phi: o.phi, reducedB2: o.reducedB2, description: 'test composition' },
      mixedAt: '2026-02-02',
      ageDays: 3,
      observedState: o.observedState,
      method: 'visual',
    });
    expect(response.status).toBe(201);
  }
  return generated;
}

/** Direct-attraction recipes at φ = 0.2 just on the weak side of the theory's spinodal: the calibration moves them. */
async function buildRecipesNearBoundary(target: Programme, particleId = lib.particle.id) {
  const onset = gelOnset(cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }), 0.2).spinodalB2!;
  const made: { id: number; input: RecipeInput }[] = [];
  for (const weaker of [0.25, 0.45, 1.5, -0.5]) {
    const input = recipeInput(target, lib, {
      particleId,
      fraction: { kind: 'volume', value: 0.2 },
      attraction: { source: 'direct', contactEnergyKT: squareWellDepthFromReducedB2(onset + weaker, 1 + RANGE), rangeSigma: RANGE },
    });
    const response = await agents.formulator.agent.post('/api/recipes').send(input);
    expect(response.status).toBe(201);
    made.push({ id: response.body.recipe.id, input });
  }
  return made;
}

async function materialsFor(input: RecipeInput): Promise<RecipeMaterials> {
  const particle = await ParticleSystem.findByPk(input.particleId);
  return { particle: presentParticle(particle!), solvent: presentSolvent(lib.solvent), depletant: null, salt: null };
}

async function storedRecipe(id: number) {
  const response = await agents.viewer.agent.get(`/api/recipes/${id}`);
  expect(response.status).toBe(200);
  return response.body.recipe as RecipeView;
}

async function adhocObservations(target: Programme) {
  const response = await agents.viewer.agent.get(`/api/observations?programme=${target.id}&pageSize=200`);
  expect(response.status).toBe(200);
  return (response.body.items as ObservationView[]).filter((o) => o.adhoc !== null);
}

beforeAll(async () => {
  stack = await startTestStack();
  lib = await buildLibrary();
  agents = await agentsForEveryRole(stack.app);
  programme = await buildProgramme({ name: 'Sticky primer', attractionSource: 'direct' });
  recipes.push(...(await buildRecipesNearBoundary(programme)));
  await recordBench(programme, 60, 7);
  // Two observations of a recipe, so the fit also reads recipes' own maps.
  for (const observedState of ['gel', 'collapsed'] as const) {
    const response = await agents.scientist.agent.post('/api/observations').send({ recipeId: recipes[0].id, mixedAt: '2026-02-03', ageDays: 7, observedState, method: 'rheology' });
    expect(response.status).toBe(201);
  }
});
afterAll(() => stack.close());

describe('POST /api/programmes/:id/calibrations', () => {
  it('fits the bench, stores the fit as proposed with who and when, and lists it newest first', async () => {
    const response = await agents.scientist.agent.post(`/api/programmes/${programme.id}/calibrations`).send({ parameters: ['attractionShift'], folds: 5, note: 'first look' });
    expect(response.status).toBe(201);
    const calibration = response.body.calibration as CalibrationView;
    expect(calibration.status).toBe('proposed');
    expect(calibration.fittedBy?.id).toBe(agents.scientist.user.id);
    expect(Date.now() - Date.parse(calibration.fittedAt)).toBeLessThan(60_000);
    expect(calibration.observationsUsed).toBe(62);
    expect(calibration.result.observations.offered).toBe(62);
    expect(Math.abs(calibration.estimates.attractionShift.value - TRUE_SHIFT)).toBeLessThan(3 * calibration.estimates.attractionShift.standardError);
    expect(calibration.parameters.gelB2Threshold).toBe(DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold);
    expect(Math.abs(calibration.parameters.attractionShift - calibration.estimates.attractionShift.value)).toBeLessThanOrEqual(0.0005);
    expect(calibration.estimates.gelB2Threshold).toBeNull();
    expect(calibration.crossValidated.folds).toBe(5);
    expect(calibration.note).toBe('first look');
    expect(calibration.result.agreement.before.counts.flat().reduce((s, n) => s + n, 0)).toBe(62);

    const later = await agents.formulator.agent.post(`/api/programmes/${programme.id}/calibrations`).send({});
    expect(later.status).toBe(201);
    expect(later.body.calibration.fitted).toEqual(['attractionShift', 'gelB2Threshold']);
    const list = await agents.viewer.agent.get(`/api/programmes/${programme.id}/calibrations`);
    expect(list.status).toBe(200);
    const body = list.body as CalibrationListView;
    expect(body.items.slice(0, 2).map((c) => c.id)).toEqual([later.body.calibration.id, calibration.id]);
    expect(body.inUse).toBeNull();
    const one = await agents.viewer.agent.get(`/api/programmes/${programme.id}/calibrations/${calibration.id}`);
    expect(one.status).toBe(200);
    expect(one.body.calibration.result.fit.attractionShift).toEqual(calibration.estimates.attractionShift);
    expect(await AuditEvent.count({ where: { action: 'calibration.fitted', entityId: String(calibration.id) } })).toBe(1);
  });

  it('refuses too few observations with a 422 that says how many are needed, and writes nothing', async () => {
    const small = await buildProgramme({ attractionSource: 'direct' });
    await recordBench(small, 6, 99);
    const before = await tableCounts(stack.sequelize);
    const response = await agents.manager.agent.post(`/api/programmes/${small.id}/calibrations`).send({ parameters: ['attractionShift'] });
    expect(response.status).toBe(422);
    expect(response.body.error.id).toBe('calibration_refused');
    expect(response.body.error.message).toMatch(/needs at least 8 observations on each side of the gel boundary; this programme has \d+ on the gel side \(gel or collapsed\) and \d+ not gel/);
    expect(response.body.error.counts.neededPerSide).toBe(8);
    expect(response.body.error.counts.gelSide + response.body.error.counts.notGelSide).toBe(6);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
  });

  it('answers bad input with a 400 naming the field, unknown ids with 404, and writes nothing', async () => {
    const before = await tableCounts(stack.sequelize);
    const post = (path: string, body: object) => agents.manager.agent.post(path).send(body);
    const base = `/api/programmes/${programme.id}/calibrations`;
    const cases: [string, object, string][] = [
      [base, { parameters: ['gelB2Threshold'] }, 'parameters'],
      [base, { parameters: ['attractionShift', 'glassPhi'] }, 'parameters.1'],
      [base, { parameters: 'attractionShift' }, 'parameters'],
      [base, { folds: 1 }, 'folds'],
      [base, { folds: 2.5 }, 'folds'],
      [base, { folds: '5' }, 'folds'],
      [base, { note: 'x'.repeat(2001) }, 'note'],
      [base, { attractionShift: 3 }, 'body'],
      ['/api/programmes/abc/calibrations', {}, 'id'],
      [`${base}/0/accept`, {}, 'calibrationId'],
    ];
    for (const [path, body, field] of cases) {
      const response = await post(path, body);
      expect(response.status, `${path} ${JSON.stringify(body)}`).toBe(400);
      expect(response.body.error.field, `${path} ${JSON.stringify(body)}`).toBe(field);
    }
    expect((await post('/api/programmes/999999999/calibrations', {})).status).toBe(404);
    expect((await post(`${base}/999999999/accept`, {})).status).toBe(404);
    expect((await agents.viewer.agent.get(`${base}/999999999`)).status).toBe(404);
    expect((await agents.viewer.agent.get('/api/programmes/999999999/calibrations')).status).toBe(404);
    // A calibration is found only under its own programme.
    const other = await buildProgramme({ attractionSource: 'direct' });
    const own = await Calibration.findOne({ where: { programmeId: programme.id } });
    expect((await agents.viewer.agent.get(`/api/programmes/${other.id}/calibrations/${own!.id}`)).status).toBe(404);
    expect((await post(`/api/programmes/${other.id}/calibrations/${own!.id}/accept`, {})).status).toBe(404);
    const after = await tableCounts(stack.sequelize);
    expect({ ...after, programmes: before.programmes }).toEqual(before);
  });

  it('lets only the roles shared/permissions names fit, accept and withdraw', async () => {
    const base = `/api/programmes/${programme.id}/calibrations`;
    expect((await agents.viewer.agent.post(base).send({ parameters: ['attractionShift'] })).status).toBe(403);
    const proposed = await agents.formulator.agent.post(base).send({ parameters: ['attractionShift'] });
    expect(proposed.status).toBe(201);
    for (const role of ['formulator', 'scientist', 'viewer'] as const) {
      expect((await agents[role].agent.post(`${base}/${proposed.body.calibration.id}/accept`).send({})).status).toBe(403);
      expect((await agents[role].agent.post(`${base}/withdraw`).send({})).status).toBe(403);
    }
    expect((await Calibration.findByPk(proposed.body.calibration.id))!.status).toBe('proposed');
  });
});

describe('accepting and withdrawing a calibration', () => {
  it('recomputes every stored prediction with the calibration in one change, and keeps the one it replaces in the history', async () => {
    const base = `/api/programmes/${programme.id}/calibrations`;
    const beforeStates = await Promise.all(recipes.map(async (r) => (await storedRecipe(r.id)).derived.predictedState));
    const first = (await agents.manager.agent.post(base).send({ parameters: ['attractionShift'] })).body.calibration as CalibrationView;
    const accepted = await agents.manager.agent.post(`${base}/${first.id}/accept`).send({});
    expect(accepted.status).toBe(200);
    expect(accepted.body.calibration.status).toBe('accepted');
    expect(accepted.body.calibration.acceptedBy.id).toBe(agents.manager.user.id);
    expect(accepted.body.recomputed.recipes).toBe(recipes.length);
    expect(accepted.body.recomputed.observations).toBe(60);
    const label = { id: first.id, acceptedAt: accepted.body.calibration.acceptedAt as string };

    for (const r of recipes) {
      const stored = await storedRecipe(r.id);
      const materials = await materialsFor(r.input);
      const expected = deriveRecipe(r.input, materials, { parameters: first.parameters, calibration: label }).derived;
      expect(stored.derived).toEqual(JSON.parse(JSON.stringify(expected)));
      const row = await Recipe.findByPk(r.id);
      expect([row!.predictedState, row!.margin, row!.phi]).toEqual([expected.predictedState, expected.margin, expected.phi]);
    }
    const afterStates = await Promise.all(recipes.map(async (r) => (await storedRecipe(r.id)).derived.predictedState));
    // The two recipes 0.25 and 0.45 B2* on the weak side of the spinodal become gels under a shift near 0.8.
    expect(beforeStates.slice(0, 2).every((s) => s !== 'gel')).toBe(true);
    expect(afterStates.slice(0, 2)).toEqual(['gel', 'gel']);
    for (const o of await adhocObservations(programme)) expect(o.predictedState).toBe(adhocPrediction(o.adhoc!.phi, o.adhoc!.reducedB2, first.parameters));
    const changedAdhoc = (await adhocObservations(programme)).filter((o) => o.predictedState !== adhocPrediction(o.adhoc!.phi, o.adhoc!.reducedB2, undefined)).length;
    expect(accepted.body.recomputed.changedStates).toBe(afterStates.filter((s, i) => s !== beforeStates[i]).length + changedAdhoc);
    expect(changedAdhoc).toBeGreaterThan(0);

    // A second calibration replaces the first; the first stays in the history, superseded.
    const second = (await agents.admin.agent.post(base).send({ parameters: ['attractionShift', 'gelB2Threshold'] })).body.calibration as CalibrationView;
    expect((await agents.admin.agent.post(`${base}/${second.id}/accept`).send({})).status).toBe(200);
    const history = (await agents.viewer.agent.get(base)).body as CalibrationListView;
    const firstNow = history.items.find((c) => c.id === first.id)!;
    expect(firstNow.status).toBe('superseded');
    expect(firstNow.endedBy?.id).toBe(agents.admin.user.id);
    expect(history.inUse?.id).toBe(second.id);
    expect(history.items.filter((c) => c.status === 'accepted').map((c) => c.id)).toEqual([second.id]);
    const stored = await storedRecipe(recipes[1].id);
    expect(stored.derived.calibration?.id).toBe(second.id);
    expect(await AuditEvent.count({ where: { action: 'calibration.accepted', entityId: String(second.id) } })).toBe(1);
    // Accepted, superseded: neither can be accepted again.
    expect((await agents.admin.agent.post(`${base}/${second.id}/accept`).send({})).status).toBe(409);
    expect((await agents.admin.agent.post(`${base}/${first.id}/accept`).send({})).status).toBe(409);
  });

  it('withdraws back to the uncalibrated theory: stored predictions equal deriveRecipe without parameters', async () => {
    const base = `/api/programmes/${programme.id}/calibrations`;
    const response = await agents.manager.agent.post(`${base}/withdraw`).send({});
    expect(response.status).toBe(200);
    expect(response.body.calibration.status).toBe('withdrawn');
    expect(response.body.calibration.endedBy.id).toBe(agents.manager.user.id);
    for (const r of recipes) {
      const stored = await storedRecipe(r.id);
      const materials = await materialsFor(r.input);
      expect(stored.derived).toEqual(JSON.parse(JSON.stringify(deriveRecipe(r.input, materials).derived)));
      expect(stored.derived.calibration).toBeNull();
    }
    for (const o of await adhocObservations(programme)) expect(o.predictedState).toBe(adhocPrediction(o.adhoc!.phi, o.adhoc!.reducedB2, undefined));
    expect(((await agents.viewer.agent.get(base)).body as CalibrationListView).inUse).toBeNull();
    expect(await AuditEvent.count({ where: { action: 'calibration.withdrawn', entityId: String(response.body.calibration.id) } })).toBe(1);
    expect((await agents.manager.agent.post(`${base}/withdraw`).send({})).status).toBe(409);
  });

  it('changes nothing when one recipe cannot be derived again: the calibration stays proposed and every prediction stays as it was', async () => {
    const target = await buildProgramme({ attractionSource: 'direct' });
    const fragile = await ParticleSystem.create({ name: `Fragile silica ${target.codePrefix}`, coreMaterial: 'silica', radiusNm: 100, polydispersityPct: 5, densityGcm3: 2.0, stabilisation: 'charge', surfacePotentialMv: -40, hamakerZj: 8, pricePerKg: null, notes: null, createdBy: null });
    const made = [...(await buildRecipesNearBoundary(target)), ...(await buildRecipesNearBoundary(target, fragile.id))];
    // Enough samples for 8 on the weak side: most of this box gels (threshold at the critical B2*).
    await recordBench(target, 90, 17);
    const fit = await agents.manager.agent.post(`/api/programmes/${target.id}/calibrations`).send({ parameters: ['attractionShift'] });
    expect(fit.status, JSON.stringify(fit.body)).toBe(201);
    const fitted = fit.body.calibration as CalibrationView;
    // The library row of the last recipes is damaged behind the API's back (a radius of 0).
    await ParticleSystem.update({ radiusNm: 0 }, { where: { id: fragile.id } });
    const derivedBefore = await Promise.all(made.map(async (r) => (await Recipe.findByPk(r.id))!.derived));
    const adhocBefore = (await adhocObservations(target)).map((o) => o.predictedState);
    const before = await tableCounts(stack.sequelize);
    const response = await agents.manager.agent.post(`/api/programmes/${target.id}/calibrations/${fitted.id}/accept`).send({});
    expect(response.status).toBe(409);
    expect(response.body.error.message).toMatch(/could not be derived again.*nothing was changed/);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
    expect(await Promise.all(made.map(async (r) => (await Recipe.findByPk(r.id))!.derived))).toEqual(derivedBefore);
    expect((await adhocObservations(target)).map((o) => o.predictedState)).toEqual(adhocBefore);
    expect((await Calibration.findByPk(fitted.id))!.status).toBe('proposed');
    expect(await AuditEvent.count({ where: { action: 'calibration.accepted', entityId: String(fitted.id) } })).toBe(0);
  });
});
