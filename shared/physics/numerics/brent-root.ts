/** Tolerances of {@link brentRoot}. */
export interface BrentOptions {
  /** Absolute tolerance on x (default 1e-14). */
  absoluteTolerance?: number;
  /** Relative tolerance on x (default 4e-16, about two machine epsilons). */
  relativeTolerance?: number;
  /** Iteration cap (default 200); Brent converges in far fewer on any bracket. */
  maxIterations?: number;
}

/**
 * Root of a continuous function on a bracketing interval by Brent's method: inverse quadratic
 * interpolation and secant steps, falling back to bisection whenever they would leave the bracket
 * or shrink it too slowly, so convergence is guaranteed.
 *
 * Source: R. P. Brent, *Algorithms for Minimization without Derivatives* (Prentice-Hall, 1973),
 * ch. 4 (the algorithm known as zeroin).
 *
 * Tolerance: stops when the bracket is narrower than 2·(relativeTolerance·|x| + absoluteTolerance/2)
 * or f(x) is exactly 0.
 *
 * @returns the root, or `null` when f(low) and f(high) have the same sign (no bracket) or f is
 *   not finite at an end point.
 * @example brentRoot((x) => x * x - 2, 0, 2) // 1.4142135623730951
 */
export function brentRoot(f: (x: number) => number, low: number, high: number, options: BrentOptions = {}): number | null {
  const absoluteTolerance = options.absoluteTolerance ?? 1e-14;
  const relativeTolerance = options.relativeTolerance ?? 4e-16;
  const maxIterations = options.maxIterations ?? 200;
  let a = low;
  let b = high;
  let fa = f(a);
  let fb = f(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) return null;
  if (fa === 0) return a;
  if (fb === 0) return b;
  if ((fa > 0) === (fb > 0)) return null;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    if ((fb > 0) === (fc > 0)) {
      c = a; fc = fa; d = b - a; e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a; fa = fb; fb = fc; fc = fa;
    }
    const tolerance = 2 * relativeTolerance * Math.abs(b) + 0.5 * absoluteTolerance;
    const halfWidth = 0.5 * (c - b);
    if (Math.abs(halfWidth) <= tolerance || fb === 0) return b;
    if (Math.abs(e) >= tolerance && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * halfWidth * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * halfWidth * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q; else p = -p;
      if (2 * p < Math.min(3 * halfWidth * q - Math.abs(tolerance * q), Math.abs(e * q))) {
        e = d; d = p / q;
      } else {
        d = halfWidth; e = d;
      }
    } else {
      d = halfWidth; e = d;
    }
    a = b; fa = fb;
    b += Math.abs(d) > tolerance ? d : (halfWidth > 0 ? tolerance : -tolerance);
    fb = f(b);
    if (!Number.isFinite(fb)) return null;
  }
  return b;
}
