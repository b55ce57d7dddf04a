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

/** B2* table of a depletion map on uniform levels (u ascending, B2* descending). */
export interface ReducedB2Table {
  u: number[];
  b2: number[];
}

export function createMapFrame(model: MapModel, axis: MapAxis, shift: number, table?: ReducedB2Table): MapFrame {
  const span = axis.strongest - axis.weakest;
  const uFromY = (y: number) => (y - axis.weakest) / span;
  const yFromU = (u: number) => axis.weakest + u * span;
  let b2FromY: (y: number) => number;
  let yFromB2: (b2: number) => number;
  if (model.kind === 'generic') {
    b2FromY = (y) => genericB2FromY(model, y);
    yFromB2 = (b2) => genericYFromB2(model, b2);
  } else {
    if (!table) throw new Error('createMapFrame: a depletion map needs its B2* table');
    const q = model.q;
    b2FromY = (y) => depletionB2FromY(table, uFromY(y), y, q);
    yFromB2 = (b2) => depletionYFromB2(table, b2, yFromU, q);
  }
  const drawnYFromTheoryU = shift === 0 ? yFromU : (u0: number) => yFromB2(b2FromY(yFromU(u0)) + shift);
  return { model, axis, shift, uFromY, yFromU, b2FromY, yFromB2, drawnYFromTheoryU };
}

/** Normalised φ. */
export function xFromPhi(phi: number): number {
  return phi / FCC_CLOSE_PACKING;
}

// ln(1 − B2*) is close to linear in φ_p^R once the well is a few kT deep, so interpolate it;
// the first interval (from B2* = 1) is linear in B2*.
function depletionB2FromY(table: ReducedB2Table, u: number, y: number, q: number): number {
  const n = table.u.length;
  if (u <= 0) return 1;
  if (u >= 1) return u === 1 ? table.b2[n - 1] : asakuraOosawaReducedB2(q, y);
  const position = u * (n - 1);
  const i = Math.min(Math.floor(position), n - 2);
  const t = position - i;
  if (i === 0) return table.b2[0] + t * (table.b2[1] - table.b2[0]);
  const gapLow = Math.log(1 - table.b2[i]);
  const gapHigh = Math.log(1 - table.b2[i + 1]);
  return 1 - Math.exp(gapLow + t * (gapHigh - gapLow));
}

function depletionYFromB2(table: ReducedB2Table, b2: number, yFromU: (u: number) => number, q: number): number {
  const n = table.u.length;
  if (b2 >= 1) return yFromU(0);
  const strongest = table.b2[n - 1];
  if (b2 < strongest) {
    // Beyond the top of the map: solve the AO quadrature directly (rare).
    let high = yFromU(1) * 2;
    const excess = (y: number) => asakuraOosawaReducedB2(q, y) - b2;
    while (excess(high) > 0 && high < 1e3) high *= 2;
    return brentRoot(excess, yFromU(1), high, { absoluteTolerance: 1e-13 }) ?? high;
  }
  let low = 0;
  let top = n - 1;
  while (top - low > 1) {
    const middle = (low + top) >> 1;
    if (table.b2[middle] >= b2) low = middle; else top = middle;
  }
  let t: number;
  if (low === 0) {
    t = (b2 - table.b2[0]) / (table.b2[1] - table.b2[0]);
  } else {
    const gapLow = Math.log(1 - table.b2[low]);
    const gapHigh = Math.log(1 - table.b2[top]);
    t = (Math.log(1 - b2) - gapLow) / (gapHigh - gapLow);
  }
  return yFromU(table.u[low] + t * (table.u[top] - table.u[low]));
}
