import type { ObservedState } from '@shared/states';
import type { MapObservation, MapRecipe } from '@shared/views/map-points';
import type { MapPoint } from './types';

/** The drawn y of a point from its coordinates, and the recipe it belongs to (null for ad-hoc samples). */
export type PointY = (row: { reducedB2: number | null; inverseTau: number | null; contactEnergyKT: number | null; polymerReservoir: number | null }, recipeId: number | null) => number | null;

/**
 * Turns the decoded overlay into drawable points for one y axis; points without a coordinate on
 * that axis (e.g. no polymer on a polymer axis) are left out and counted.
 */
export function projectPoints(overlay: { recipes: readonly MapRecipe[]; observations: readonly MapObservation[] }, yOf: PointY, filter: { minAge: number | null; maxAge: number | null }) {
  const points: MapPoint[] = [];
  let skipped = 0;
  for (const r of overlay.recipes) {
    const y = yOf(r, r.id);
    if (y === null || !Number.isFinite(y) || r.phi === null) {
      skipped++;
      continue;
    }
    const predicted = r.predictedState;
    points.push({ key: `r${r.id}`, kind: 'recipe', id: r.id, x: r.phi, y, state: (predicted ?? 'unclear') as ObservedState, predicted, agrees: null, code: r.code, name: r.name, ageDays: null, recipeId: r.id, margin: r.margin });
  }
  // Observations of a recipe share its coordinates (decoding filled them in from the recipe).
  for (const o of overlay.observations) {
    const age = o.ageDays;
    if ((filter.minAge !== null && age < filter.minAge) || (filter.maxAge !== null && age > filter.maxAge)) continue;
    const y = yOf(o, o.recipeId);
    if (y === null || !Number.isFinite(y) || o.phi === null) {
      skipped++;
      continue;
    }
    points.push({ key: `o${o.id}`, kind: 'observation', id: o.id, x: o.phi, y, state: o.observedState, predicted: o.predictedState, agrees: o.agrees, code: o.recipeCode, name: null, ageDays: age, recipeId: o.recipeId, margin: null });
  }
  return { points, skipped };
}
