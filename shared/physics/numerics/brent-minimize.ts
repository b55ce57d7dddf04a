/**
 * Minimum of a unimodal function on [low, high] by Brent's method: golden-section search
 * accelerated by parabolic interpolation.
 *
 * Source: R. P. Brent, *Algorithms for Minimization without Derivatives* (Prentice-Hall, 1973),
 * ch. 5 (the algorithm known as fmin). Converges to |x − x*| ≲ tolerance·|x| + 1e-12 (default
 * tolerance 1e-10; below √ε the parabola is swamped by rounding).
 *
 * @returns `{ x, value }` at the minimum.
 * @example brentMinimize((x) => (x - 2) ** 2 + 1, 0, 5).x // 2.00000001 (a flat minimum: to ~1e-8)
 */
export function brentMinimize(f: (x: number) => number, low: number, high: number, tolerance = 1e-10): { x: number; value: number } {
  const golden = 0.3819660112501051;
  let a = low;
  let b = high;
  let x = a + golden * (b - a);
  let w = x;
  let v = x;
  let fx = f(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  for (let iteration = 0; iteration < 200; iteration++) {
    const middle = 0.5 * (a + b);
    const tol1 = tolerance * Math.abs(x) + 1e-12;
    const tol2 = 2 * tol1;
    if (Math.abs(x - middle) <= tol2 - 0.5 * (b - a)) break;
    let useGolden = true;
    if (Math.abs(e) > tol1) {
      const r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p; else q = -q;
      if (Math.abs(p) < Math.abs(0.5 * q * e) && p > q * (a - x) && p < q * (b - x)) {
        e = d;
        d = p / q;
        const u = x + d;
        if (u - a < tol2 || b - u < tol2) d = middle >= x ? tol1 : -tol1;
        useGolden = false;
      }
    }
    if (useGolden) {
      e = (x >= middle ? a : b) - x;
      d = golden * e;
    }
    const u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1);
    const fu = f(u);
    if (fu <= fx) {
      if (u >= x) a = x; else b = x;
      v = w; fv = fw; w = x; fw = fx; x = u; fx = fu;
    } else {
      if (u < x) a = u; else b = u;
      if (fu <= fw || w === x) {
        v = w; fv = fw; w = u; fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u; fv = fu;
      }
    }
  }
  return { x, value: fx };
}
