import { quadtree } from 'd3-quadtree';
import { observationAgrees, type GoalState } from '../states';
import type { PlacedEvidence } from './place-evidence';
import type { NearestEvidence } from './types';

/**
 * A nearest-observation finder over placed bench evidence: the same answer as nearestEvidence
 * (Euclidean distance in normalised map units; a gel that later collapsed is not a gel), from a
 * quadtree (d3-quadtree) so that thousands of compositions ask in O(log n) each instead of
 * scanning every observation. With `within`, only observations closer than that are looked for
 * (null when there is none), which is faster still.
 * @example evidenceIndex(placed, 'gel')(0.3, 0.5)?.label
 */
export function evidenceIndex(placed: readonly PlacedEvidence[], target: GoalState): (x: number, u: number, within?: number) => NearestEvidence | null {
  if (placed.length === 0) return () => null;
  const tree = quadtree<PlacedEvidence>().x((p) => p.x).y((p) => p.u).addAll(placed as PlacedEvidence[]);
  return (x, u, within) => {
    const found = tree.find(x, u, within);
    if (!found) return null;
    return { id: found.id, label: found.label, observedState: found.observedState, ageDays: found.ageDays, distance: Math.hypot(found.x - x, found.u - u), agrees: observationAgrees(found.observedState, target) === true };
  };
}
