import { PhysicsArgumentError, type StateMap } from '../physics';
import { recipeStateMap, type RecipeMaterials } from '../recipe-derivation';
import type { RecipeInput } from '../schemas/recipes';
import { cachedStateMap } from '../state-map-cache';
import { OBSERVED_STATES, type ObservedState } from '../states';
import type { CalibrationObservation } from './types';

/** A live recipe of the programme as a fit needs it: its composition (for its map) and where it sits. */
export interface RecipeForFit {
  id: number;
  input: RecipeInput;
  /** Plain library rows; null when one is missing (the recipe's observations cannot be placed). */
  materials: RecipeMaterials | null;
  phi: number | null;
  reducedB2: number | null;
}

/**
 * The programme's live observations as columns (typed arrays): what the request thread reads and
 * hands to a fit worker. Columns cost a copy of their bytes to pass to a worker; tens of
 * thousands of small objects cost the request thread a structured clone of each.
 */
export interface ObservationColumns {
  id: Int32Array;
  /** 0 for an ad-hoc composition (record ids start at 1). */
  recipeId: Int32Array;
  /** NaN where not recorded. */
  adhocPhi: Float64Array;
  adhocReducedB2: Float64Array;
  /** Index into OBSERVED_STATES. */
  state: Uint8Array;
}

export interface BenchForFit {
  recipes: RecipeForFit[];
  observations: ObservationColumns;
}

/** One observation as the database returns it. */
export interface ObservationRowForFit {
  id: number;
  recipeId: number | null;
  adhocPhi: number | null;
  adhocReducedB2: number | null;
  observedState: ObservedState;
}

const STATE_INDEX = new Map<ObservedState, number>(OBSERVED_STATES.map((s, i) => [s, i]));

/** Packs observation rows (read page by page) into columns. */
export function observationColumns(rows: readonly ObservationRowForFit[]): ObservationColumns {
  const n = rows.length;
  const columns: ObservationColumns = { id: new Int32Array(n), recipeId: new Int32Array(n), adhocPhi: new Float64Array(n), adhocReducedB2: new Float64Array(n), state: new Uint8Array(n) };
  rows.forEach((row, i) => {
    columns.id[i] = row.id;
    columns.recipeId[i] = row.recipeId ?? 0;
    columns.adhocPhi[i] = row.adhocPhi ?? Number.NaN;
    columns.adhocReducedB2[i] = row.adhocReducedB2 ?? Number.NaN;
    columns.state[i] = STATE_INDEX.get(row.observedState)!;
  });
  return columns;
}

const orNull = (value: number) => (Number.isNaN(value) ? null : value);

/**
 * The observations a fit reads: φ and B2* from the recipe's stored derivation (or the ad-hoc
 * composition), on the uncalibrated map the recipe is predicted on (recipeStateMap; null when its
 * physics refuses the composition) or, for ad-hoc compositions, the generic mean-field B2* map.
 * Observations of recipes not in `recipes` (archived ones) are not offered. Runs in the fit's
 * worker thread, where building the maps costs the request thread nothing.
 */
export function calibrationObservationsOf(bench: BenchForFit): CalibrationObservation[] {
  const recipes = new Map<number, { recipe: RecipeForFit; map: StateMap | null }>();
  for (const recipe of bench.recipes) {
    let map: StateMap | null = null;
    try {
      map = recipe.materials ? recipeStateMap(recipe.input, recipe.materials) : null;
    } catch (error) {
      if (!(error instanceof PhysicsArgumentError)) throw error;
    }
    recipes.set(recipe.id, { recipe, map });
  }
  const adhocMap = cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });
  const { id, recipeId, adhocPhi, adhocReducedB2, state } = bench.observations;
  const offered: CalibrationObservation[] = [];
  for (let i = 0; i < id.length; i++) {
    const observedState = OBSERVED_STATES[state[i]];
    if (recipeId[i] === 0) {
      offered.push({ id: id[i], phi: orNull(adhocPhi[i]), reducedB2: orNull(adhocReducedB2[i]), observedState, map: adhocMap });
      continue;
    }
    const placed = recipes.get(recipeId[i]);
    if (!placed) continue;
    offered.push({ id: id[i], phi: placed.recipe.phi, reducedB2: placed.recipe.reducedB2, observedState, map: placed.map });
  }
  return offered;
}
