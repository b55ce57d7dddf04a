import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkFromDue } from '../../shared/check-schedules/check-from-due';
import type { DueCheckView } from '../../shared/views/check-schedules';
import type { Programme } from '../../server/models';
import { listDueChecks } from '../../server/services/check-schedules';
import { buildUser, signedInAgent } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

// Due dates below are counted by hand on the calendar (derived): e.g. mixed 1 March 2026, on
// 16 March at noon the sample is 15 whole days old.

let stack: TestStack;
let lib: Library;
let scientist: Awaited<ReturnType<typeof signedInAgent>>;
let formulator: Awaited<ReturnType<typeof signedInAgent>>;
let viewer: Awaited<ReturnType<typeof signedInAgent>>;

beforeAll(async () => {
  stack = await startTestStack();
  lib = await buildLibrary();
  scientist = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
  formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
  viewer = await signedInAgent(stack.app, await buildUser({ role: 'viewer' }));
});
afterAll(() => stack.close());

async function newRecipe(programme: Programme, name = 'Scheduled gel') {
  const response = await formulator.post('/api/recipes').send(recipeInput(programme, lib, { name }));
  expect(response.status).toBe(201);
  return response.body.recipe as { id: number; code: string; version: number };
}

async function record(recipeId: number, mixedAt: string, ageDays: number, observedState = 'gel', extra: Record<string, unknown> = {}) {
  const response = await scientist.post('/api/observations').send({ recipeId, mixedAt, ageDays, observedState, method: 'visual', ...extra });
  expect(response.status).toBe(201);
  return response.body.observation as { id: number };
}

const isoDaysAgo = (days: number) => new Date(Date.UTC(new Date().getUTCFullYear(), new Date().getUTCMonth(), new Date().getUTCDate() - days)).toISOString().slice(0, 10);

describe('PUT /api/recipes/:id/check-schedule', () => {
  it('stores the ages, shows who set them, keeps the recipe version, and an empty list removes it', async () => {
    const programme = await buildProgramme();
    const recipe = await newRecipe(programme);
    expect((await viewer.get(`/api/recipes/${recipe.id}/check-schedule`)).body.schedule).toEqual({ recipeId: recipe.id, agesDays: [], updatedAt: null, updatedBy: null });
    const set = await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [1, 3, 7, 14, 28, 56] });
    expect(set.status).toBe(200);
    expect(set.body.schedule).toMatchObject({ recipeId: recipe.id, agesDays: [1, 3, 7, 14, 28, 56] });
    expect(set.body.schedule.updatedBy.name).toMatch(/scientist/);
    expect((await viewer.get(`/api/recipes/${recipe.id}/check-schedule`)).body.schedule).toEqual(set.body.schedule);
    expect((await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [2, 30] })).body.schedule.agesDays).toEqual([2, 30]);
    expect((await viewer.get(`/api/recipes/${recipe.id}`)).body.recipe.version).toBe(recipe.version);
    const cleared = await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [] });
    expect(cleared.body.schedule).toEqual({ recipeId: recipe.id, agesDays: [], updatedAt: null, updatedBy: null });
  });

  it('refuses bad ages with a 400 naming the field, and changes nothing', async () => {
    const programme = await buildProgramme();
    const recipe = await newRecipe(programme);
    await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [7, 14] });
    const before = await tableCounts(stack.sequelize);
    const cases: Array<[unknown, string, RegExp]> = [
      [{ agesDays: [7, 3] }, 'agesDays', /increase/],
      [{ agesDays: [7, 7] }, 'agesDays', /increase/],
      [{ agesDays: [0, 7] }, 'agesDays.0', /at least 1 day/],
      [{ agesDays: [1.5] }, 'agesDays.0', /whole number/],
      [{ agesDays: [3651] }, 'agesDays.0', /at most 3650/],
      [{ agesDays: Array.from({ length: 21 }, (_, i) => i + 1) }, 'agesDays', /at most 20/],
      [{ agesDays: '1,3,7' }, 'agesDays', /list of ages/],
      [{ agesDays: [1], every: 3 }, 'body', /every|unrecognized/i],
      [{}, 'agesDays', /list of ages/],
    ];
    for (const [body, field, message] of cases) {
      const response = await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send(body as object);
      expect(response.status, JSON.stringify(body)).toBe(400);
      expect(response.body.error.field, JSON.stringify(body)).toBe(field);
      expect(response.body.error.message).toMatch(message);
    }
    expect(await tableCounts(stack.sequelize)).toEqual(before);
    expect((await viewer.get(`/api/recipes/${recipe.id}/check-schedule`)).body.schedule.agesDays).toEqual([7, 14]);
  });

  it('is for those who record bench outcomes: a formulator or viewer is refused and nothing changes; unknown or archived recipes are refused', async () => {
    const programme = await buildProgramme();
    const recipe = await newRecipe(programme);
    const before = await tableCounts(stack.sequelize);
    expect((await formulator.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [1] })).status).toBe(403);
    expect((await viewer.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [1] })).status).toBe(403);
    expect((await scientist.put('/api/recipes/999999999/check-schedule').send({ agesDays: [1] })).status).toBe(404);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
    expect((await formulator.post(`/api/recipes/${recipe.id}/archive`)).status).toBe(200);
    const archived = await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [1] });
    expect(archived.status).toBe(409);
    expect(archived.body.error.message).toContain(recipe.code);
  });
});

describe('the due list (service, at fixed dates)', () => {
  it('lists standing samples whose next scheduled age has come, most overdue first, and leaves out collapsed, on-time, archived and unscheduled ones', async () => {
    const programme = await buildProgramme();
    const scheduled = await newRecipe(programme, 'Scheduled');
    const unscheduled = await newRecipe(programme, 'No schedule');
    await scientist.put(`/api/recipes/${scheduled.id}/check-schedule`).send({ agesDays: [1, 3, 7, 14, 28, 56] });
    await record(scheduled.id, '2026-03-01', 1, 'gel', { sampleHeightMm: 40 }); // filled to 40 mm; not given again
    const seventh = await record(scheduled.id, '2026-03-01', 7); // next: 14
    await record(scheduled.id, '2026-03-10', 3); // next: 7
    await record(scheduled.id, '2026-03-05', 3);
    await record(scheduled.id, '2026-03-05', 7, 'collapsed'); // finished
    await record(scheduled.id, '2026-03-14', 1); // next: 3
    await record(unscheduled.id, '2026-03-01', 1);

    // 16 March, noon: 1 March is 15 days old (14-day check 1 day overdue); 10 March is 6 days old
    // (7-day check not yet); 14 March is 2 days old (3-day check not yet).
    const march16 = await listDueChecks(programme.id, 50, new Date('2026-03-16T12:00:00Z'));
    expect(march16.total).toBe(1);
    expect(march16.items).toEqual([
      { recipeId: scheduled.id, recipeCode: scheduled.code, recipeName: 'Scheduled', mixedAt: '2026-03-01T00:00:00.000Z', lastCheck: { observationId: seventh.id, ageDays: 7, observedState: 'gel' }, sampleHeightMm: 40, dueAgeDays: 14, ageTodayDays: 15 },
    ]);

    // 20 March: 1 March is 19 days old (5 overdue), 10 March 10 (7-day check 3 overdue), 14 March 6 (3-day check 3 overdue).
    const march20 = await listDueChecks(programme.id, 50, new Date('2026-03-20T08:00:00Z'));
    expect(march20.items.map((d) => [d.mixedAt.slice(0, 10), d.dueAgeDays, d.ageTodayDays])).toEqual([
      ['2026-03-01', 14, 19],
      ['2026-03-10', 7, 10],
      ['2026-03-14', 3, 6],
    ]);
    expect((await listDueChecks(programme.id, 2, new Date('2026-03-20T08:00:00Z'))).items).toHaveLength(2);
    expect((await listDueChecks(programme.id, 2, new Date('2026-03-20T08:00:00Z'))).total).toBe(3);

    // Archiving the 7-day check of 1 March makes its 1-day check the last: the 3-day check is due (16 overdue).
    expect((await scientist.post(`/api/observations/${seventh.id}/archive`)).status).toBe(200);
    const afterArchive = await listDueChecks(programme.id, 50, new Date('2026-03-20T08:00:00Z'));
    expect(afterArchive.items[0]).toMatchObject({ mixedAt: '2026-03-01T00:00:00.000Z', dueAgeDays: 3, ageTodayDays: 19, lastCheck: { ageDays: 1 } });

    // An archived recipe's samples are no longer watched.
    await formulator.post(`/api/recipes/${scheduled.id}/archive`);
    expect((await listDueChecks(programme.id, 50, new Date('2026-03-20T08:00:00Z'))).total).toBe(0);
  });
});

describe('GET /api/due-checks and the one-click record', () => {
  it('records "still standing" once per key at today\'s age with the last state and the sample\'s height, and the sample leaves the list', async () => {
    const programme = await buildProgramme();
    const recipe = await newRecipe(programme);
    await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [3, 7, 14] });
    const mixed = isoDaysAgo(10);
    await record(recipe.id, mixed, 3, 'gel', { sampleHeightMm: 35 });
    const due = await viewer.get(`/api/due-checks?programme=${programme.id}`);
    expect(due.status).toBe(200);
    expect(due.body.total).toBe(1);
    const item: DueCheckView = due.body.items[0];
    expect(item).toMatchObject({ recipeCode: recipe.code, dueAgeDays: 7, ageTodayDays: 10, lastCheck: { ageDays: 3, observedState: 'gel' }, sampleHeightMm: 35 });

    const { input, idempotencyKey } = checkFromDue(item, 'standing');
    const before = await tableCounts(stack.sequelize);
    const first = await scientist.post('/api/observations').set('Idempotency-Key', idempotencyKey).send(input);
    const again = await scientist.post('/api/observations').set('Idempotency-Key', idempotencyKey).send(input);
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    expect(first.body.observation).toMatchObject({ recipeId: recipe.id, ageDays: 10, observedState: 'gel', method: 'visual', sampleHeightMm: 35 });
    expect(first.body.observation.mixedAt.slice(0, 10)).toBe(mixed);
    expect((await tableCounts(stack.sequelize)).observations).toBe(before.observations + 1);
    // Next check is at 14 days; the sample is 10 days old: no longer due.
    expect((await viewer.get(`/api/due-checks?programme=${programme.id}`)).body.total).toBe(0);
  });

  it('records "collapsed" and the sample leaves the list for good', async () => {
    const programme = await buildProgramme();
    const recipe = await newRecipe(programme);
    await scientist.put(`/api/recipes/${recipe.id}/check-schedule`).send({ agesDays: [1, 2] });
    await record(recipe.id, isoDaysAgo(5), 0, 'gel');
    const item: DueCheckView = (await scientist.get(`/api/due-checks?programme=${programme.id}`)).body.items[0];
    expect(item).toMatchObject({ dueAgeDays: 1, ageTodayDays: 5 });
    const { input, idempotencyKey } = checkFromDue(item, 'collapsed');
    const response = await scientist.post('/api/observations').set('Idempotency-Key', idempotencyKey).send(input);
    // No height was ever recorded for this sample, so none is carried.
    expect(response.body.observation).toMatchObject({ observedState: 'collapsed', ageDays: 5, sampleHeightMm: null });
    expect((await scientist.get(`/api/due-checks?programme=${programme.id}`)).body.total).toBe(0);
    // The recipe's survival record is now an event at day 5 (not a censored one).
    const timeline = await viewer.get(`/api/observations?recipe=${recipe.id}`);
    expect(timeline.body.items.map((o: { ageDays: number; observedState: string }) => [o.ageDays, o.observedState]).sort()).toEqual([[0, 'gel'], [5, 'collapsed']]);
  });

  it('refuses a missing or unknown programme and a bad limit, naming the field', async () => {
    for (const [query, field] of [['', 'programme'], ['?programme=abc', 'programme'], ['?programme=999999999', 'programme'], ['?programme=1&limit=0', 'limit'], ['?programme=1&limit=201', 'limit']] as const) {
      const response = await viewer.get(`/api/due-checks${query}`);
      expect(response.status, query).toBe(400);
      expect(response.body.error.field, query).toBe(field);
    }
  });
});
