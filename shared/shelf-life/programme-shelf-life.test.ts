import { describe, expect, it } from 'vitest';
import { seededRandom } from '../seeded-random';
import { programmeShelfLife, type ShelfLifeRecipeInput, type ShelfLifeSampleInput } from './programme-shelf-life';
import { modelMedianDays } from './shelf-life-model';

// Invented programmes (our own scenario). Expected values come from the generating truth or from
// independent computations inside the test.

function recipe(id: number, overrides: Partial<ShelfLifeRecipeInput> = {}): ShelfLifeRecipeInput {
  return {
    id, code: `T-${id}`, name: `test recipe ${id}`, particleId: 1, depletantId: 2, solventId: 3,
    position: { x: 0.1 * id, u: 0.5 }, region: 'gel',
    covariates: { attractionKt: 3 + id, phi: 0.1, log10Peclet: -2 },
    ...overrides,
  };
}

/** Reference: the product-limit estimate written as a plain loop over the distinct collapse times. */
function naiveProductLimit(records: { timeDays: number; collapsed: boolean }[], t: number): number {
  const times = [...new Set(records.filter((r) => r.collapsed && r.timeDays <= t).map((r) => r.timeDays))];
  return times.reduce((s, time) => s * (1 - records.filter((r) => r.collapsed && r.timeDays === time).length / records.filter((r) => r.timeDays >= time).length), 1);
}

/**
 * Many recipes whose collapse hazard falls with attraction: h = 0.04·exp(−0.5·(U/kT − 5) + 10·(φ − 0.15)) per day;
 * with `heightEffect`, each sample also gets a fill height of 20–80 mm and the hazard a factor exp(heightEffect·(H − 50 mm)).
 */
function inventedProgramme(seed: number, recipeCount: number, samplesPerRecipe: number, heightEffect?: number) {
  const random = seededRandom(seed);
  const recipes = Array.from({ length: recipeCount }, (_, i) =>
    recipe(i + 1, {
      position: { x: random() * 0.6, u: random() },
      region: random() < 0.8 ? 'gel' : 'fluid',
      covariates: { attractionKt: 2 + 6 * random(), phi: 0.05 + 0.2 * random(), log10Peclet: -2 },
    }),
  );
  const samples: ShelfLifeSampleInput[] = recipes.flatMap((r) =>
    Array.from({ length: samplesPerRecipe }, () => {
      const sampleHeightMm = heightEffect === undefined ? undefined : 20 + 60 * random();
      const hazard = 0.04 * Math.exp(-0.5 * (r.covariates.attractionKt! - 5) + 10 * (r.covariates.phi! - 0.15) + (heightEffect ?? 0) * ((sampleHeightMm ?? 50) - 50));
      const collapseDay = -Math.log(1 - random()) / hazard;
      const lastCheck = 10 + Math.floor(80 * random());
      const record = collapseDay <= lastCheck ? { recipeId: r.id, timeDays: Math.ceil(collapseDay), collapsed: true } : { recipeId: r.id, timeDays: lastCheck, collapsed: false };
      return sampleHeightMm === undefined ? record : { ...record, sampleHeightMm };
    }),
  );
  return { recipes, samples };
}

describe('programmeShelfLife', () => {
  it('gives each recipe, group and region its Kaplan–Meier curve, equal to a naive product-limit loop over the pooled samples (independent implementation)', () => {
    const { recipes, samples } = inventedProgramme(5, 40, 6);
    const result = programmeShelfLife(recipes, samples);
    expect(result.sampleCount).toBe(240);
    const gel = result.regions.find((r) => r.region === 'gel')!;
    const gelSamples = samples.filter((s) => recipes.find((r) => r.id === s.recipeId)!.region === 'gel');
    expect(gel.curve.sampleCount).toBe(gelSamples.length);
    for (const step of gel.curve.steps) expect(step.survival).toBeCloseTo(naiveProductLimit(gelSamples, step.timeDays), 12);
    expect(result.groups.length).toBeGreaterThan(0);
    for (const group of result.groups) {
      const pooled = samples.filter((s) => group.recipeIds.includes(s.recipeId));
      expect(group.curve.sampleCount).toBe(pooled.length);
      for (const step of group.curve.steps) expect(step.survival).toBeCloseTo(naiveProductLimit(pooled, step.timeDays), 12);
    }
    const one = result.recipes[0];
    expect(one.curve.sampleCount).toBe(6);
    expect(result.groups.some((g) => g.group === one.group && g.recipeIds.includes(one.recipeId))).toBe(true);
  });

  it('pools recipes of the same materials within 0.05 on the map and keeps other materials apart (the documented rule)', () => {
    const recipes = [recipe(1, { position: { x: 0.2, u: 0.5 } }), recipe(2, { position: { x: 0.23, u: 0.53 } }), recipe(3, { position: { x: 0.2, u: 0.5 }, depletantId: null }), recipe(4, { position: null })];
    const samples = [1, 2, 3, 4].map((recipeId) => ({ recipeId, timeDays: 10 * recipeId, collapsed: recipeId % 2 === 0 }));
    const result = programmeShelfLife(recipes, samples);
    const groupOf = (id: number) => result.recipes.find((r) => r.recipeId === id)!.group;
    expect(groupOf(1)).toBe(groupOf(2));
    expect(groupOf(3)).not.toBe(groupOf(1));
    expect(groupOf(4)).not.toBe(groupOf(1));
    const pooled = result.groups.find((g) => g.group === groupOf(1))!;
    expect([pooled.curve.sampleCount, pooled.curve.collapseCount, pooled.median.timeDays]).toEqual([2, 1, 20]);
  });

  it('fits what drives collapse and recovers the invented effect of attraction within its 95 % interval (generating truth β = −0.5 per kT), leaving out the constant Péclet number and the unrecorded sample height', () => {
    const { recipes, samples } = inventedProgramme(11, 60, 10);
    const { drivers } = programmeShelfLife(recipes, samples);
    expect(drivers.status).toBe('fitted');
    if (drivers.status !== 'fitted') return;
    const attraction = drivers.terms.find((t) => t.key === 'attractionKt')!;
    expect(attraction.low).toBeLessThan(-0.5);
    expect(attraction.high).toBeGreaterThan(-0.5);
    expect(attraction.reading).toMatch(/^each \+1 kT of attraction multiplies the collapse hazard by 0\.\d\d/);
    expect(drivers.omitted.map((o) => o.key)).toEqual(['log10Peclet', 'sampleHeightMm']);
    expect(drivers.omitted[0].why).toBe('the same (-2) in every sample');
    expect(drivers.omitted[1].why).toBe('not recorded on the bench log for 600 of 600 samples');
    // Stronger attraction, longer predicted life (the sign the truth was generated with).
    const weak = modelMedianDays(drivers, { attractionKt: 3, phi: 0.15, log10Peclet: null });
    const strong = modelMedianDays(drivers, { attractionKt: 6, phi: 0.15, log10Peclet: null });
    expect(weak).not.toBeNull();
    expect(strong === null || strong > weak!).toBe(true);
  });

  it('uses the sample height when every sample has one, and recovers the invented effect within its 95 % interval (generating truth β = 0.03 per mm, hazard ratio e^0.3 per 10 mm)', () => {
    const { recipes, samples } = inventedProgramme(12, 60, 10, 0.03);
    const result = programmeShelfLife(recipes, samples);
    const { drivers } = result;
    expect(drivers.status).toBe('fitted');
    if (drivers.status !== 'fitted') return;
    const height = drivers.terms.find((t) => t.key === 'sampleHeightMm')!;
    expect(height).toMatchObject({ label: 'sample height', unit: 'mm', step: 10 });
    expect(height.low).toBeLessThan(0.03);
    expect(height.high).toBeGreaterThan(0.03);
    expect(height.hazardRatio).toBeCloseTo(Math.exp(10 * height.coefficient), 12);
    expect(height.reading).toMatch(/^each \+10 mm of sample height multiplies the collapse hazard by 1\.\d\d/);
    expect(drivers.omitted.map((o) => o.key)).toEqual(['log10Peclet']);
    // A recipe has no height of its own: its prediction is for a sample of the samples' median height.
    const heights = samples.map((s) => s.sampleHeightMm!).sort((a, b) => a - b);
    expect(drivers.typical.sampleHeightMm).toBeCloseTo((heights[299] + heights[300]) / 2, 12);
    const predicted = result.recipes.find((r) => r.predicted?.medianDays !== null)!.predicted!;
    expect(predicted.reading).toMatch(/, for a sample filled to the programme's typical \d+(\.\d+)? mm$/);
  });

  it('leaves the sample height out, counting the samples without one, when a single sample lacks it', () => {
    const { recipes, samples } = inventedProgramme(12, 60, 10, 0.03);
    const [first, ...rest] = samples;
    const { drivers } = programmeShelfLife(recipes, [{ ...first, sampleHeightMm: null }, ...rest]);
    expect(drivers.status).toBe('fitted');
    expect(drivers.omitted).toContainEqual({ key: 'sampleHeightMm', label: 'sample height', why: 'not recorded on the bench log for 1 of 600 samples' });
    if (drivers.status === 'fitted') expect(drivers.terms.map((t) => t.key)).not.toContain('sampleHeightMm');
  });

  it('refuses the fit in plain words with fewer than 10 collapses, and still gives every curve', () => {
    const recipes = [recipe(1), recipe(2)];
    const samples = [...Array.from({ length: 4 }, (_, i) => ({ recipeId: 1, timeDays: 5 + i, collapsed: true })), { recipeId: 2, timeDays: 30, collapsed: false }];
    const result = programmeShelfLife(recipes, samples);
    expect(result.drivers.status).toBe('refused');
    if (result.drivers.status === 'refused') expect(result.drivers.message).toBe('Cannot fit what drives collapse: 4 collapses seen; at least 10 are needed.');
    expect(result.recipes.map((r) => r.predicted)).toEqual([null, null]);
    expect(result.recipes.find((r) => r.recipeId === 2)!.summary).toBe('no collapse seen in 1 sample up to 30 days');
  });

  it('with a focus recipe returns only it and its group, even without samples; regions stay programme-wide', () => {
    const { recipes, samples } = inventedProgramme(3, 20, 3);
    const lonely = recipe(99, { position: { x: 0.95, u: 0.95 }, particleId: 42 });
    const result = programmeShelfLife([...recipes, lonely], samples, { focusRecipeId: 99 });
    expect(result.recipes).toHaveLength(1);
    expect(result.recipes[0].summary).toBe('no samples checked yet');
    expect(result.groups).toHaveLength(1);
    expect(result.groups[0].recipeIds).toEqual([99]);
    expect(result.regions.reduce((n, r) => n + r.curve.sampleCount, 0)).toBe(60);
  });
});
