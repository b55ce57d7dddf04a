import { describe, expect, it } from 'vitest';
import { stiffeningWithAge } from './stiffening-with-age';
import { studentTQuantile, twoSidedCentralProbability } from './student-t-quantile';

describe('studentTQuantile', () => {
  it('matches published t-table values (Abramowitz & Stegun 1964, table 26.10; published)', () => {
    expect(studentTQuantile(0.975, 5)).toBeCloseTo(2.5706, 4);
    expect(studentTQuantile(0.975, 10)).toBeCloseTo(2.2281, 4);
    expect(studentTQuantile(0.975, 1)).toBeCloseTo(12.7062, 4);
    expect(studentTQuantile(0.975, 2)).toBeCloseTo(4.3027, 4);
    expect(studentTQuantile(0.975, 30)).toBeCloseTo(2.0423, 4);
  });

  it('matches scipy.stats.t.ppf to 1e-9 (derived, independent tool)', () => {
    expect(studentTQuantile(0.975, 5)).toBeCloseTo(2.5705818356363146, 9);
    expect(studentTQuantile(0.975, 10)).toBeCloseTo(2.228138851986274, 9);
    expect(studentTQuantile(0.975, 4)).toBeCloseTo(2.7764451051977934, 9);
    expect(studentTQuantile(0.025, 4)).toBeCloseTo(-2.7764451051977934, 9);
    expect(twoSidedCentralProbability(Math.sqrt(2) * 1, 2)).toBeCloseTo(Math.sqrt(2) / 2, 12); // by hand: t/√(ν+t²)
  });

  it('refuses p outside (0, 1) and fractional degrees of freedom', () => {
    expect(() => studentTQuantile(1, 5)).toThrow(RangeError);
    expect(() => studentTQuantile(0.9, 2.5)).toThrow(/whole number/);
  });
});

describe('stiffeningWithAge', () => {
  const invented = [[1, 120], [2, 131], [5, 150], [10, 158], [20, 171], [50, 190]].map(([ageDays, storageModulusPa]) => ({ ageDays, storageModulusPa }));

  it('fits G′ against log10(age): slope 40.6159 Pa/decade, SE 1.31354 (derived: scipy.stats.linregress on these invented points)', () => {
    const fit = stiffeningWithAge(invented);
    if (fit.status !== 'fitted') throw new Error('expected a fit');
    expect(fit.slopePaPerDecade).toBeCloseTo(40.615864115898354, 9);
    expect(fit.standardError).toBeCloseTo(1.3135408860067208, 9);
    expect(fit.interceptPa).toBeCloseTo(119.48677990341804, 9);
    expect(fit.high - fit.slopePaPerDecade).toBeCloseTo(2.7764451051977934 * 1.3135408860067208, 8);
    expect(fit.trend).toBe('stiffens');
  });

  it('flags a recipe that softens (slope below 0, interval excluding 0)', () => {
    const fit = stiffeningWithAge(invented.map((p) => ({ ...p, storageModulusPa: 400 - p.storageModulusPa })));
    expect(fit).toMatchObject({ status: 'fitted', trend: 'softens' });
    const flat = stiffeningWithAge([[1, 100], [10, 110], [100, 95], [1000, 104]].map(([ageDays, storageModulusPa]) => ({ ageDays, storageModulusPa })));
    expect(flat).toMatchObject({ status: 'fitted', trend: 'no-clear-trend' });
  });

  it('says "not enough ages" below three distinct ages', () => {
    const fit = stiffeningWithAge([{ ageDays: 1, storageModulusPa: 10 }, { ageDays: 1, storageModulusPa: 11 }, { ageDays: 7, storageModulusPa: 12 }]);
    expect(fit).toEqual({ status: 'not-enough-ages', distinctAges: 2, pointCount: 3, message: 'not enough ages: G′ was measured at 2 ages; a trend needs at least 3' });
  });

  it('refuses a non-positive age, naming the point', () => {
    expect(() => stiffeningWithAge([{ ageDays: 0, storageModulusPa: 1 }])).toThrow(/point 0 has ageDays 0/);
  });
});
