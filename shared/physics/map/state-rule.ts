import type { ClassifierParameters, ClassifierTables, DomeCurve, LevelCurve, PredictedState } from './types';

// The lookups live here, next to the rule that calls them per point (no cross-module call in
// the classifier's hot loop).

/**
 * φ on a level curve at normalised attraction u, by linear interpolation (the interval found from
 * the nearly uniform level spacing, then adjusted); clamped to the end values outside the curve's
 * range. Internal.
 */
export function curveAt(curve: LevelCurve, u: number): number {
  const us = curve.u;
  const n = us.length;
  if (n === 0) return NaN;
  const first = us[0];
  const last = us[n - 1];
  if (u <= first) return curve.phi[0];
  if (u >= last) return curve.phi[n - 1];
  // The levels are (nearly) uniform: guess the interval, then step to it (usually 0–1 steps).
  let low = Math.floor(((u - first) / (last - first)) * (n - 1));
  if (low > n - 2) low = n - 2;
  while (low > 0 && us[low] > u) low--;
  while (low < n - 2 && us[low + 1] <= u) low++;
  const high = low + 1;
  const span = us[high] - us[low];
  const t = span > 0 ? (u - us[low]) / span : 0;
  return curve.phi[low] + t * (curve.phi[high] - curve.phi[low]);
}

/**
 * Left and right φ of a dome (binodal or spinodal) at u, or `null` below its bottom (the
 * critical point). Above its last level the top values are kept. Internal.
 */
export function domeAt(dome: DomeCurve | null, u: number): [number, number] | null {
  if (dome === null || u < dome.bottom) return null;
  return [curveAt(dome.left, u), curveAt(dome.right, u)];
}

/** Why a state was chosen; classifyPoint turns it into words. */
export type StateCause =
  | 'gel-spinodal'
  | 'gel-binodal'
  | 'separated'
  | 'glass-attractive'
  | 'glass-repulsive'
  | 'crystal-coexistence'
  | 'crystal'
  | 'fluid-suppressed'
  | 'fluid';

const STATE_OF: Record<StateCause, PredictedState> = {
  'gel-spinodal': 'gel',
  'gel-binodal': 'gel',
  separated: 'separated',
  'glass-attractive': 'glass',
  'glass-repulsive': 'glass',
  'crystal-coexistence': 'crystal',
  crystal: 'crystal',
  'fluid-suppressed': 'fluid',
  fluid: 'fluid',
};

/** The state of a cause. */
export function stateOfCause(cause: StateCause): PredictedState {
  return STATE_OF[cause];
}

/**
 * The rule's thresholds at one theory-frame level u₀ (they do not depend on φ): the spinodal and
 * binodal limits, the fluid side of fluid–crystal coexistence, melting, and the effective B2*.
 * NaN means absent (or not looked up). Internal.
 */
export interface RuleRow {
  spinodalLow: number;
  spinodalHigh: number;
  binodalLow: number;
  binodalHigh: number;
  freezing: number;
  melting: number;
  /** φ of the glass line at this level, and whether the glass there is the attractive one. */
  glass: number;
  attractive: boolean;
  b2: number;
}

export function emptyRow(): RuleRow {
  return { spinodalLow: NaN, spinodalHigh: NaN, binodalLow: NaN, binodalHigh: NaN, freezing: NaN, melting: NaN, glass: NaN, attractive: false, b2: NaN };
}

/** Whether the glass at level u₀ is the attractive one (past the line's nose). Internal. */
export function attractiveAt(tables: ClassifierTables, u0: number): boolean {
  return tables.attractiveGlassFrom !== null && u0 > tables.attractiveGlassFrom;
}

/** Fill `row` with every threshold at u₀ (a row of the region grid shares one). Internal. */
export function ruleRowAt(tables: ClassifierTables, u0: number, b2: number, row: RuleRow = emptyRow()): RuleRow {
  const spinodal = tables.spinodal;
  const binodal = tables.binodal;
  const inSpinodal = spinodal !== null && u0 >= spinodal.bottom;
  const inBinodal = binodal !== null && u0 >= binodal.bottom;
  row.spinodalLow = inSpinodal ? curveAt(spinodal.left, u0) : NaN;
  row.spinodalHigh = inSpinodal ? curveAt(spinodal.right, u0) : NaN;
  row.binodalLow = inBinodal ? curveAt(binodal.left, u0) : NaN;
  row.binodalHigh = inBinodal ? curveAt(binodal.right, u0) : NaN;
  row.freezing = curveAt(tables.freezing, u0);
  row.melting = curveAt(tables.melting, u0);
  row.glass = curveAt(tables.glass, u0);
  row.attractive = attractiveAt(tables, u0);
  row.b2 = b2;
  return row;
}

/**
 * Gelwright's state rule (physics.md §5) on a prepared row, at φ (comparisons with NaN are
 * false, i.e. "absent"); φ_g is the glass line at the row's level (mode-coupling theory):
 * 1. inside the spinodal and φ < φ_g → gel (spinodal decomposition arrested, Lu et al. 2008);
 * 2. inside the binodal, φ < φ_g → gel if B2*_eff ≤ gelB2Threshold, else separated;
 * 3. φ ≥ φ_g → glass: attractive past the line's nose, repulsive before it;
 * 4. φ above the fluid side of fluid–crystal coexistence → crystal (fluid when the crystal is
 *    suppressed by polydispersity);
 * 5. otherwise fluid.
 * Internal.
 */
export function causeOnRow(row: RuleRow, parameters: ClassifierParameters, crystalSuppressed: boolean, phi: number): StateCause {
  const belowGlass = phi < row.glass;
  if (belowGlass && phi > row.spinodalLow && phi < row.spinodalHigh) return 'gel-spinodal';
  if (belowGlass && phi > row.binodalLow && phi < row.binodalHigh) return row.b2 <= parameters.gelB2Threshold ? 'gel-binodal' : 'separated';
  if (!belowGlass) return row.attractive ? 'glass-attractive' : 'glass-repulsive';
  if (phi > row.freezing) {
    if (crystalSuppressed) return 'fluid-suppressed';
    return phi < row.melting ? 'crystal-coexistence' : 'crystal';
  }
  return 'fluid';
}

const scratchRow = emptyRow();

/**
 * The same rule at one point (φ, u₀, B2*_eff), looking up only as far as it needs: `row`
 * (reused) receives the thresholds it looked up, the others stay NaN. Same result as
 * causeOnRow(ruleRowAt(…)) — a test checks it. Internal (classifier, active-segment marking).
 */
export function decideCause(
  tables: ClassifierTables,
  parameters: ClassifierParameters,
  crystalSuppressed: boolean,
  phi: number,
  u0: number,
  b2: number,
  row: RuleRow = scratchRow,
): StateCause {
  row.spinodalLow = NaN; row.spinodalHigh = NaN; row.binodalLow = NaN; row.binodalHigh = NaN;
  row.freezing = NaN; row.melting = NaN; row.b2 = b2;
  row.glass = curveAt(tables.glass, u0);
  row.attractive = attractiveAt(tables, u0);
  const belowGlass = phi < row.glass;
  if (belowGlass) {
    const spinodal = tables.spinodal;
    if (spinodal !== null && u0 >= spinodal.bottom) {
      row.spinodalLow = curveAt(spinodal.left, u0);
      row.spinodalHigh = curveAt(spinodal.right, u0);
      if (phi > row.spinodalLow && phi < row.spinodalHigh) return 'gel-spinodal';
    }
    const binodal = tables.binodal;
    if (binodal !== null && u0 >= binodal.bottom) {
      row.binodalLow = curveAt(binodal.left, u0);
      row.binodalHigh = curveAt(binodal.right, u0);
      if (phi > row.binodalLow && phi < row.binodalHigh) return b2 <= parameters.gelB2Threshold ? 'gel-binodal' : 'separated';
    }
  }
  if (!belowGlass) return row.attractive ? 'glass-attractive' : 'glass-repulsive';
  row.freezing = curveAt(tables.freezing, u0);
  if (phi > row.freezing) {
    if (crystalSuppressed) return 'fluid-suppressed';
    row.melting = curveAt(tables.melting, u0);
    return phi < row.melting ? 'crystal-coexistence' : 'crystal';
  }
  return 'fluid';
}
