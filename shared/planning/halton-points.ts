import { radicalInverse } from './radical-inverse';

/**
 * The first `count` points of the two-dimensional Halton sequence (bases 2 and 3) in the unit
 * square, as a flat array [u₀, v₀, u₁, v₁, …]. A low-discrepancy sequence: any prefix covers the
 * square far more evenly than as many random points (discrepancy O((log N)²/N) against
 * O(N^−½) for random points), so a plan's candidates sample the whole composition window and
 * the same request always gives the same points.
 *
 * The sequence starts at index 1, leaving out the corner (0, 0).
 *
 * Source: J. H. Halton, "On the efficiency of certain quasi-random sequences of points in
 * evaluating multi-dimensional integrals", Numerische Mathematik 2, 84 (1960); see also
 * H. Niederreiter, *Random Number Generation and Quasi-Monte Carlo Methods* (SIAM, 1992), ch. 3.
 *
 * @param count number of points, a whole number ≥ 0.
 * @throws RangeError for a negative or fractional count.
 * @example haltonPoints(2) // Float64Array [0.5, 1/3, 0.25, 2/3]
 */
export function haltonPoints(count: number): Float64Array {
  if (!Number.isInteger(count) || count < 0) throw new RangeError(`haltonPoints: count must be a whole number ≥ 0; got ${count}`);
  const points = new Float64Array(2 * count);
  for (let i = 0; i < count; i++) {
    points[2 * i] = radicalInverse(i + 1, 2);
    points[2 * i + 1] = radicalInverse(i + 1, 3);
  }
  return points;
}
