import { bisect } from 'simple-statistics';
import { classifyPoint, highestGlassPhi, type StateMap } from '../physics';
import { strongestReducedB2 } from './strongest-reduced-b2';
import type { GelOnset } from './types';

/** Strongest attraction ever searched (B2*); a map's own top usually stops the search earlier. */
export const ONSET_SEARCH_LOWEST_B2 = -50;
/** B2* to which each onset is located. */
export const ONSET_TOLERANCE = 1e-7;

/**
 * Where a sample at volume fraction φ, moving toward stronger attraction at fixed φ, enters the
 * spinodal and the binodal of the map's theory — the two lines Gelwright's gel rule is built on
 * (physics.md §5) — as B2* of the theory frame (no attraction shift).
 *
 * Method: bisection (simple-statistics `bisect`) on the state classifyPoint gives at B2*, with the
 * rule's own thresholds set so that only one line counts: gelB2Threshold = −100 makes "gel" mean
 * "inside the spinodal"; gelB2Threshold = 1 makes it mean "inside the binodal". Both domes widen
 * monotonically toward stronger attraction in the mean-field, Percus–Yevick and free-volume
 * theories, so each state switches once along the search, between B2* = 1 and the top of the
 * map's tables (strongestReducedB2; above it the domes keep their top width).
 *
 * @param tolerance B2* to which each onset is located (default 1e-7; drawing needs far less)
 * @returns `{ spinodalB2, binodalB2 }`, each null when φ is outside that dome even at the
 *   strongest attraction searched, or where the glass line comes first (φ at or above the
 *   line's nose: no gel anywhere; beyond the attractive-glass line: no gel at that level).
 * @example gelOnset(meanFieldMap, 0.13).spinodalB2 // ≈ −1.65, the mean-field critical point
 */
export function gelOnset(map: StateMap, phi: number, tolerance = ONSET_TOLERANCE): GelOnset {
  if (!(phi > 0) || phi >= highestGlassPhi(map)) return { spinodalB2: null, binodalB2: null };
  const lowest = Math.max(ONSET_SEARCH_LOWEST_B2, strongestReducedB2(map));
  return { spinodalB2: entry(map, phi, -100, lowest, tolerance), binodalB2: entry(map, phi, 1, lowest, tolerance) };
}

function entry(map: StateMap, phi: number, gelB2Threshold: number, lowest: number, tolerance: number): number | null {
  const parameters = { attractionShift: 0, gelB2Threshold };
  const seen = new Map<number, number>();
  // +1 on the gel side, −1 off it; remembered, because bisect asks for some values twice.
  const side = (b2: number) => {
    let value = seen.get(b2);
    if (value === undefined) {
      value = classifyPoint(map, { phi, attraction: { kind: 'b2', value: b2 } }, parameters).state === 'gel' ? 1 : -1;
      seen.set(b2, value);
    }
    return value;
  };
  if (side(lowest) < 0) return null;
  if (side(1) > 0) return 1;
  return bisect(side, lowest, 1, 200, tolerance);
}
