import type { ModeCouplingVertex } from './mode-coupling-vertex';

/** Reusable work space of the memory functional: nine prefix sums over p, interleaved per index, and the k weights. */
export interface MemoryScratch {
  readonly sums: Float64Array;
  readonly weights: Float64Array;
  readonly squares: Float64Array;
}

export function memoryScratch(points: number): MemoryScratch {
  return { sums: new Float64Array(9 * (points + 1)), weights: new Float64Array(points), squares: new Float64Array(points) };
}

/**
 * The idealised mode-coupling memory functional of a one-component system in bipolar
 * coordinates (σ = 1), on a midpoint grid:
 * m_q = ρS_q/(32π²q⁵) ∫dk ∫_{|q−k|}^{q+k} dp k p S_k S_p [(q² + k² − p²)c_k + (q² − k² + p²)c_p]² f_k f_p.
 * Writing u = q² + k², v = q² − k², the square expands to
 * c_k²(u − p²)² + 2c_k c_p(u − p²)(v + p²) + c_p²(v + p²)², a polynomial in p², so the p sum
 * over the grid's band |i − j| ≤ l ≤ i + j is read from nine prefix sums of
 * w_p·{1, p², p⁴}·{1, c_p, c_p²}, w_p = p S_p f_p: O(M²) per evaluation instead of O(M³).
 * The functional is bilinear and symmetric, m[f, g] (f on k, g on p); the iteration uses g = f.
 *
 * Source: W. Götze, in Liquids, Freezing and Glass Transition (1991); T. Franosch, M. Fuchs,
 * W. Götze, M. R. Mayr & A. P. Singh, Phys. Rev. E 55, 7153 (1997). Internal.
 *
 * @param vertex the state's S, c and prefactors on its grid.
 * @param f the non-ergodicity parameter on the grid (on k).
 * @param out receives m_q.
 * @param g the second argument (on p), f unless given.
 */
export function modeCouplingMemory(vertex: ModeCouplingVertex, f: Float64Array, out: Float64Array, scratch: MemoryScratch, g: Float64Array = f): Float64Array {
  const { grid, structure, direct, prefactor } = vertex;
  const n = grid.points;
  const k = grid.k;
  const { sums, weights, squares } = scratch;
  for (let t = 0; t < 9; t++) sums[t] = 0;
  for (let j = 0; j < n; j++) {
    weights[j] = k[j] * structure[j] * f[j];
    squares[j] = k[j] * k[j];
  }
  for (let l = 0; l < n; l++) {
    const p = k[l];
    const p2 = p * p;
    const p4 = p2 * p2;
    const w = p * structure[l] * g[l];
    const c = direct[l];
    const wc = w * c;
    const wcc = wc * c;
    const from = 9 * l;
    const to = from + 9;
    sums[to] = sums[from] + w;
    sums[to + 1] = sums[from + 1] + w * p2;
    sums[to + 2] = sums[from + 2] + w * p4;
    sums[to + 3] = sums[from + 3] + wc;
    sums[to + 4] = sums[from + 4] + wc * p2;
    sums[to + 5] = sums[from + 5] + wc * p4;
    sums[to + 6] = sums[from + 6] + wcc;
    sums[to + 7] = sums[from + 7] + wcc * p2;
    sums[to + 8] = sums[from + 8] + wcc * p4;
  }
  for (let i = 0; i < n; i++) {
    const q2 = k[i] * k[i];
    let total = 0;
    for (let j = 0; j < n; j++) {
      const weight = weights[j];
      const lo = 9 * (i > j ? i - j : j - i);
      const hi = 9 * ((i + j < n - 1 ? i + j : n - 1) + 1);
      const k2 = squares[j];
      const u = q2 + k2;
      const v = q2 - k2;
      const ck = direct[j];
      const plain = u * u * (sums[hi] - sums[lo]) - 2 * u * (sums[hi + 1] - sums[lo + 1]) + (sums[hi + 2] - sums[lo + 2]);
      const mixed = u * v * (sums[hi + 3] - sums[lo + 3]) + (u - v) * (sums[hi + 4] - sums[lo + 4]) - (sums[hi + 5] - sums[lo + 5]);
      const crossed = v * v * (sums[hi + 6] - sums[lo + 6]) + 2 * v * (sums[hi + 7] - sums[lo + 7]) + (sums[hi + 8] - sums[lo + 8]);
      total += weight * (ck * ck * plain + 2 * ck * mixed + crossed);
    }
    out[i] = prefactor[i] * total;
  }
  return out;
}
