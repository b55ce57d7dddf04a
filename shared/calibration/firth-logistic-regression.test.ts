import { describe, expect, it } from 'vitest';
import { logisticRegression } from '../statistics/logistic-regression';
import { seededRandom } from '../seeded-random';
import { firthLogisticRegression } from './firth-logistic-regression';

// Firth's penalised likelihood (Firth, Biometrika 80, 27 (1993); Heinze & Schemper, Statistics
// in Medicine 21, 2409 (2002)). For one binary covariate the model is saturated and the penalty
// is Jeffreys' prior on each group's probability, so each group's fitted logit is
// ln((y + ½)/(n − y + ½)): "add one half to every cell" (derived from the penalty; the
// correspondence is stated by Heinze & Schemper, from memory).

describe('firthLogisticRegression', () => {
  it('gives finite estimates for a perfectly separated 2 × 2 table: the logits with ½ added to each cell (derived)', () => {
    // x = 0: 0 of 3 positive; x = 1: 4 of 4 positive.
    const rows = [[0], [0], [0], [1], [1], [1], [1]];
    const outcomes = [0, 0, 0, 1, 1, 1, 1];
    expect(() => logisticRegression(rows, outcomes)).toThrow(/separated/);
    const fit = firthLogisticRegression(rows, outcomes);
    const logitAt0 = Math.log(0.5 / 3.5);
    const logitAt1 = Math.log(4.5 / 0.5);
    expect(fit.coefficients[0]).toBeCloseTo(logitAt0, 8);
    expect(fit.coefficients[1]).toBeCloseTo(logitAt1 - logitAt0, 8);
    expect(fit.standardErrors.every(Number.isFinite)).toBe(true);
  });

  it('matches a non-separated 2 × 2 table with ½ added, and sits where the modified score vanishes (derived)', () => {
    // x = 0: 3 of 10 positive; x = 1: 7 of 9 positive.
    const rows = [...Array(10).fill([0]), ...Array(9).fill([1])];
    const outcomes = [1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 0, 0];
    const fit = firthLogisticRegression(rows, outcomes);
    expect(fit.coefficients[0]).toBeCloseTo(Math.log(3.5 / 7.5), 8);
    expect(fit.coefficients[1]).toBeCloseTo(Math.log(7.5 / 2.5) - Math.log(3.5 / 7.5), 8);
  });

  it('comes close to maximum likelihood when the sample is large (the penalty is O(1) against an O(n) likelihood)', () => {
    const random = seededRandom(8);
    const rows: number[][] = [];
    const outcomes: number[] = [];
    for (let i = 0; i < 3000; i++) {
      const x = -2 + 4 * random();
      rows.push([x]);
      outcomes.push(random() < 1 / (1 + Math.exp(-(0.3 + 1.5 * x))) ? 1 : 0);
    }
    const firth = firthLogisticRegression(rows, outcomes);
    const ml = logisticRegression(rows, outcomes);
    expect(Math.abs(firth.coefficients[1] - ml.coefficients[1])).toBeLessThan(0.1 * ml.standardErrors[1]);
    expect(Math.abs(firth.coefficients[0] - ml.coefficients[0])).toBeLessThan(0.1 * ml.standardErrors[0]);
  });

  it('refuses empty data and a feature that does not vary', () => {
    expect(() => firthLogisticRegression([], [])).toThrow(/no data/);
    expect(() => firthLogisticRegression([[1], [1], [1]], [0, 1, 1])).toThrow(/singular/);
    expect(() => firthLogisticRegression([[1], [2]], [0, 3])).toThrow(/0 or 1/);
  });
});
