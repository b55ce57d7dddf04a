import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { brentRoot } from '../numerics/brent-root';
import { genericB2FromY, genericYFromB2 } from './generic-axis';
import type { MapAxis, MapModel } from './types';

/**
 * Coordinate conversions of one map: normalised coordinates (x = φ/φ_cp; u = 0 at the weakest
 * attraction, 1 at the strongest), the axis ↔ B2* relation, and the attraction shift between the
 * theory frame (where tables live) and the drawn frame (where boundaries are drawn). Internal.
 */
export interface MapFrame {
  model: MapModel;
  axis: MapAxis;
  shift: number;
  uFromY(y: number): number;
  yFromU(u: number): number;
  b2FromY(y: number): number;
  yFromB2(b2: number): number;
  /** Drawn y of a theory-frame level u₀: the boundary at B2*(u₀) is drawn at B2*(u₀) + shift. */
  drawnYFromTheoryU(u0: number): number;
}

/**
 * B2* table of a depletion map on uniform levels from u = 0 to u = table.u[n − 1] (≥ 1 when a
 * positive attraction shift needs theory levels above the drawn top); u ascending, B2* descending.
 */
export interface ReducedB2Table {
  u: number[];
  b2: number[];
}

// Imported bindings read once: the classifier calls these conversions per point.
const b2FromGenericY = genericB2FromY;
const genericYFromReducedB2 = genericYFromB2;

export function createMapFrame(model: MapModel, axis: MapAxis, shift: number, table?: ReducedB2Table): MapFrame {
  const span = axis.strongest - axis.weakest;
  const uFromY = (y: number) => (y - axis.weakest) / span;
  const yFromU = (u: number) => axis.weakest + u * span;
  let b2FromY: (y: number) => number;
  let yFromB2: (b2: number) => number;
  if (model.kind === 'generic') {
    b2FromY = (y) => b2FromGenericY(model, y);
    yFromB2 = (b2) => genericYFromReducedB2(model, b2);
  } else {
    if (!table) throw new Error('createMapFrame: a depletion map needs its B2* table');
    const q = model.q;
    // The spline coefficients, computed on first use and kept with this frame.
    let g: Float64Array | null = null;
    const spline = () => (g ??= smoothLogGap(table, q, yFromU));
    b2FromY = (y) => depletionB2FromY(table, uFromY(y), y, q, spline());
    yFromB2 = (b2) => depletionYFromB2(table, b2, yFromU, q, spline());
  }
  const drawnYFromTheoryU = shift === 0 ? yFromU : (u0: number) => yFromB2(b2FromY(yFromU(u0)) + shift);
  return { model, axis, shift, uFromY, yFromU, b2FromY, yFromB2, drawnYFromTheoryU };
}

/** Normalised φ. */
export function xFromPhi(phi: number): number {
  return phi / FCC_CLOSE_PACKING;
}

// Interpolation of the depletion B2* table. With y = φ_p^R ∝ u, 1 − B2* starts linear in u and
// grows roughly exponentially, so G(u) = ln(1 − B2*) − ln u is smooth on the whole table,
// including u = 0 where G(0) = ln of the initial slope 3∫(−βU/φ_p^R)x²dx. G is interpolated by
// cubic Hermite splines with central-difference slopes (Catmull–Rom), relative error in 1 − B2*
// ≲ 2e-8 on
// 200 levels; the inverse solves the cubic of its interval by bisection.
function smoothLogGap(table: ReducedB2Table, q: number, yFromU: (u: number) => number): Float64Array {
  const n = table.u.length;
  const g = new Float64Array(n);
  for (let i = 1; i < n; i++) g[i] = Math.log(1 - table.b2[i]) - Math.log(table.u[i]);
  // Initial slope d(1 − B2*)/dφ_p^R = 3∫₁^{1+q} w(x)x²dx with βU = −φ_p^R·w (exact polynomial
  // integral of the Asakura–Oosawa overlap), times dy/du.
  const s = 1 + q;
  const overlap = (s / q) ** 3 * ((s ** 3 - 1) / 3 - (3 / (2 * s)) * ((s ** 4 - 1) / 4) + (s ** 6 - 1) / (12 * s ** 3));
  g[0] = Math.log(3 * overlap * (yFromU(1) - yFromU(0)));
  return g;
}

function hermite(g: Float64Array, i: number, t: number): number {
  const n = g.length;
  const g0 = g[i];
  const g1 = g[i + 1];
  // Central differences inside, second-order one-sided ones at the two ends.
  const m0 = i > 0 ? 0.5 * (g[i + 1] - g[i - 1]) : 0.5 * (-3 * g0 + 4 * g1 - g[i + 2]);
  const m1 = i + 2 < n ? 0.5 * (g[i + 2] - g[i]) : 0.5 * (3 * g1 - 4 * g0 + g[i - 1]);
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * g0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * g1 + (t3 - t2) * m1;
}

function depletionB2FromY(table: ReducedB2Table, u: number, y: number, q: number, g: Float64Array): number {
  const n = table.u.length;
  const top = table.u[n - 1];
  if (u <= 0) return 1;
  if (u >= top) return u === top ? table.b2[n - 1] : asakuraOosawaReducedB2(q, y);
  const position = (u / top) * (n - 1);
  const i = Math.min(Math.floor(position), n - 2);
  return 1 - u * Math.exp(hermite(g, i, position - i));
}

function depletionYFromB2(table: ReducedB2Table, b2: number, yFromU: (u: number) => number, q: number, g: Float64Array): number {
  const n = table.u.length;
  if (b2 >= 1) return yFromU(0);
  const strongest = table.b2[n - 1];
  if (b2 < strongest) {
    // Beyond the top of the table: solve the AO quadrature directly (rare).
    const last = yFromU(table.u[n - 1]);
    let high = last * 2;
    const excess = (y: number) => asakuraOosawaReducedB2(q, y) - b2;
    while (excess(high) > 0 && high < 1e3) high *= 2;
    return brentRoot(excess, last, high, { absoluteTolerance: 1e-13 }) ?? high;
  }
  let low = 0;
  let top = n - 1;
  while (top - low > 1) {
    const middle = (low + top) >> 1;
    if (table.b2[middle] >= b2) low = middle; else top = middle;
  }
  // Solve B2*(u) = b2 inside [u_low, u_top] on the same spline (monotone there).
  const step = table.u[1] - table.u[0];
  let a = 0;
  let b = 1;
  for (let k = 0; k < 60; k++) {
    const t = 0.5 * (a + b);
    const u = table.u[low] + t * step;
    const value = 1 - u * Math.exp(hermite(g, low, t));
    if (value > b2) a = t; else b = t;
  }
  return yFromU(table.u[low] + 0.5 * (a + b) * step);
}
