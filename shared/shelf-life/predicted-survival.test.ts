import { describe, expect, it } from 'vitest';
import { breslowBaselineHazard } from './breslow-baseline-hazard';
import { coxProportionalHazards, type CoxRecord } from './cox-proportional-hazards';
import { predictedMedianDays, predictedSurvival, predictedSurvivalAt } from './predicted-survival';

// Leukaemia remission trial (Freireich et al., Blood 21, 699 (1963)), weeks; * = censored, as
// tabulated in Kleinbaum & Klein, *Survival Analysis: A Self-Learning Text*, and Klein &
// Moeschberger, *Survival Analysis*, 2nd ed. (2003) (the same data as cox-proportional-hazards.test.ts).
const SIX_MP = '6,6,6,6*,7,9*,10,10*,11*,13,16,17*,19*,20*,22,23,25*,32*,32*,34*,35*';
const PLACEBO = '1,1,2,2,3,4,4,5,5,8,8,8,8,11,11,12,12,15,17,22,23';
function arm(spec: string, placebo: number): CoxRecord[] {
  return spec.split(',').map((item) => ({ timeDays: Number(item.replace('*', '')), collapsed: !item.endsWith('*'), values: { placebo } }));
}
const REMISSIONS = [...arm(SIX_MP, 0), ...arm(PLACEBO, 1)];

/** Reference: Breslow's estimator written out naively, O(n²), straight from Klein & Moeschberger eq. 8.8.2. */
function naiveBaseline(records: CoxRecord[], beta: number, centre: number, t: number): number {
  const eventTimes = [...new Set(records.filter((r) => r.collapsed && r.timeDays <= t).map((r) => r.timeDays))];
  let total = 0;
  for (const time of eventTimes) {
    const d = records.filter((r) => r.collapsed && r.timeDays === time).length;
    let risk = 0;
    for (const r of records) if (r.timeDays >= time) risk += Math.exp(beta * (r.values.placebo - centre));
    total += d / risk;
  }
  return total;
}

describe('breslowBaselineHazard', () => {
  it('is the Nelson–Aalen estimator when β = 0: the 6-MP arm 3/21, +1/17, +1/15, +1/12, +1/11, +1/7, +1/6 (derived by hand from the risk sets)', () => {
    const base = breslowBaselineHazard(arm(SIX_MP, 0), { placebo: 0 });
    expect(base.timeDays).toEqual([6, 7, 10, 13, 16, 22, 23]);
    const expected = [3 / 21, 1 / 17, 1 / 15, 1 / 12, 1 / 11, 1 / 7, 1 / 6].map(((sum) => (v: number) => (sum += v))(0));
    base.cumulativeHazard.forEach((h, i) => expect(h).toBeCloseTo(expected[i], 12));
    expect(base.cumulativeHazard.at(-1)).toBeCloseTo(0.7521, 4); // the sum, by hand (derived)
  });

  it('matches a naive O(n²) Breslow estimator at every week of the remission trial fit, and H₀(1) = 1/(21·cosh(β/2)) (derived by hand: 2 collapses, 21 + 21 at risk, centre ½)', () => {
    const fit = coxProportionalHazards(REMISSIONS, [{ key: 'placebo', label: 'placebo', unit: '' }]);
    const beta = fit.terms[0].coefficient;
    const base = breslowBaselineHazard(REMISSIONS, { placebo: beta });
    expect(base.centre.placebo).toBe(0.5);
    expect(base.cumulativeHazard[0]).toBeCloseTo(1 / (21 * Math.cosh(beta / 2)), 12);
    base.timeDays.forEach((t, i) => expect(base.cumulativeHazard[i]).toBeCloseTo(naiveBaseline(REMISSIONS, beta, 0.5, t), 12));
  });

  it('refuses a record without a covariate value, naming it', () => {
    expect(() => breslowBaselineHazard([{ timeDays: 1, collapsed: true, values: {} }], { phi: 1 })).toThrow(/record 0 has phi = undefined/);
  });
});

describe('predictedSurvival and predictedMedianDays', () => {
  const fit = coxProportionalHazards(REMISSIONS, [{ key: 'placebo', label: 'placebo', unit: '' }]);
  const coefficients = { placebo: fit.terms[0].coefficient };
  const base = breslowBaselineHazard(REMISSIONS, coefficients);

  it('gives S(t|x) = exp(−H₀(t)·exp(β(x − x̄))) at every step (checked against the naive baseline)', () => {
    const curve = predictedSurvival(base, coefficients, { placebo: 1 });
    curve.timeDays.forEach((t, i) => expect(curve.survival[i]).toBeCloseTo(Math.exp(-naiveBaseline(REMISSIONS, coefficients.placebo, 0.5, t) * Math.exp(coefficients.placebo * 0.5)), 12));
    expect(predictedSurvivalAt(base, coefficients, { placebo: 1 }, 0.5)).toBe(1);
    expect(predictedSurvivalAt(base, coefficients, { placebo: 1 }, 9)).toBeCloseTo(curve.survival[curve.timeDays.indexOf(8)], 12);
  });

  it('predicts medians of 8 weeks on placebo and 23 weeks on 6-MP, as the arms\' own Kaplan–Meier medians (published: Kleinbaum & Klein, from memory)', () => {
    expect(predictedMedianDays(base, coefficients, { placebo: 1 })).toBe(8);
    expect(predictedMedianDays(base, coefficients, { placebo: 0 })).toBe(23);
  });

  it('says nothing (null) when the predicted curve never falls to one half: a sample far on the safe side', () => {
    expect(predictedMedianDays(base, coefficients, { placebo: -2 })).toBeNull();
  });

  it('refuses a prediction without the model\'s covariate, naming it', () => {
    expect(() => predictedMedianDays(base, coefficients, {})).toThrow(/covariate placebo is undefined/);
  });
});
