/**
 * Root of a monotone function on a bracket [low, high] by Newton's method kept inside the bracket:
 * a Newton step that leaves the current bracket, or does not halve it fast enough, is replaced by
 * bisection (the "rtsafe" scheme of Press et al., *Numerical Recipes*, 3rd ed., §9.4).
 *
 * Stops when the step is below `absoluteTolerance + relativeTolerance·|x|` (defaults 1e-15 and
 * 1e-15) or after 100 iterations.
 *
 * @returns the root, or `null` if f(low) and f(high) do not bracket a sign change.
 * @example safeguardedNewton((x) => x * x - 2, (x) => 2 * x, 0, 2) // 1.4142135623730951
 */
export function safeguardedNewton(
  f: (x: number) => number,
  derivative: (x: number) => number,
  low: number,
  high: number,
  start?: number,
  absoluteTolerance = 1e-15,
  relativeTolerance = 1e-15,
): number | null {
  const fLow = f(low);
  const fHigh = f(high);
  if (!Number.isFinite(fLow) || !Number.isFinite(fHigh)) return null;
  if (fLow === 0) return low;
  if (fHigh === 0) return high;
  if ((fLow > 0) === (fHigh > 0)) return null;
  // Orient so that f(lo) < 0 < f(hi).
  let lo = fLow < 0 ? low : high;
  let hi = fLow < 0 ? high : low;
  let x = start !== undefined && start > Math.min(low, high) && start < Math.max(low, high) ? start : 0.5 * (low + high);
  let previousStep = Math.abs(high - low);
  let step = previousStep;
  let fx = f(x);
  let dfx = derivative(x);
  for (let iteration = 0; iteration < 100; iteration++) {
    const newtonLeaves = ((x - hi) * dfx - fx) * ((x - lo) * dfx - fx) > 0;
    if (!Number.isFinite(dfx) || dfx === 0 || newtonLeaves || Math.abs(2 * fx) > Math.abs(previousStep * dfx)) {
      previousStep = step;
      step = 0.5 * (hi - lo);
      x = lo + step;
    } else {
      previousStep = step;
      step = fx / dfx;
      x -= step;
    }
    if (Math.abs(step) <= absoluteTolerance + relativeTolerance * Math.abs(x)) return x;
    fx = f(x);
    dfx = derivative(x);
    if (!Number.isFinite(fx)) return null;
    if (fx === 0) return x;
    if (fx < 0) lo = x; else hi = x;
  }
  return x;
}
