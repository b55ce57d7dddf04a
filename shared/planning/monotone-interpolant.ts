/**
 * Monotone piecewise-cubic Hermite interpolant through (xᵢ, yᵢ) (PCHIP): slopes from the
 * weighted harmonic mean of neighbouring secants (zero where the data turn), one-sided
 * three-point slopes at the ends, limited so the curve never overshoots monotone data.
 * Outside [x₀, xₙ₋₁] the end values are returned.
 *
 * Source: F. N. Fritsch & R. E. Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer.
 * Anal. 17, 238 (1980); the slope rule of F. N. Fritsch & J. Butland, SIAM J. Sci. Stat. Comput.
 * 5, 300 (1984), as in C. Moler, *Numerical Computing with MATLAB* (SIAM, 2004), §3.4 (pchip).
 *
 * @param xs strictly increasing abscissae (at least 2).
 * @param ys ordinates, as many as xs, all finite.
 * @throws RangeError for fewer than 2 points, unequal lengths, non-finite or non-increasing xs.
 * @example monotoneInterpolant([0, 1, 2], [0, 1, 4])(1.5) // 2.1875
 */
export function monotoneInterpolant(xs: readonly number[], ys: readonly number[]): (x: number) => number {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError('monotoneInterpolant: needs at least 2 points and as many ys as xs');
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(xs[i]) || !Number.isFinite(ys[i])) throw new RangeError(`monotoneInterpolant: point ${i} is not finite`);
    if (i > 0 && xs[i] <= xs[i - 1]) throw new RangeError('monotoneInterpolant: xs must increase strictly');
  }
  const widths = Array.from({ length: n - 1 }, (_, i) => xs[i + 1] - xs[i]);
  const secants = widths.map((h, i) => (ys[i + 1] - ys[i]) / h);
  const slopes = new Array<number>(n).fill(0);
  if (n === 2) slopes.fill(secants[0]);
  else {
    for (let i = 1; i < n - 1; i++) {
      const [left, right] = [secants[i - 1], secants[i]];
      if (left * right <= 0) continue;
      const w1 = 2 * widths[i] + widths[i - 1];
      const w2 = widths[i] + 2 * widths[i - 1];
      slopes[i] = (w1 + w2) / (w1 / left + w2 / right);
    }
    slopes[0] = endSlope(widths[0], widths[1], secants[0], secants[1]);
    slopes[n - 1] = endSlope(widths[n - 2], widths[n - 3], secants[n - 2], secants[n - 3]);
  }
  return (x: number) => {
    if (x <= xs[0]) return ys[0];
    if (x >= xs[n - 1]) return ys[n - 1];
    let low = 0;
    let high = n - 1;
    while (high - low > 1) {
      const middle = (low + high) >> 1;
      if (xs[middle] <= x) low = middle;
      else high = middle;
    }
    const h = widths[low];
    const t = (x - xs[low]) / h;
    const t2 = t * t;
    const t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * ys[low] + (t3 - 2 * t2 + t) * h * slopes[low] + (-2 * t3 + 3 * t2) * ys[low + 1] + (t3 - t2) * h * slopes[low + 1];
  };
}

/** The three-point end slope, kept on the side of the first secant and within three times it. */
function endSlope(h0: number, h1: number, d0: number, d1: number): number {
  const slope = ((2 * h0 + h1) * d0 - h0 * d1) / (h0 + h1);
  if (Math.sign(slope) !== Math.sign(d0)) return 0;
  if (Math.sign(d0) !== Math.sign(d1) && Math.abs(slope) > Math.abs(3 * d0)) return 3 * d0;
  return slope;
}
