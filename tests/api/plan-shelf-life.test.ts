import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PlanInput } from '../../shared/schemas/plans';
import { fitShelfLifeModel, shelfLifeCovariatesOf, shelfLifeVerdict } from '../../shared/shelf-life';
import type { PlanView } from '../../shared/views/plan';
import type { Programme } from '../../server/models';
import { recordAgedBench } from '../support/aged-bench';
import { agentsForEveryRole } from '../support/builders';
import { buildLibrary, buildProgramme, type Library } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

// The planner's shelf-life column and "stays a gel for at least N days". The statistics are
// checked in shared/shelf-life/*.test.ts (remission trial; independent implementations). Here:
// the request option, that each candidate's figure is the programme's model applied to the
// candidate's stored derivation, the order, and the refusal. All bench data invented.

let stack: TestStack;
let lib: Library;
let agents: Awaited<ReturnType<typeof agentsForEveryRole>>;
let aged: Programme;
let bare: Programme;
let bench: Awaited<ReturnType<typeof recordAgedBench>>;

beforeAll(async () => {
  stack = await startTestStack();
  lib = await buildLibrary();
  agents = await agentsForEveryRole(stack.app);
  aged = await buildProgramme({ goalState: 'gel', attractionSource: 'depletion' });
  bare = await buildProgramme({ goalState: 'gel', attractionSource: 'depletion' });
  bench = await recordAgedBench(agents.formulator.agent, agents.scientist.agent, aged, lib);
}, 120_000);
afterAll(() => stack.close());

function planBody(programme: Programme, overrides: Partial<PlanInput> = {}): PlanInput {
  return {
    programmeId: programme.id, particleId: lib.particle.id, solventId: lib.solvent.id, temperatureC: 25,
    attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: { min: 0, max: 12 } },
    phi: { min: 0.05, max: 0.4 }, targetState: 'gel', minMargin: 0.1, candidateCount: 8, experimentCount: 0,
    ...overrides,
  };
}

async function plan(body: PlanInput) {
  const response = await agents.formulator.agent.post('/api/plans').send(body);
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body.plan as PlanView;
}

describe('POST /api/plans with a shelf-life minimum', () => {
  it('gives every candidate the programme model\'s predicted median and chance at N days, and lists those that fall short last', async () => {
    const result = await plan(planBody(aged, { minShelfLifeDays: 20 }));
    expect(result.inputs.minShelfLifeDays).toBe(20);
    expect(result.outcome.shelfLife).toMatchObject({ minimumDays: 20, status: 'fitted' });
    expect(result.outcome.candidates.length).toBeGreaterThan(0);
    // The model again, from the records this test made and the recipes' stored derivation.
    const model = fitShelfLifeModel(bench.recipes.flatMap((r) => bench.records.get(r.id)!.map((s) => ({ ...s, covariates: shelfLifeCovariatesOf(r.derived) }))));
    expect(model.status).toBe('fitted');
    if (model.status !== 'fitted') return;
    for (const c of result.outcome.candidates) expect(c.shelfLife).toEqual(shelfLifeVerdict(model, shelfLifeCovariatesOf(c.derived), 20));
    const meets = result.outcome.candidates.map((c) => c.shelfLife!.meets);
    const firstShort = meets.indexOf(false);
    if (firstShort >= 0) expect(meets.slice(firstShort).every((m) => m === false)).toBe(true);
    expect(result.outcome.candidates.map((c) => c.index)).toEqual(result.outcome.candidates.map((_, i) => i));
  }, 60_000);

  it('says it cannot honour the minimum when the model is refused, and ranks as without it', async () => {
    const without = await plan(planBody(bare));
    const withMinimum = await plan(planBody(bare, { minShelfLifeDays: 30 }));
    expect(withMinimum.outcome.shelfLife!.note).toBe('Asked to stay a gel for at least 30 days: cannot be honoured. Cannot fit what drives collapse: 0 collapses seen; at least 10 are needed. The candidates are ranked as before.');
    expect(withMinimum.outcome.candidates.map((c) => [c.phi, c.level])).toEqual(without.outcome.candidates.map((c) => [c.phi, c.level]));
    expect(withMinimum.outcome.candidates.every((c) => c.shelfLife === null)).toBe(true);
  }, 60_000);

  it('refuses a minimum that is not a whole number of days from 1 to 3650 with a 400 naming it, and stores nothing', async () => {
    for (const bad of [0, 2.5, 'thirty', 4000]) {
      const counts = await tableCounts(stack.sequelize);
      const response = await agents.formulator.agent.post('/api/plans').send({ ...planBody(aged), minShelfLifeDays: bad });
      expect(response.status).toBe(400);
      expect(response.body.error.field).toBe('minShelfLifeDays');
      expect(await tableCounts(stack.sequelize)).toEqual(counts);
    }
  });
});
