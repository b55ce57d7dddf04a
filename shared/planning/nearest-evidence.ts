import { observationAgrees, type GoalState } from '../states';
import type { PlacedEvidence } from './place-evidence';
import type { NearestEvidence } from './types';

/** Observations closer than this (normalised map units: a twentieth of the map) count as near. */
export const NEAR_EVIDENCE_DISTANCE = 0.05;

/**
 * The bench observation nearest a point (x, u) in normalised map coordinates, by Euclidean
 * distance (the margin's metric), and whether it showed the target state. A gel that later
 * collapsed does not count as a gel: the target is a state that lasts.
 * A linear scan: a programme holds hundreds of observations, and only shortlisted compositions ask.
 * @returns null when there are no observations.
 * @example nearestEvidence(0.3, 0.5, placed, 'gel')?.distance
 */
export function nearestEvidence(x: number, u: number, placed: readonly PlacedEvidence[], target: GoalState): NearestEvidence | null {
  let best: PlacedEvidence | null = null;
  let best2 = Infinity;
  for (const item of placed) {
    const d2 = (item.x - x) ** 2 + (item.u - u) ** 2;
    if (d2 < best2) {
      best2 = d2;
      best = item;
    }
  }
  if (!best) return null;
  return { id: best.id, label: best.label, observedState: best.observedState, ageDays: best.ageDays, distance: Math.sqrt(best2), agrees: observationAgrees(best.observedState, target) === true };
}
