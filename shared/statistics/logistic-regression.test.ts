import { describe, expect, it } from 'vitest';
import { seededRandom } from '../seeded-random';
import { kFoldSplits } from './k-fold';
import { logisticRegression } from './logistic-regression';
import { crossingPoint } from './crossing-point';

// Space-shuttle O-ring data, 23 launches before 1986: launch temperature (°F) and whether any
// O-ring was damaged. Dalal, Fowlkes & Hoadley, J. Am. Stat. Assoc. 84, 945 (1989), Table 1.
// The logistic fit damage ~ temperature is a textbook example (e.g. Faraway, *Extending the
// Linear Model with R*, 2006, §2.1): β₀ = 15.0429 (SE 7.3786), β₁ = −0.2322 (SE 0.1082).
// Status: from memory (the values R's glm() prints for these data; not re-checked against print).
const TEMPERATURE = [66, 70, 69, 68, 67, 72, 73, 70, 57, 63, 70, 78, 67, 53, 67, 75, 70, 81, 76, 79, 75, 76, 58];
const DAMAGE = [0, 1, 0, 0, 0, 0, 0, 0, 1, 1, 1, 0, 0, 1, 0, 0, 0, 0, 0, 0, 1, 0, 1];

describe('logisticRegression', () => {
  it('reproduces the O-ring fit: coefficients and standard errors (Dalal et al. 1989 data; from memory)', () => {
    const fit = logisticRegression(TEMPERATURE.map((t) => [t]), DAMAGE);
    expect(fit.coefficients[0]).toBeCloseTo(15.0429, 3);
    expect(fit.coefficients[1]).toBeCloseTo(-0.2322, 4);
    expect(fit.standardErrors[0]).toBeCloseTo(7.3786, 3);
    expect(fit.standardErrors[1]).toBeCloseTo(0.1082, 4);
  });

  it('sits at the maximum of the likelihood: the score Xᵀ(y − p) vanishes (derived)', () => {
    const fit = logisticRegression(TEMPERATURE.map((t) => [t]), DAMAGE);
    const p = TEMPERATURE.map((t) => 1 / (1 + Math.exp(-(fit.coefficients[0] + fit.coefficients[1] * t))));
    const score0 = DAMAGE.reduce((s, y, i) => s + (y - p[i]), 0);
    const score1 = DAMAGE.reduce((s, y, i) => s + TEMPERATURE[i] * (y - p[i]), 0);
    expect(Math.abs(score0)).toBeLessThan(1e-8);
    expect(Math.abs(score1)).toBeLessThan(1e-6);
  });

  it('recovers a known crossing point from simulated data within its delta-method uncertainty', () => {
    const random = seededRandom(42);
    const x: number[][] = [];
    const y: number[] = [];
    for (let i = 0; i < 4000; i++) {
      const xi = -3 + 6 * random();
      x.push([xi]);
      y.push(random() < 1 / (1 + Math.exp(-(xi - 0.7) / 0.4)) ? 1 : 0);
    }
    const fit = logisticRegression(x, y);
    const crossing = crossingPoint(fit.coefficients, fit.covariance);
    expect(Math.abs(crossing.value - 0.7)).toBeLessThan(3 * crossing.standardError);
    expect(crossing.standardError).toBeLessThan(0.05);
  });

  it('refuses perfectly separated outcomes, constant features and bad outcome codes', () => {
    expect(() => logisticRegression([[1], [2], [3], [4]], [0, 0, 1, 1])).toThrow(/separated/);
    expect(() => logisticRegression([[1], [1], [1], [1]], [0, 1, 0, 1])).toThrow(/singular|does not vary/);
    expect(() => logisticRegression([[1], [2]], [0, 2])).toThrow(/0 or 1/);
    expect(() => logisticRegression([], [])).toThrow(/no data/);
  });
});

describe('kFoldSplits', () => {
  it('holds every index out exactly once, in folds of near-equal size', () => {
    const splits = kFoldSplits(23, 5, 7);
    const held = splits.flatMap((s) => s.test).sort((a, b) => a - b);
    expect(held).toEqual(Array.from({ length: 23 }, (_, i) => i));
    expect(splits.map((s) => s.test.length).sort()).toEqual([4, 4, 5, 5, 5]);
    for (const s of splits) expect(s.train.length + s.test.length).toBe(23);
    expect(() => kFoldSplits(3, 5)).toThrow(/cannot exceed/);
  });
});
