import { describe, expect, it } from 'vitest';
import { targetProbability } from './target-probability';

describe('targetProbability', () => {
  it('approximates the logistic averaged over a normal shift (probit approximation) to within 0.01', () => {
    // Reference: ∫ σ(β(d − δ)) N(δ; 0, s²) dδ by adaptive quadrature, scipy 1.17 integrate.quad (derived).
    const cases: [number, number, number, number][] = [
      [2, 0.5, 0.5, 0.6967346701436938],
      [4, 0.3, 0.2, 0.6512034349855967],
      [1, 1, -0.7, 0.3588441188727707],
      [10, 0.2, 0.1, 0.6477264385258686],
    ];
    for (const [sharpness, standardError, offset, integral] of cases) {
      expect(Math.abs(targetProbability(offset, { standardError, sharpness }) - integral)).toBeLessThan(0.01);
    }
  });

  it('is the normal distribution function of d/σ without a slope', () => {
    // Φ(1.25) = 0.894350, Φ(−0.75) = 0.226627 (scipy.stats.norm.cdf, derived).
    expect(targetProbability(0.5, { standardError: 0.4, sharpness: null })).toBeCloseTo(0.8943502263331446, 6);
    expect(targetProbability(-0.3, { standardError: 0.4, sharpness: null })).toBeCloseTo(0.22662735237686826, 6);
    // simple-statistics' erf is accurate to about 1e-7 (Numerical Recipes' Chebyshev fit).
    expect(targetProbability(0, { standardError: 0.4, sharpness: null })).toBeCloseTo(0.5, 6);
  });

  it('rises with the offset and is one half on the boundary', () => {
    const u = { standardError: 0.3, sharpness: 3 };
    expect(targetProbability(0, u)).toBe(0.5);
    expect(targetProbability(0.1, u)).toBeLessThan(targetProbability(0.2, u));
    expect(targetProbability(-0.2, u) + targetProbability(0.2, u)).toBeCloseTo(1, 12);
  });

  it('refuses a negative standard error or a non-positive slope', () => {
    expect(() => targetProbability(0, { standardError: -1, sharpness: null })).toThrow(RangeError);
    expect(() => targetProbability(0, { standardError: 1, sharpness: 0 })).toThrow(RangeError);
  });
});
