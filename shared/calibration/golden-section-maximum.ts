/** 1/φ, the golden ratio's inverse: each step keeps this share of the bracket. */
const INVERSE_GOLDEN = (Math.sqrt(5) - 1) / 2;

/**
 * The maximum of a function on [low, high] by golden-section search: the bracket shrinks by
 * 1/φ ≈ 0.618 per step while keeping the larger of two interior values. Finds the maximum of a
 * unimodal function; elsewhere a local one (callers start from the best point of a grid).
 * Source: Press, Teukolsky, Vetterling & Flannery, *Numerical Recipes*, 3rd ed. (2007), §10.2.
 *
 * @throws Error when low ≥ high or the tolerance is not positive
 * @example goldenSectionMaximum((x) => -(x - 1) ** 2, 0, 3).x // ≈ 1
 */
export function goldenSectionMaximum(f: (x: number) => number, low: number, high: number, tolerance = 1e-6): { x: number; value: number } {
  if (!(low < high)) throw new Error(`goldenSectionMaximum: low (${low}) must be below high (${high})`);
  if (!(tolerance > 0)) throw new Error('goldenSectionMaximum: tolerance must be positive');
  let a = low;
  let b = high;
  let c = b - INVERSE_GOLDEN * (b - a);
  let d = a + INVERSE_GOLDEN * (b - a);
  let fc = f(c);
  let fd = f(d);
  while (b - a > tolerance) {
    if (fc >= fd) {
      b = d; d = c; fd = fc;
      c = b - INVERSE_GOLDEN * (b - a); fc = f(c);
    } else {
      a = c; c = d; fc = fd;
      d = a + INVERSE_GOLDEN * (b - a); fd = f(d);
    }
  }
  return fc >= fd ? { x: c, value: fc } : { x: d, value: fd };
}
