import type { ObservedState, PredictedState } from '@shared/states';
import type { MapPoints } from '@shared/views/team-data';
import type { MapPoint } from './types';

/** The drawn y of a point from its coordinates, and the recipe it belongs to (null for ad-hoc samples). */
export type PointY = (row: { reducedB2: number | null; inverseTau: number | null; contactEnergyKT: number | null; polymerReservoir: number | null }, recipeId: number | null) => number | null;

function columns<T extends readonly string[]>(names: T, row: unknown[]) {
  return Object.fromEntries(names.map((name, i) => [name, row[i]])) as Record<T[number], unknown>;
}

/**
 * Turns the API's columnar overlay into drawable points for one y axis; points without a
 * coordinate on that axis (e.g. no polymer on a polymer axis) are left out and counted.
 */
export function projectPoints(data: MapPoints, yOf: PointY, filter: { minAge: number | null; maxAge: number | null }) {
  const points: MapPoint[] = [];
  let skipped = 0;
  for (const row of data.recipes.rows) {
    const r = columns(data.recipes.columns, row);
    const y = yOf(r as never, r.id as number);
    if (y === null || !Number.isFinite(y) || r.phi === null) {
      skipped++;
      continue;
    }
    const predicted = r.predictedState as PredictedState | null;
    points.push({ key: `r${r.id}`, kind: 'recipe', id: r.id as number, x: r.phi as number, y, state: (predicted ?? 'unclear') as ObservedState, predicted, agrees: null, code: r.code as string, name: r.name as string, ageDays: null, recipeId: r.id as number, margin: r.margin as number | null });
  }
  // Observations of a recipe share its coordinates (the API sends them once, on the recipe).
  const recipeCoordinates = new Map<number, Record<string, unknown>>();
  for (const row of data.recipes.rows) {
    const r = columns(data.recipes.columns, row);
    recipeCoordinates.set(r.id as number, r);
  }
  for (const row of data.observations.rows) {
    const listed = columns(data.observations.columns, row);
    const from = listed.recipeId !== null ? recipeCoordinates.get(listed.recipeId as number) : undefined;
    const o = from ? { ...listed, phi: from.phi, reducedB2: from.reducedB2, inverseTau: from.inverseTau, contactEnergyKT: from.contactEnergyKT, polymerReservoir: from.polymerReservoir } : listed;
    const age = o.ageDays as number;
    if ((filter.minAge !== null && age < filter.minAge) || (filter.maxAge !== null && age > filter.maxAge)) continue;
    const y = yOf(o as never, o.recipeId as number | null);
    if (y === null || !Number.isFinite(y) || o.phi === null) {
      skipped++;
      continue;
    }
    points.push({ key: `o${o.id}`, kind: 'observation', id: o.id as number, x: o.phi as number, y, state: o.observedState as ObservedState, predicted: o.predictedState as PredictedState | null, agrees: o.agrees as boolean | null, code: o.recipeCode as string | null, name: null, ageDays: age, recipeId: o.recipeId as number | null, margin: null });
  }
  return { points, skipped };
}
