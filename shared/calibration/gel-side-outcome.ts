import type { ObservedState } from '../states';

/**
 * The binary outcome the calibration models: 1 when the bench saw the gel side of the gel
 * boundary, 0 when it saw the other side, null when the observation says nothing.
 * - `gel` → 1; `collapsed` → 1: a collapsed sample is a gel that compacted under its own weight
 *   as it aged (shared/states), so it formed on the gel side.
 * - `fluid`, `separated`, `crystal`, `glass` → 0: the sample did not arrest into a network.
 * - `unclear` → null: left out.
 *
 * @example gelSideOutcome('collapsed') // 1
 */
export function gelSideOutcome(state: ObservedState): 0 | 1 | null {
  if (state === 'unclear') return null;
  return state === 'gel' || state === 'collapsed' ? 1 : 0;
}
