import { describe, expect, it } from 'vitest';
import { monotoneInterpolant } from './monotone-interpolant';

describe('monotoneInterpolant', () => {
  it('matches SciPy’s PchipInterpolator (Fritsch–Butland slopes)', () => {
    // Derived with scipy 1.17 scipy.interpolate.PchipInterpolator, an independent implementation.
    expect(monotoneInterpolant([0, 1, 2], [0, 1, 4])(1.5)).toBeCloseTo(2.1875, 12);
    const f = monotoneInterpolant([0, 1, 3, 4, 7], [2, 1.5, -1, -1, -9]);
    expect(f(0.5)).toBeCloseTo(1.8039772727272727, 12);
    expect(f(2)).toBeCloseTo(0.07954545454545453, 12);
    expect(f(3.5)).toBeCloseTo(-1, 12);
    expect(f(5.5)).toBeCloseTo(-3.25, 12);
  });

  it('never overshoots monotone data and holds the end values outside', () => {
    const xs = [0, 1, 2, 3, 10];
    const ys = [5, 4.9, 0, -0.1, -50];
    const f = monotoneInterpolant(xs, ys);
    let previous = Infinity;
    for (let x = -1; x <= 11; x += 0.01) {
      const y = f(x);
      expect(y).toBeLessThanOrEqual(previous + 1e-12);
      previous = y;
    }
    expect(f(-5)).toBe(5);
    expect(f(50)).toBe(-50);
  });

  it('refuses too few or unordered points', () => {
    expect(() => monotoneInterpolant([1], [1])).toThrow(RangeError);
    expect(() => monotoneInterpolant([0, 0], [1, 2])).toThrow(RangeError);
    expect(() => monotoneInterpolant([0, 1], [1, NaN])).toThrow(RangeError);
  });
});
