import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
    const o = Object.fromEntries(observations.columns.map((c: string, i: number) => [c, observations.rows[0][i]]));
    // An observation of a recipe leaves its coordinates to the recipe's row.
    expect(o).toMatchObject({ id: obs.id, recipeId: kept.id, phi: null, reducedB2: null, observedState: 'gel', ageDays: 3, recipeCode: kept.code });
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

  it('answers an unknown programme with 400 naming the field', async () => {
    const viewer = await signedInAgent(stack.app, await buildUser({ role: 'viewer' }));
    const response = await viewer.get('/api/map-points?programme=99999999');
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('programmeId');
  });
});
