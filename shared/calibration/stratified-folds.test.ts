import { describe, expect, it } from 'vitest';
import { cumulativeStdNormalProbability } from 'simple-statistics';
import { goldenSectionMaximum } from './golden-section-maximum';
import { stratifiedFolds } from './stratified-folds';
import { waldEstimate, Z_95 } from './wald-estimate';

describe('stratifiedFolds', () => {
  it('holds every item out once, with both outcomes in every fold', () => {
    const outcomes = Array.from({ length: 37 }, (_, i) => (i % 3 === 0 ? 1 : 0) as 0 | 1);
    const splits = stratifiedFolds(outcomes, 5, 3);
    expect(splits.flatMap((s) => s.test).sort((a, b) => a - b)).toEqual(Array.from({ length: 37 }, (_, i) => i));
    for (const split of splits) {
      expect(new Set(split.test.map((i) => outcomes[i]))).toEqual(new Set([0, 1]));
      expect(split.train.length + split.test.length).toBe(37);
      expect(split.train.filter((i) => split.test.includes(i))).toEqual([]);
    }
    expect(() => stratifiedFolds([1, 1, 0, 0, 0], 3)).toThrow(/at least 3 items with outcome 1/);
  });
});

describe('small numerics', () => {
  it('golden-section search finds the maximum of a smooth function', () => {
    expect(goldenSectionMaximum((x) => -((x - 1.3) ** 2), -2, 5, 1e-9).x).toBeCloseTo(1.3, 7);
  });

  it('uses the normal quantile 1.959964 for a 95 % interval (standard normal tables; published)', () => {
    expect(Z_95).toBeCloseTo(1.959964, 6);
    // Cross-check with simple-statistics' normal distribution function: Φ(z) = 0.975.
    expect(cumulativeStdNormalProbability(Z_95)).toBeCloseTo(0.975, 3);
    expect(waldEstimate(2, 0.5)).toEqual({ value: 2, standardError: 0.5, low: 2 - 0.5 * Z_95, high: 2 + 0.5 * Z_95 });
  });
});
