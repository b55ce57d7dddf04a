/**
 * Shelf-life benchmark: Kaplan–Meier per similar-recipe group, the grouping itself and one Cox
 * fit (attraction, φ, sample height) for an invented programme of 10,000 shelf-life records over
 * 1,000 recipes, against a target of 100 ms; then the whole programme analysis the route runs in
 * its worker (bench checks → samples, programmeShelfLife: curves per recipe, group and region, the
 * Cox model with Breslow's baseline and every recipe's predicted median) for 10,000 observations.
 * Median of 9 runs after one warm-up. It only prints; it never fails.
 *
 * Run: ./node_modules/.bin/tsx scripts/bench/shelf-life.ts
 */
import { median as simpleMedian } from 'simple-statistics';
import { coxProportionalHazards, kaplanMeier, programmeShelfLife, similarRecipeGroups, type CoxRecord, type RecipeOnMap, type ShelfLifeRecipeInput } from '../../shared/shelf-life';
import { survivalRecordsFromChecks, type SampleCheck } from '../../shared/shelf-life/survival-records-from-checks';
import { seededRandom } from '../../shared/seeded-random';

const RECORDS = 10_000;
const RECIPES = 1_000;
const RUNS = 9;
const TARGET_MS = 100;

const random = seededRandom(14);
const recipes: (RecipeOnMap & { attractionKt: number; phi: number; heightMm: number })[] = Array.from({ length: RECIPES }, (_, id) => ({
  id,
  particleId: Math.floor(random() * 4),
  depletantId: random() < 0.2 ? null : Math.floor(random() * 3),
  solventId: 1,
  x: random() * 0.6,
  u: random(),
  attractionKt: 2 + 8 * random(),
  phi: 0.05 + 0.3 * random(),
  heightMm: 10 + 50 * random(),
}));
const records: (CoxRecord & { recipeId: number })[] = Array.from({ length: RECORDS }, () => {
  const recipe = recipes[Math.floor(random() * RECIPES)];
  const hazard = 0.02 * Math.exp(-0.3 * recipe.attractionKt + 0.02 * recipe.heightMm + 3 * recipe.phi);
  const collapseDay = -Math.log(1 - random()) / hazard;
  const lastCheck = 7 + Math.floor(random() * 120);
  const collapsed = collapseDay <= lastCheck;
  return { recipeId: recipe.id, timeDays: Math.ceil(collapsed ? collapseDay : lastCheck), collapsed, values: { attractionKt: recipe.attractionKt, phi: recipe.phi, heightMm: recipe.heightMm } };
});

function once(): number {
  const start = performance.now();
  const groups = similarRecipeGroups(recipes);
  const groupOf = new Map<number, number>();
  groups.forEach((ids, g) => ids.forEach((id) => groupOf.set(id, g)));
  const byGroup: CoxRecord[][] = groups.map(() => []);
  for (const r of records) byGroup[groupOf.get(r.recipeId)!].push(r);
  for (const group of byGroup) kaplanMeier(group);
  kaplanMeier(records);
  coxProportionalHazards(records, [
    { key: 'attractionKt', label: 'attraction', unit: 'kT' },
    { key: 'phi', label: 'φ', unit: '', step: 0.01 },
    { key: 'heightMm', label: 'sample height', unit: 'mm', step: 10 },
  ]);
  return performance.now() - start;
}

once();
const times = Array.from({ length: RUNS }, once);
const median = simpleMedian(times);
console.log(`shelf life, ${RECORDS} records over ${RECIPES} recipes (grouping + Kaplan–Meier per group and overall + Cox, 3 covariates): median ${median.toFixed(1)} ms of ${RUNS} runs; target ${TARGET_MS} ms: ${median < TARGET_MS ? 'met' : 'not met'}`);

// The programme analysis from 10,000 bench observations: two checks per sample (a gel check at
// day 2, then collapsed or still standing), so 5,000 samples over the same 1,000 recipes.
const programmeRecipes: ShelfLifeRecipeInput[] = recipes.map((r) => ({
  id: r.id, code: `B-${r.id}`, name: `bench recipe ${r.id}`, particleId: Number(r.particleId), depletantId: r.depletantId === null ? null : Number(r.depletantId), solventId: Number(r.solventId),
  position: { x: r.x, u: r.u }, region: random() < 0.7 ? 'gel' : 'fluid',
  covariates: { attractionKt: r.attractionKt, phi: r.phi, log10Peclet: -3 + 2 * random() },
}));
const observations: (SampleCheck & { recipeId: number })[] = records.slice(0, 5_000).flatMap((r, i) => {
  const mixedAt = new Date(Date.UTC(2026, 0, 1) + i * 86_400_000).toISOString();
  return [{ recipeId: r.recipeId, mixedAt, ageDays: 2, observedState: 'gel' as const }, { recipeId: r.recipeId, mixedAt, ageDays: Math.max(r.timeDays, 3), observedState: r.collapsed ? ('collapsed' as const) : ('gel' as const) }];
});

function programmeOnce(): number {
  const start = performance.now();
  const byRecipe = new Map<number, SampleCheck[]>();
  for (const o of observations) {
    const list = byRecipe.get(o.recipeId) ?? [];
    list.push(o);
    byRecipe.set(o.recipeId, list);
  }
  const samples = [...byRecipe].flatMap(([recipeId, list]) => survivalRecordsFromChecks(list).map((s) => ({ recipeId, ...s })));
  programmeShelfLife(programmeRecipes, samples);
  return performance.now() - start;
}

programmeOnce();
const programmeMedian = simpleMedian(Array.from({ length: RUNS }, programmeOnce));
console.log(`shelf life, programme analysis of ${observations.length} observations (${observations.length / 2} samples over ${RECIPES} recipes: checks → samples, curves per recipe, group and region, Cox + Breslow baseline, predicted medians): median ${programmeMedian.toFixed(1)} ms of ${RUNS} runs; target ${TARGET_MS} ms: ${programmeMedian < TARGET_MS ? 'met' : 'not met'}`);
