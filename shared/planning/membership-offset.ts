import { classifyPoint, type AttractionInput, type StateMap } from '../physics';
import type { GoalState } from '../states';

/** Bisection steps on the bracket of the nearest change: resolves the offset to reach/256. */
const BISECTIONS = 7;
/** The classifier's limits for the attraction shift (resolveClassifierParameters). */
const SHIFT_LIMIT = 20;

/**
 * Signed distance in B2* from a composition to the edge of the target state along the attraction
 * axis: the smallest |δ| for which classifying with the attraction shift ŝ + δ (so B2*_effective
 * moves by −δ) changes whether the predicted state is the target; positive when the composition is
 * in the target state at ŝ. This is the quantity the calibration's logistic is written in (the B2*
 * distance to the boundary, fitGelBoundary), so targetProbability can turn it into a chance.
 *
 * Search: membership at ŝ ± reach/2 and ŝ ± reach; the first bracket where it changes, on the
 * nearer side, is bisected to reach/256. A composition whose membership is the same at ŝ − reach,
 * ŝ and ŝ + reach is taken not to change within the reach (a sliver of another state narrower
 * than the reach can be missed; the plan only needs the compositions near a boundary).
 *
 * @param map the map, classified with parameter overrides (classifyPoint).
 * @param centre ŝ, the fitted shift; reach > 0 in B2* units (shifts stay within ±20).
 * @returns the signed offset, or null when membership does not change within ±reach.
 * @example membershipOffset(map, { phi: 0.2, attraction: { kind: 'b2', value: -2.2 } }, 'gel', 0, 1.2)
 */
export function membershipOffset(map: StateMap, point: { phi: number; attraction: AttractionInput }, target: GoalState, centre: number, reach: number): number | null {
  if (!(reach > 0)) throw new RangeError(`membershipOffset: reach must be positive; got ${reach}`);
  const member = (delta: number) => classifyPoint(map, point, { attractionShift: clampShift(centre + delta) }).state === target;
  const inside = classifyPoint(map, point, centre === map.parameters.attractionShift ? undefined : { attractionShift: clampShift(centre) }).state === target;
  const below = member(-reach) !== inside;
  const above = member(reach) !== inside;
  if (!below && !above) return null;
  const half = reach / 2;
  // Nearest bracket on each side: [0, reach/2] when the membership already changed at reach/2.
  const bracket = (sign: 1 | -1, changesAtEnd: boolean): [number, number] | null => {
    if (member(sign * half) !== inside) return [0, half];
    return changesAtEnd ? [half, reach] : null;
  };
  const upper = bracket(1, above);
  const lower = bracket(-1, below);
  const refine = (sign: 1 | -1, [low, high]: [number, number]) => {
    for (let k = 0; k < BISECTIONS; k++) {
      const middle = 0.5 * (low + high);
      if (member(sign * middle) !== inside) high = middle;
      else low = middle;
    }
    return 0.5 * (low + high);
  };
  let nearest = Infinity;
  if (upper && (!lower || upper[0] <= lower[0])) nearest = Math.min(nearest, refine(1, upper));
  if (lower && (!upper || lower[0] <= upper[0])) nearest = Math.min(nearest, refine(-1, lower));
  return inside ? nearest : -nearest;
}

function clampShift(shift: number): number {
  return Math.max(-SHIFT_LIMIT, Math.min(SHIFT_LIMIT, shift));
}
