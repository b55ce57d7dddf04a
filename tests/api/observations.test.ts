import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { ImportBatch, Observation, type Programme } from '../../server/models';
import { buildUser, signedInAgent } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let lib: Library;
let programme: Programme;
let scientist: Awaited<ReturnType<typeof signedInAgent>>;
let formulator: Awaited<ReturnType<typeof signedInAgent>>;
let recipe: { id: number; code: string; derived: { predictedState: string } };

beforeAll(async () => {
  stack = await startTestStack();
  lib = await buildLibrary();
  programme = await buildProgramme();
  scientist = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
  formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
  recipe = (await formulator.post('/api/recipes').send(recipeInput(programme, lib))).body.recipe;
});
afterAll(() => stack.close());

const observation = (overrides: Record<string, unknown> = {}) => ({
  recipeId: recipe.id,
  mixedAt: '2026-11-02',
  ageDays: 7,
  observedState: 'gel',
  method: 'rheology',
  storageModulusPa: 35,
  ...overrides,
});

function csv(rows: string[][]) {
  return Buffer.from(rows.map((r) => r.join(',')).join('\n') + '\n');
}
const HEADER = ['recipe_code', 'mixed_on', 'age_days', 'observed_state', 'method', 'storage_modulus_pa', 'yield_stress_pa', 'settled_height_pct', 'notes'];

describe('POST /api/observations', () => {
  it('records an outcome for a recipe and says whether it agrees with the prediction', async () => {
    const same = await scientist.post('/api/observations').send(observation({ observedState: recipe.derived.predictedState }));
    expect(same.status).toBe(201);
    expect(same.body.observation).toMatchObject({ recipeCode: recipe.code, predictedState: recipe.derived.predictedState, agrees: true, storageModulusPa: 35 });
    const other = recipe.derived.predictedState === 'fluid' ? 'gel' : 'fluid';
    const differs = await scientist.post('/api/observations').send(observation({ observedState: other }));
    expect(differs.body.observation.agrees).toBe(false);
    const unclear = await scientist.post('/api/observations').send(observation({ observedState: 'unclear' }));
    expect(unclear.body.observation.agrees).toBeNull();
    const disagreeing = await scientist.get(`/api/observations?recipe=${recipe.id}&disagreeing=true`);
    expect(disagreeing.body.items.map((o: { id: number }) => o.id)).toEqual([differs.body.observation.id]);
    // The answer to the write is what the database now holds, field for field.
    const stored = await scientist.get(`/api/observations/${same.body.observation.id}`);
    expect(stored.body.observation).toEqual(same.body.observation);
  });

  it('counts a collapsed sample of a predicted gel as agreeing, in the answer and in the bench-log filter alike', async () => {
    const gelRecipe = recipe.derived.predictedState === 'gel' ? recipe : null;
    expect(gelRecipe, 'the shared test recipe is predicted to gel').not.toBeNull();
    const collapsed = await scientist.post('/api/observations').send(observation({ observedState: 'collapsed' }));
    expect(collapsed.status).toBe(201);
    expect(collapsed.body.observation.agrees).toBe(true);
    const disagreeing = await scientist.get(`/api/observations?recipe=${recipe.id}&disagreeing=true`);
    expect(disagreeing.body.items.map((o: { id: number }) => o.id)).not.toContain(collapsed.body.observation.id);
    const agreeing = await scientist.get(`/api/observations?recipe=${recipe.id}&disagreeing=false`);
    expect(agreeing.body.items.map((o: { id: number }) => o.id)).toContain(collapsed.body.observation.id);
  });

  it('records an ad-hoc composition with its own prediction', async () => {
    const response = await scientist.post('/api/observations').send({ ...observation(), recipeId: undefined, adhoc: { programmeId: programme.id, phi: 0.2, reducedB2: -6, description: 'leftover batch, no recipe' } });
    expect(response.status).toBe(201);
    expect(response.body.observation.adhoc).toEqual({ phi: 0.2, reducedB2: -6, description: 'leftover batch, no recipe' });
    expect(['fluid', 'gel', 'glass', 'crystal', 'separated']).toContain(response.body.observation.predictedState);
    const stored = await scientist.get(`/api/observations/${response.body.observation.id}`);
    expect(stored.body.observation).toEqual(response.body.observation);
  });

  it('refuses both a recipe and an ad-hoc composition, a future-less date, a negative age', async () => {
    const before = await tableCounts(stack.sequelize);
    expect((await scientist.post('/api/observations').send({ ...observation(), adhoc: { programmeId: programme.id, phi: 0.2, reducedB2: -2 } })).status).toBe(400);
    const date = await scientist.post('/api/observations').send(observation({ mixedAt: '2026-13-45' }));
    expect(date.body.error.field).toBe('mixedAt');
    const age = await scientist.post('/api/observations').send(observation({ ageDays: -1 }));
    expect(age.body.error.field).toBe('ageDays');
    expect(await tableCounts(stack.sequelize)).toEqual(before);
  });

  it('records an optional sample height in mm, refuses one outside 1–1000 mm with a 400 naming it, and lets a correction clear it', async () => {
    const tall = await scientist.post('/api/observations').send(observation({ sampleHeightMm: 48.5 }));
    expect(tall.status).toBe(201);
    expect(tall.body.observation.sampleHeightMm).toBe(48.5);
    expect((await scientist.get(`/api/observations/${tall.body.observation.id}`)).body.observation.sampleHeightMm).toBe(48.5);
    expect((await scientist.post('/api/observations').send(observation())).body.observation.sampleHeightMm).toBeNull();
    const before = await tableCounts(stack.sequelize);
    for (const bad of [0.5, 1001, 'tall']) {
      const refused = await scientist.post('/api/observations').send(observation({ sampleHeightMm: bad }));
      expect(refused.status).toBe(400);
      expect(refused.body.error.field).toBe('sampleHeightMm');
      expect(refused.body.error.message).toMatch(/Sample height must be/);
    }
    expect(await tableCounts(stack.sequelize)).toEqual(before);
    const cleared = await scientist.put(`/api/observations/${tall.body.observation.id}`).send(observation({ sampleHeightMm: null }));
    expect(cleared.body.observation.sampleHeightMm).toBeNull();
  });

  it('lets only the observer or an administrator correct or archive a record', async () => {
    const mine = (await scientist.post('/api/observations').send(observation())).body.observation;
    const colleague = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
    expect((await colleague.put(`/api/observations/${mine.id}`).send(observation({ ageDays: 8 }))).status).toBe(403);
    expect((await colleague.post(`/api/observations/${mine.id}/archive`)).status).toBe(403);
    expect((await scientist.put(`/api/observations/${mine.id}`).send(observation({ ageDays: 8 }))).body.observation.ageDays).toBe(8);
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    expect((await admin.post(`/api/observations/${mine.id}/archive`)).body.observation.archived).toBe(true);
    expect(await Observation.count({ where: { id: mine.id } })).toBe(1); // archived, never deleted
  });
});

describe('POST /api/observations/import', () => {
  it('with one bad row imports nothing and reports the row and column; fixed, it imports every row', async () => {
    const rows = [
      [recipe.code, '2026-10-01', '0', 'fluid', 'visual', '', '', '', 'day 0'],
      [recipe.code, '2026-10-01', '1', 'gel', 'rheology', '12.5', '0.8', '', ''],
      [recipe.code, '2026-10-01', 'seven', 'gel', 'visual', '', '', '', ''],
      [recipe.code, '2026-10-01', '30', 'collapsed', 'visual', '', '', '62', 'clear layer on top'],
    ];
    const before = await Observation.count();
    const bad = await scientist.post('/api/observations/import').attach('file', csv([HEADER, ...rows]), 'batch.csv');
    expect(bad.status).toBe(422);
    expect(bad.body.report.ok).toBe(false);
    expect(bad.body.report.problems).toEqual([{ row: 4, column: 'age_days', message: 'age_days must be a number, got "seven"' }]);
    expect(await Observation.count()).toBe(before);

    rows[2][2] = '7';
    const good = await scientist.post('/api/observations/import').attach('file', csv([HEADER, ...rows]), 'batch.csv');
    expect(good.status).toBe(201);
    expect(good.body.report).toMatchObject({ ok: true, rows: 4, imported: 4 });
    expect(await Observation.count()).toBe(before + 4);
    expect(await Observation.count({ where: { importBatchId: good.body.report.batchId } })).toBe(4);
  });

  it('reports unknown recipe codes, states and methods per row', async () => {
    const response = await scientist.post('/api/observations/import').attach(
      'file',
      csv([HEADER, ['ZZ-0001', '2026-10-01', '1', 'gel', 'visual', '', '', '', ''], [recipe.code, '2026-10-01', '1', 'jelly', 'visual', '', '', '', ''], [recipe.code, '2026-10-01', '1', 'gel', 'taste', '', '', '', '']]),
      'x.csv',
    );
    expect(response.status).toBe(422);
    expect(response.body.report.problems.map((p: { row: number; column: string }) => [p.row, p.column])).toEqual([
      [2, 'recipe_code'],
      [3, 'observed_state'],
      [4, 'method'],
    ]);
  });

  it('checks only, writing nothing, with ?dryRun=true', async () => {
    const before = await Observation.count();
    const response = await scientist.post('/api/observations/import?dryRun=true').attach('file', csv([HEADER, [recipe.code, '2026-10-01', '1', 'gel', 'visual', '', '', '', '']]), 'x.csv');
    expect(response.status).toBe(200);
    expect(response.body.report).toMatchObject({ ok: true, rows: 1, imported: 0 });
    expect(await Observation.count()).toBe(before);
  });

  it('imports once when the same Idempotency-Key is sent twice', async () => {
    const key = `retry-${Date.now()}-${Math.random().toString(36).slice(2)}`;
    const file = csv([HEADER, [recipe.code, '2026-10-02', '2', 'gel', 'visual', '', '', '', 'retried upload']]);
    const before = await Observation.count();
    const first = await scientist.post('/api/observations/import').set('Idempotency-Key', key).attach('file', file, 'r.csv');
    const second = await scientist.post('/api/observations/import').set('Idempotency-Key', key).attach('file', file, 'r.csv');
    expect(first.status).toBe(201);
    expect(second.status).toBe(200);
    expect(second.body.report).toMatchObject({ imported: 1, replayed: true, batchId: first.body.report.batchId });
    expect(await Observation.count()).toBe(before + 1);
    expect(await ImportBatch.count({ where: { idempotencyKey: key } })).toBe(1);
  });

  it('imports once when two uploads with the same key race', async () => {
    const key = `race-${Date.now()}-${Math.random().toString(36).slice(2)}`;
    const file = csv([HEADER, [recipe.code, '2026-10-03', '3', 'gel', 'visual', '', '', '', 'raced upload']]);
    const before = await Observation.count();
    const answers = await Promise.all([1, 2, 3].map(() => scientist.post('/api/observations/import').set('Idempotency-Key', key).attach('file', file, 'r.csv')));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 201]);
    expect(await Observation.count()).toBe(before + 1);
  });

  it('answers 409 to an Idempotency-Key reused with a different file, importing nothing', async () => {
    const key = `reuse-${Date.now()}-${Math.random().toString(36).slice(2)}`;
    const first = await scientist.post('/api/observations/import').set('Idempotency-Key', key).attach('file', csv([HEADER, [recipe.code, '2026-10-05', '5', 'gel', 'visual', '', '', '', 'first file']]), 'a.csv');
    expect(first.status).toBe(201);
    const before = await Observation.count();
    const other = await scientist.post('/api/observations/import').set('Idempotency-Key', key).attach('file', csv([HEADER, [recipe.code, '2026-10-06', '6', 'fluid', 'visual', '', '', '', 'second file']]), 'b.csv');
    expect(other.status).toBe(409);
    expect(other.body.error.message).toMatch(/Idempotency-Key was used before for a different file/);
    expect(await Observation.count()).toBe(before);
  });

  it('imports the optional sample_height_mm column (blank: not recorded; out of bounds: the row and column named) and exports it', async () => {
    const header = [...HEADER.slice(0, -1), 'sample_height_mm', 'notes'];
    const rows = [
      [recipe.code, '2026-10-07', '1', 'gel', 'visual', '', '', '', '55', 'filled to 55 mm'],
      [recipe.code, '2026-10-07', '3', 'gel', 'visual', '', '', '', '', 'height not given'],
      [recipe.code, '2026-10-08', '1', 'gel', 'visual', '', '', '', '0', 'impossible height'],
    ];
    const before = await Observation.count();
    const bad = await scientist.post('/api/observations/import').attach('file', csv([header, ...rows]), 'heights.csv');
    expect(bad.status).toBe(422);
    expect(bad.body.report.problems).toEqual([{ row: 4, column: 'sample_height_mm', message: 'Sample height must be between 1 and 1000 mm' }]);
    expect(await Observation.count()).toBe(before);
    const good = await scientist.post('/api/observations/import').attach('file', csv([header, ...rows.slice(0, 2)]), 'heights.csv');
    expect(good.status).toBe(201);
    const stored = await Observation.findAll({ where: { importBatchId: good.body.report.batchId }, order: [['ageDays', 'ASC']] });
    expect(stored.map((o) => o.sampleHeightMm)).toEqual([55, null]);
    const exported = parse((await scientist.get(`/api/observations/export?recipe=${recipe.id}`)).text, { columns: true }) as Record<string, string>[];
    const byId = new Map(exported.map((r) => [r.observation_id, r]));
    expect(byId.get(String(stored[0].id))).toMatchObject({ sample_height_mm: '55', notes: 'filled to 55 mm' });
    expect(byId.get(String(stored[1].id))).toMatchObject({ sample_height_mm: '', notes: 'height not given' });
  });

  it('stores formula-looking cells as text and escapes them again on export', async () => {
    const formula = '=HYPERLINK("http://evil.example","click")';
    const response = await scientist.post('/api/observations/import').attach('file', Buffer.from(`${HEADER.join(',')}\n${recipe.code},2026-10-04,4,gel,visual,,,,"${formula.replace(/"/g, '""')}"\n`), 'f.csv');
    expect(response.status).toBe(201);
    const stored = await Observation.findOne({ where: { importBatchId: response.body.report.batchId } });
    expect(stored?.notes).toBe(formula);
    const exported = await scientist.get(`/api/observations/export?recipe=${recipe.id}`);
    expect(exported.headers['content-type']).toMatch(/text\/csv/);
    const records = parse(exported.text, { columns: true }) as Record<string, string>[];
    const mine = records.find((r) => r.observation_id === String(stored!.id))!;
    expect(mine.notes).toBe(`'${formula}`);
    // A round trip through our own export does not add a second apostrophe.
    const again = await scientist.post('/api/observations/import').attach('file', Buffer.from(`${HEADER.join(',')}\n${recipe.code},2026-10-04,4,gel,visual,,,,"'${formula.replace(/"/g, '""')}"\n`), 'g.csv');
    const reimported = await Observation.findOne({ where: { importBatchId: again.body.report.batchId } });
    expect(reimported?.notes).toBe(formula);
  });

  it('refuses a file that is not CSV, a missing column, and a viewer', async () => {
    const garbage = await scientist.post('/api/observations/import').attach('file', Buffer.from('"unterminated,quote\nx,y'), 'g.csv');
    expect(garbage.status).toBe(422);
    expect(garbage.body.report.problems[0].message).toMatch(/not valid CSV/);
    const missing = await scientist.post('/api/observations/import').attach('file', Buffer.from('recipe_code,age_days\nX,1\n'), 'm.csv');
    expect(missing.body.report.problems.map((p: { column: string }) => p.column)).toEqual(['mixed_on', 'observed_state', 'method']);
    const viewer = await signedInAgent(stack.app, await buildUser({ role: 'viewer' }));
    expect((await viewer.post('/api/observations/import').attach('file', csv([HEADER]), 'v.csv')).status).toBe(403);
  });
});

describe('POST /api/observations with an Idempotency-Key', () => {
  it('records once: a retry with the same key and body gets the first answer back, marked as replayed', async () => {
    const key = `one-${Date.now()}-${Math.random().toString(36).slice(2)}`;
    const before = await Observation.count();
    const first = await scientist.post('/api/observations').set('Idempotency-Key', key).send(observation({ notes: 'retried once' }));
    const again = await scientist.post('/api/observations').set('Idempotency-Key', key).send(observation({ notes: 'retried once' }));
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body.observation.id).toBe(first.body.observation.id);
    expect(await Observation.count()).toBe(before + 1);
  });

  it('records once when three requests with one key race', async () => {
    const key = `race-one-${Date.now()}-${Math.random().toString(36).slice(2)}`;
    const before = await Observation.count();
    const answers = await Promise.all([1, 2, 3].map(() => scientist.post('/api/observations').set('Idempotency-Key', key).send(observation({ notes: 'raced' }))));
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201]);
    expect(new Set(answers.map((a) => a.body.observation.id)).size).toBe(1);
    expect(await Observation.count()).toBe(before + 1);
  });

  it('answers 409 to the same key with a different body, and 400 to a malformed key; neither writes', async () => {
    const key = `body-${Date.now()}-${Math.random().toString(36).slice(2)}`;
    expect((await scientist.post('/api/observations').set('Idempotency-Key', key).send(observation({ ageDays: 3 }))).status).toBe(201);
    const before = await Observation.count();
    const changed = await scientist.post('/api/observations').set('Idempotency-Key', key).send(observation({ ageDays: 4 }));
    expect(changed.status).toBe(409);
    expect(changed.body.error.field).toBe('Idempotency-Key');
    const bad = await scientist.post('/api/observations').set('Idempotency-Key', 'no spaces allowed').send(observation());
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('Idempotency-Key');
    expect(await Observation.count()).toBe(before);
  });

  it('keys belong to their user: another scientist with the same key records their own observation', async () => {
    const key = `shared-${Date.now()}-${Math.random().toString(36).slice(2)}`;
    const colleague = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
    const mine = await scientist.post('/api/observations').set('Idempotency-Key', key).send(observation());
    const theirs = await colleague.post('/api/observations').set('Idempotency-Key', key).send(observation());
    expect(theirs.status).toBe(201);
    expect(theirs.body.observation.id).not.toBe(mine.body.observation.id);
  });
});
