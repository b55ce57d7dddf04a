import { describe, expect, it } from 'vitest';
import { haltonPoints } from './halton-points';
import { radicalInverse } from './radical-inverse';

describe('radicalInverse', () => {
  it('gives the van der Corput sequence in base 2 and its base-3 twin (the definition; Halton 1960)', () => {
    // Published by definition: i written in base b, digits mirrored about the radix point.
    expect([1, 2, 3, 4, 5, 6, 7].map((i) => radicalInverse(i, 2))).toEqual([1 / 2, 1 / 4, 3 / 4, 1 / 8, 5 / 8, 3 / 8, 7 / 8]);
    const base3 = [1, 2, 3, 4, 5, 6, 7, 8].map((i) => radicalInverse(i, 3));
    [1 / 3, 2 / 3, 1 / 9, 4 / 9, 7 / 9, 2 / 9, 5 / 9, 8 / 9].forEach((value, k) => expect(base3[k]).toBeCloseTo(value, 15));
    expect(radicalInverse(0, 5)).toBe(0);
  });

  it('refuses a negative or fractional index and a base below 2', () => {
    expect(() => radicalInverse(-1, 2)).toThrow(RangeError);
    expect(() => radicalInverse(1.5, 2)).toThrow(RangeError);
    expect(() => radicalInverse(3, 1)).toThrow(RangeError);
  });
});

/** The cell of width 1/n holding v; 1/3 is not exact in binary, so k/3^j may land a hair low. */
const cellOf = (v: number, n: number) => Math.floor(v * n + 1e-9);

describe('haltonPoints', () => {
  it('puts exactly one of the first 2^k points in each interval of width 2^−k along x, and of 3^k along y', () => {
    // The stratification that makes the sequence low-discrepancy (Niederreiter 1992, ch. 3; derived
    // from the definition). Indices start at 1, so the first 2^k points are i = 1 … 2^k.
    const points = haltonPoints(729);
    for (const [base, k] of [[2, 9], [3, 6]] as const) {
      const n = base ** k;
      const count = Math.min(n, points.length / 2);
      const cells = new Array<number>(n).fill(0);
      for (let i = 0; i < count; i++) cells[cellOf(base === 2 ? points[2 * i] : points[2 * i + 1], n)] += 1;
      if (count === n) expect(cells.every((c) => c === 1)).toBe(true);
    }
    // Base 3: the first 3^6 = 729 points fill the 729 bands of y exactly once.
    const bands = new Set(Array.from({ length: 729 }, (_, i) => cellOf(points[2 * i + 1], 729)));
    expect(bands.size).toBe(729);
  });

  it('covers the unit square more evenly than random points: every cell of an 8 × 8 grid gets 16 ± 4 of 1024', () => {
    const points = haltonPoints(1024);
    const cells = new Array<number>(64).fill(0);
    for (let i = 0; i < 1024; i++) cells[Math.floor(points[2 * i] * 8) + 8 * Math.floor(points[2 * i + 1] * 8)] += 1;
    expect(Math.min(...cells)).toBeGreaterThanOrEqual(12);
    expect(Math.max(...cells)).toBeLessThanOrEqual(20);
  });
});
