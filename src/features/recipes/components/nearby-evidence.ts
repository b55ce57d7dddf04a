import type { MapObservation, MapRecipe } from '@shared/views/map-points';
import type { RecipeDerived } from '@shared/views/recipe';

export interface NearbyEvidence {
  recipes: number;
  collapsed: { code: string; ageDays: number }[];
  /** Gel observations at 30 days or older that had not collapsed. */
  heldGels: number;
}

/** How close "nearby" is: within this much φ, and within this much B2* (or 20 % of it). */
export const NEARBY = { phi: 0.06, b2: 1.5, b2Relative: 0.2 };

/**
 * The team's own ageing evidence near a recipe: observations of other recipes of the programme
 * within NEARBY of its φ and B2* (the map's universal attraction coordinate). A nearness rule
 * of our own, stated on screen; not a published criterion.
 */
export function nearbyEvidence(recipeId: number, derived: RecipeDerived, overlay: { recipes: readonly MapRecipe[]; observations: readonly MapObservation[] }): NearbyEvidence {
  const near = new Set<number>();
  for (const { id, phi, reducedB2: b2 } of overlay.recipes) {
    if (id === recipeId || phi === null || b2 === null || derived.reducedB2 === null) continue;
    const b2Window = Math.max(NEARBY.b2, Math.abs(derived.reducedB2) * NEARBY.b2Relative);
    if (Math.abs(phi - derived.phi) <= NEARBY.phi && Math.abs(b2 - derived.reducedB2) <= b2Window) near.add(id);
  }
  const collapsed: NearbyEvidence['collapsed'] = [];
  let heldGels = 0;
  for (const o of overlay.observations) {
    if (o.recipeId === null || !near.has(o.recipeId)) continue;
    if (o.observedState === 'collapsed') collapsed.push({ code: o.recipeCode ?? '', ageDays: o.ageDays });
    if (o.observedState === 'gel' && o.ageDays >= 30) heldGels++;
  }
  return { recipes: near.size, collapsed: collapsed.sort((a, b) => a.ageDays - b.ageDays), heldGels };
}
