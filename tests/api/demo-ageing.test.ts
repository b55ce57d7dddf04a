import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dueSamples } from '../../shared/check-schedules/due-samples';
import { MIN_COX_EVENTS } from '../../shared/shelf-life/cox-fit-refused';
import { fitShelfLifeModel, type ShelfLifeModelRecord } from '../../shared/shelf-life/shelf-life-model';
import { shelfLifeCovariatesOf } from '../../shared/shelf-life/shelf-life-covariates-of';
import { stiffeningWithAge } from '../../shared/shelf-life/stiffening-with-age';
import { survivalRecordsFromChecks } from '../../shared/shelf-life/survival-records-from-checks';
import { CheckSchedule, Observation, Programme, Recipe, type User } from '../../server/models';
import { seedDemoScenario } from '../../server/seed/demo-scenario';
import { buildUser } from '../support/builders';
import { startTestStack, type TestStack } from '../support/test-stack';

// The demo is invented; this holds it to what the shelf-life screens need (issue: shelf life,
// item 6): several samples per gel, enough collapses for the proportional-hazards fit (its own
// minimum, MIN_COX_EVENTS), censored samples, gels that stiffen and one that softens, samples
// due for a check, and a fill height for every sample, so the fit uses the sample height. Seeded inside a transaction that is rolled back, so nothing stays behind.

let stack: TestStack;
let dataDir: string;
beforeAll(async () => {
  stack = await startTestStack();
  dataDir = mkdtempSync(join(tmpdir(), 'gelwright-demo-'));
});
afterAll(async () => {
  rmSync(dataDir, { recursive: true, force: true });
  await stack.close();
});

describe('the demo scenario\'s ageing bench', () => {
  it('gives every gel several watched samples, collapses and censored ones, G′ trends both ways, and due checks', async () => {
    const people: Record<string, User> = {};
    for (const [key, role] of [['manager', 'manager'], ['formulator', 'formulator'], ['formulator2', 'formulator'], ['scientist', 'scientist'], ['scientist2', 'scientist']] as const) people[key] = (await buildUser({ role })).user;
    const transaction = await stack.sequelize.transaction();
    try {
      const started = Date.now();
      const seeded = await seedDemoScenario({ ...stack.config, DATA_DIR: dataDir }, people, transaction);
      const seconds = (Date.now() - started) / 1000;
      const programmes = await Programme.findAll({ where: { codePrefix: ['LPG', 'HAS'] }, transaction });
      expect(programmes).toHaveLength(2);
      const recipes = await Recipe.findAll({ where: { programmeId: programmes.map((p) => p.id) }, transaction });
      const checks = await Observation.findAll({ where: { recipeId: recipes.map((r) => r.id) }, transaction, raw: true });
      const schedules = await CheckSchedule.findAll({ where: { recipeId: recipes.map((r) => r.id) }, transaction });
      expect(checks.length).toBe(seeded.observations);

      const byRecipe = new Map<number, typeof checks>();
      for (const c of checks) byRecipe.set(c.recipeId!, [...(byRecipe.get(c.recipeId!) ?? []), c]);
      const summary = programmes.map((programme) => {
        let samples = 0, collapses = 0, censored = 0, watchedRecipes = 0;
        const trends: string[] = [];
        const modelRecords: ShelfLifeModelRecord[] = [];
        for (const recipe of recipes.filter((r) => r.programmeId === programme.id)) {
          const mine = byRecipe.get(recipe.id) ?? [];
          const records = survivalRecordsFromChecks(mine.map((c) => ({ observationId: c.id, mixedAt: new Date(c.mixedAt).toISOString(), ageDays: c.ageDays, observedState: c.observedState, sampleHeightMm: c.sampleHeightMm })));
          for (const r of records) modelRecords.push({ ...r, covariates: { ...shelfLifeCovariatesOf(recipe.derived), sampleHeightMm: r.sampleHeightMm } });
          if (records.length >= 3) watchedRecipes++;
          samples += records.length;
          collapses += records.filter((r) => r.collapsed).length;
          censored += records.filter((r) => !r.collapsed).length;
          const moduli = mine.filter((c) => c.observedState === 'gel' && c.storageModulusPa !== null && c.ageDays > 0).map((c) => ({ ageDays: c.ageDays, storageModulusPa: c.storageModulusPa! }));
          const fit = stiffeningWithAge(moduli);
          if (fit.status === 'fitted') trends.push(fit.trend);
        }
        const heights = modelRecords.map((r) => r.covariates.sampleHeightMm);
        const model = fitShelfLifeModel(modelRecords);
        return {
          code: programme.codePrefix, samples, collapses, censored, watchedRecipes,
          stiffens: trends.filter((t) => t === 'stiffens').length, softens: trends.filter((t) => t === 'softens').length,
          heightsWithin20To80: heights.every((h) => h !== null && h !== undefined && h >= 20 && h <= 80),
          model: model.status === 'fitted' ? model.terms.map((t) => t.key) : model.message,
        };
      });
      console.log(`demo seeded in ${seconds.toFixed(1)} s: ${seeded.observations} observations`, summary);
      const primer = summary.find((s) => s.code === 'LPG')!;
      const slurry = summary.find((s) => s.code === 'HAS')!;
      for (const programme of [primer, slurry]) {
        expect(programme.watchedRecipes, programme.code).toBeGreaterThanOrEqual(5);
        expect(programme.collapses, programme.code).toBeGreaterThanOrEqual(MIN_COX_EVENTS);
        expect(programme.censored, programme.code).toBeGreaterThanOrEqual(10);
        expect(programme.stiffens, programme.code).toBeGreaterThanOrEqual(3);
        expect(programme.heightsWithin20To80, programme.code).toBe(true);
        expect(programme.model, programme.code).toContain('sampleHeightMm');
      }
      expect(primer.softens + slurry.softens).toBeGreaterThanOrEqual(1);

      expect(schedules.length).toBe(seeded.checkSchedules);
      const due = dueSamples(
        checks.map((c) => ({ observationId: c.id, recipeId: c.recipeId!, mixedAt: new Date(c.mixedAt).toISOString(), ageDays: c.ageDays, observedState: c.observedState })),
        new Map(schedules.map((s) => [s.recipeId, typeof s.agesDays === 'string' ? (JSON.parse(s.agesDays) as number[]) : s.agesDays])),
        new Date(),
      );
      expect(due.length).toBeGreaterThanOrEqual(3);
    } finally {
      await transaction.rollback();
    }
  });
});
