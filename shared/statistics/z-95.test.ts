import { cumulativeStdNormalProbability, errorFunction } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { Z_95 as CALIBRATION_Z_95 } from '../calibration/wald-estimate';
import { BAND_Z } from '../planning/propose-experiments';
import { Z_95 } from './z-95';

describe('Z_95', () => {
  it('is the 0.975 normal quantile 1.95996 (Abramowitz & Stegun 1964, ch. 26 tables; published) to 1e-5', () => {
    expect(Math.abs(Z_95 - 1.95996)).toBeLessThan(1e-5);
    // 1.959963984540054: scipy.stats.norm.ppf(0.975) (derived, independent tool).
    expect(Z_95).toBe(1.959963984540054);
  });

  it('gives Φ(Z_95) = 0.975 through the error function (derived: Φ(z) = ½(1 + erf(z/√2)))', () => {
    // simple-statistics' erf is accurate to about 1e-7, enough to tell 1.95996 from 1.95716.
    expect(0.5 * (1 + errorFunction(Z_95 / Math.SQRT2))).toBeCloseTo(0.975, 6);
    expect(cumulativeStdNormalProbability(Z_95)).toBeCloseTo(0.975, 3);
  });

  it('is the one value the planner and the calibration use (the old probit(0.975) = 1.95716 fails this)', () => {
    expect(Math.abs(BAND_Z - 1.95996)).toBeLessThan(1e-5);
    expect(BAND_Z).toBe(Z_95);
    expect(CALIBRATION_Z_95).toBe(Z_95);
  });
});
