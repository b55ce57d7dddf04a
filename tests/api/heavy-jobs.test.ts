import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { Calibration, Observation, Plan, type Programme } from '../../server/models';
import { EXPORT_PAGE_ROWS } from '../../server/services/observation-export';
import { IMPORT_COLUMNS, IMPORT_MAX_ROWS } from '../../shared/schemas/observations';
import { buildUser, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme } from '../support/team-builders';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let scientist: TestUser;

beforeAll(async () => {
  stack = await startTestStack();
  scientist = await buildUser({ role: 'scientist' });
});
afterAll(() => stack.close());

/**
 * Ad-hoc bench outcomes on the generic B2* map: gel below B2* = −2.5, fluid above, every tenth
 * one flipped so the fit has overlap to work with. Invented data, for load and limits only.
 */
async function benchOf(programme: Programme, count: number) {
  const rows = Array.from({ length: count }, (_, i) => {
    const reducedB2 = -5 + (5 * ((i * 37) % count)) / count;
    const gel = reducedB2 < -2.5 !== (i % 10 === 0);
    return {
      programmeId: programme.id, recipeId: null, adhocPhi: 0.1 + 0.3 * ((i * 53) % count) / count, adhocReducedB2: reducedB2, adhocDescription: null,
      adhocPredictedState: null, mixedAt: new Date(Date.UTC(2026, 0, 1 + (i % 300))), ageDays: 3, observedState: (gel ? 'gel' : 'fluid') as Observation['observedState'],
      method: 'visual' as const, storageModulusPa: null, yieldStressPa: null, settledHeightPct: null, notes: `bench ${i}`, observerId: scientist.user.id, importBatchId: null,
    };
  });
  for (let start = 0; start < rows.length; start += 1000) await Observation.bulkCreate(rows.slice(start, start + 1000));
}

async function agentFor(app: typeof stack.app, who: TestUser) {
  const agent = request.agent(app);
  expect((await agent.post('/api/session').send({ email: who.email, password: who.password })).status).toBe(201);
  return agent;
}

describe('calibration fits run in a worker thread', () => {
  it('POST /api/programmes/:id/calibrations fits in a worker while /api/health keeps answering', async () => {
    const programme = await buildProgramme();
    await benchOf(programme, 400);
    const agent = await agentFor(stack.app, scientist);
    const fit = agent.post(`/api/programmes/${programme.id}/calibrations`).send({ parameters: ['attractionShift'] }).then((r) => r);
    const health = await request(stack.app).get('/api/health');
    expect(health.status).toBe(200);
    const answer = await fit;
    expect(answer.status).toBe(201);
    expect(answer.body.calibration.result.observations.offered).toBe(400);
  });

  it('stops a fit that runs past HEAVY_JOB_SECONDS with 503 and stores nothing', async () => {
    const programme = await buildProgramme();
    await benchOf(programme, 400);
    const agent = await agentFor(stack.appWith({ HEAVY_JOB_SECONDS: '0.001' }), scientist);
    const answer = await agent.post(`/api/programmes/${programme.id}/calibrations`).send({ parameters: ['attractionShift'] });
    expect(answer.status).toBe(503);
    expect(answer.body.error.id).toBe('job_timed_out');
    expect(await Calibration.count({ where: { programmeId: programme.id } })).toBe(0);
  });

  it('refuses a second heavy job of the same user beyond HEAVY_JOBS_PER_USER with 429', async () => {
    const programme = await buildProgramme();
    await benchOf(programme, 400);
    const who = await buildUser({ role: 'scientist' });
    const agent = await agentFor(stack.appWith({ HEAVY_JOBS_PER_USER: '1' }), who);
    const answers = await Promise.all([1, 2].map(() => agent.post(`/api/programmes/${programme.id}/calibrations`).send({ parameters: ['attractionShift'] })));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 429]);
    expect(answers.find((a) => a.status === 429)!.body.error.message).toMatch(/heavy job/);
  });
});

describe('planner runs in a worker thread', () => {
  it('POST /api/plans past HEAVY_JOB_SECONDS is stopped with 503 and stores no plan; within it, the plan is stored', async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme();
    const formulator = await buildUser({ role: 'formulator' });
    const body = {
      programmeId: programme.id, particleId: lib.particle.id, solventId: lib.solvent.id, temperatureC: 25,
      attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: { min: 0, max: 12 } },
      phi: { min: 0.05, max: 0.4 }, targetState: 'gel', minMargin: 0.15, candidateCount: 5, experimentCount: 3,
    };
    const hurried = await (await agentFor(stack.appWith({ HEAVY_JOB_SECONDS: '0.001' }), formulator)).post('/api/plans').send(body);
    expect(hurried.status).toBe(503);
    expect(hurried.body.error.id).toBe('job_timed_out');
    expect(await Plan.count({ where: { programmeId: programme.id } })).toBe(0);
    const patient = await (await agentFor(stack.app, formulator)).post('/api/plans').send(body);
    expect(patient.status).toBe(201);
    expect(patient.body.plan.outcome.counts.sampled).toBe(10_000);
  });
});

describe('CSV imports are parsed in a worker thread', () => {
  /** A bench-log CSV of `rows` rows with the import's own header (invented rows). */
  const bigCsv = (rows: number) =>
    Buffer.from([IMPORT_COLUMNS.join(','), ...Array.from({ length: rows }, (_, i) => `NO-SUCH-${i},2026-10-01,${i % 60},gel,visual,120,3,95,40,"a note, with a comma"`)].join('\n'));

  it('a file longer than the row cap is refused with the cap named, after parsing off the request thread; nothing is stored', async () => {
    const agent = await agentFor(stack.app, scientist);
    const before = await Observation.count();
    const answer = await agent.post('/api/observations/import').attach('file', bigCsv(IMPORT_MAX_ROWS + 50), 'long.csv');
    expect(answer.status).toBe(422);
    expect(answer.body.report).toMatchObject({ ok: false, rows: IMPORT_MAX_ROWS + 50, imported: 0 });
    expect(answer.body.report.problems).toEqual([{ row: IMPORT_MAX_ROWS + 2, column: '', message: `At most ${IMPORT_MAX_ROWS} rows per import` }]);
    expect(await Observation.count()).toBe(before);
  });

  it('parsing goes through the heavy-job worker: past HEAVY_JOB_SECONDS the import is stopped with 503 and nothing is stored', async () => {
    const agent = await agentFor(stack.appWith({ HEAVY_JOB_SECONDS: '0.001' }), scientist);
    const before = await Observation.count();
    const answer = await agent.post('/api/observations/import').attach('file', bigCsv(IMPORT_MAX_ROWS), 'slow.csv');
    expect(answer.status).toBe(503);
    expect(answer.body.error.id).toBe('job_timed_out');
    expect(await Observation.count()).toBe(before);
  });
});

describe('GET /api/observations/export streams page by page', () => {
  it('writes every row of a log longer than two pages, in (mixed_at, id) order, each once', async () => {
    const programme = await buildProgramme();
    const count = EXPORT_PAGE_ROWS * 2 + 37;
    await benchOf(programme, count);
    const agent = await agentFor(stack.app, scientist);
    const response = await agent.get(`/api/observations/export?programme=${programme.id}`);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toMatch(/text\/csv/);
    // Streamed: sent in chunks as pages are read, so no length is known up front.
    expect(response.headers['transfer-encoding']).toBe('chunked');
    expect(response.headers['content-length']).toBeUndefined();
    const records = parse(response.text, { columns: true }) as Record<string, string>[];
    expect(records).toHaveLength(count);
    expect(new Set(records.map((r) => r.observation_id)).size).toBe(count);
    const stored = await Observation.findAll({ where: { programmeId: programme.id }, order: [['mixedAt', 'ASC'], ['id', 'ASC']], attributes: ['id'] });
    expect(records.map((r) => Number(r.observation_id))).toEqual(stored.map((o) => o.id));
  });
});
