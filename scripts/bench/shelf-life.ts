/**
 * Shelf-life benchmark: Kaplan–Meier per similar-recipe group, the grouping itself and one Cox
 * fit (attraction, φ, sample height) for an invented programme of 10,000 shelf-life records over
 * 1,000 recipes, against a target of 100 ms. Median of 9 runs after one warm-up. It only prints;
 * it never fails.
 *
 * Run: ./node_modules/.bin/tsx scripts/bench/shelf-life.ts
 */
import { coxProportionalHazards, kaplanMeier, similarRecipeGroups, type CoxRecord, type RecipeOnMap } from '../../shared/shelf-life';
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
const times = Array.from({ length: RUNS }, once).sort((a, b) => a - b);
const median = times[Math.floor(RUNS / 2)];
console.log(`shelf life, ${RECORDS} records over ${RECIPES} recipes (grouping + Kaplan–Meier per group and overall + Cox, 3 covariates): median ${median.toFixed(1)} ms of ${RUNS} runs; target ${TARGET_MS} ms: ${median < TARGET_MS ? 'met' : 'not met'}`);
