import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { decodeMapObservations } from '../../shared/views/map-points';
import { buildUser, signedInAgent } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
beforeAll(async () => {
  stack = await startTestStack();
});
afterAll(() => stack.close());

describe('GET /api/map-points', () => {
  it("returns a programme's live recipes and observations as columns, with every map coordinate", async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme();
    const formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    const scientist = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
    const kept = (await formulator.post('/api/recipes').send(recipeInput(programme, lib))).body.recipe;
    const gone = (await formulator.post('/api/recipes').send(recipeInput(programme, lib))).body.recipe;
    await formulator.post(`/api/recipes/${gone.id}/archive`);
    const obs = (await scientist.post('/api/observations').send({ recipeId: kept.id, mixedAt: '2026-11-01', ageDays: 3, observedState: 'gel', method: 'visual' })).body.observation;

    const viewer = await signedInAgent(stack.app, await buildUser({ role: 'viewer' }));
    const response = await viewer.get(`/api/map-points?programme=${programme.id}`);
    expect(response.status).toBe(200);
    const { recipes, observations } = response.body;
    expect(recipes.rows).toHaveLength(1);
    const r = Object.fromEntries(recipes.columns.map((c: string, i: number) => [c, recipes.rows[0][i]]));
    expect(r).toMatchObject({ id: kept.id, code: kept.code, predictedState: kept.derived.predictedState });
    // Coordinates to six significant digits.
    expect(r.phi).toBeCloseTo(kept.derived.phi, 5);
    expect(r.reducedB2 / kept.derived.reducedB2).toBeCloseTo(1, 5);
    expect(r.polymerReservoir / kept.derived.polymerReservoir).toBeCloseTo(1, 5);
    // An observation of a recipe is sent as id, recipe, state and age; the rest is the recipe's.
    expect(observations.columns.slice(0, 4)).toEqual(['id', 'recipeId', 'observedState', 'ageDays']);
    expect(observations.rows).toEqual([[obs.id, kept.id, 'gel', 3]]);
    const [decoded] = decodeMapObservations(response.body);
    expect(decoded).toMatchObject({ id: obs.id, recipeId: kept.id, recipeCode: kept.code, observedState: 'gel', ageDays: 3, predictedState: kept.derived.predictedState, agrees: obs.agrees });
    expect(decoded.phi).toBe(r.phi);
  });

  it('sends an ad-hoc observation with its own coordinates and prediction', async () => {
    const programme = await buildProgramme();
    const scientist = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
    const created = await scientist.post('/api/observations').send({ adhoc: { programmeId: programme.id, phi: 0.2, reducedB2: -6 }, mixedAt: '2026-11-01', ageDays: 1, observedState: 'gel', method: 'visual' });
    expect(created.status).toBe(201);
    const response = await scientist.get(`/api/map-points?programme=${programme.id}`);
    const [decoded] = decodeMapObservations(response.body);
    expect(decoded).toMatchObject({ id: created.body.observation.id, recipeId: null, recipeCode: null, phi: 0.2, reducedB2: -6, observedState: 'gel', agrees: created.body.observation.agrees });
    // 1/τ = 4(1 − B2*) for Baxter's sticky spheres (physics.md §2): 4 × 7 = 28.
    expect(decoded.inverseTau).toBeCloseTo(28, 6);
    expect(decoded.predictedState).toBe(created.body.observation.predictedState);
  });

  it('serves the same answer compressed, and a 304 to a client that has it already', async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme();
    const formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    await formulator.post('/api/recipes').send(recipeInput(programme, lib));
    const plain = await formulator.get(`/api/map-points?programme=${programme.id}`).set('Accept-Encoding', 'identity');
    const zipped = await formulator.get(`/api/map-points?programme=${programme.id}`).set('Accept-Encoding', 'gzip');
    expect(zipped.headers['content-encoding']).toBe('gzip');
    expect(zipped.body).toEqual(plain.body);
    const again = await formulator.get(`/api/map-points?programme=${programme.id}`).set('If-None-Match', plain.headers.etag);
    expect(again.status).toBe(304);
    // A new recipe changes the answer at once.
    await formulator.post('/api/recipes').send(recipeInput(programme, lib));
    const changed = await formulator.get(`/api/map-points?programme=${programme.id}`).set('If-None-Match', plain.headers.etag);
    expect(changed.status).toBe(200);
    expect(changed.body.recipes.rows).toHaveLength(2);
  });

  it('answers many loads at once alike, and a write made while they run is in the next answer', async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme();
    const formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    await formulator.post('/api/recipes').send(recipeInput(programme, lib));
    const url = `/api/map-points?programme=${programme.id}`;
    const together = await Promise.all(Array.from({ length: 12 }, () => formulator.get(url)));
    expect(new Set(together.map((r) => r.status))).toEqual(new Set([200]));
    expect(new Set(together.map((r) => r.headers.etag)).size).toBe(1);
    // Loads in flight while a recipe is saved: whatever they answer, a load after the save sees it.
    const during = Array.from({ length: 8 }, () => formulator.get(url));
    const saved = await formulator.post('/api/recipes').send(recipeInput(programme, lib));
    await Promise.all(during);
    const after = await formulator.get(url);
    expect(after.body.recipes.rows.map((r: unknown[]) => r[0])).toContain(saved.body.recipe.id);
  });

  it('answers an unknown programme with 400 naming the field', async () => {
    const viewer = await signedInAgent(stack.app, await buildUser({ role: 'viewer' }));
    const response = await viewer.get('/api/map-points?programme=99999999');
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('programmeId');
  });
});
