import { observationAgrees, type ObservedState, type PredictedState } from '../states';

/**
 * Map overlay for a programme, columnar so 10,000 points stay small. Recipes carry their
 * coordinates in every attraction description the map can show (null where not defined).
 * An observation of a recipe is sent as its first four columns only (id, recipe, observed state,
 * age): it sits where its recipe sits and shares its prediction and code. Only an ad-hoc
 * observation (recipeId null) carries every column. `decodeMapObservations` rebuilds the full
 * records.
 */
export interface MapPoints {
  programmeId: number;
  recipes: {
    columns: readonly ['id', 'code', 'name', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'sizeRatio', 'predictedState', 'margin'];
    rows: (string | number | null)[][];
  };
  observations: {
    columns: readonly ['id', 'recipeId', 'observedState', 'ageDays', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'predictedState'];
    rows: (string | number | null)[][];
  };
}

export const MAP_RECIPE_COLUMNS = ['id', 'code', 'name', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'sizeRatio', 'predictedState', 'margin'] as const;
export const MAP_OBSERVATION_COLUMNS = ['id', 'recipeId', 'observedState', 'ageDays', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'predictedState'] as const;

export interface MapRecipe {
  id: number; code: string; name: string;
  phi: number | null; reducedB2: number | null; inverseTau: number | null; contactEnergyKT: number | null; polymerReservoir: number | null; sizeRatio: number | null;
  predictedState: PredictedState | null; margin: number | null;
}

/** An observation with everything the map shows of it, its recipe's coordinates filled in. */
export interface MapObservation {
  id: number; recipeId: number | null; recipeCode: string | null; observedState: ObservedState; ageDays: number;
  phi: number | null; reducedB2: number | null; inverseTau: number | null; contactEnergyKT: number | null; polymerReservoir: number | null;
  predictedState: PredictedState | null; agrees: boolean | null;
}

function named<T>(columns: readonly string[], row: readonly unknown[]): T {
  const record: Record<string, unknown> = {};
  for (let i = 0; i < columns.length; i++) record[columns[i]] = row[i] ?? null;
  return record as T;
}

export function decodeMapRecipes(data: MapPoints): MapRecipe[] {
  return data.recipes.rows.map((row) => named<MapRecipe>(data.recipes.columns, row));
}

/**
 * The overlay's observations as full records: one of a recipe takes the recipe's coordinates,
 * prediction and code (an observation of a recipe that is not in the overlay keeps nulls);
 * agreement is worked out as the server's lists do, with `observationAgrees`.
 */
export function decodeMapObservations(data: MapPoints, recipes: readonly MapRecipe[] = decodeMapRecipes(data)): MapObservation[] {
  const byId = new Map(recipes.map((r) => [r.id, r]));
  return data.observations.rows.map((row) => {
    const o = named<Omit<MapObservation, 'recipeCode' | 'agrees'>>(data.observations.columns, row);
    const recipe = o.recipeId !== null ? byId.get(o.recipeId) : undefined;
    const filled = recipe
      ? { ...o, phi: recipe.phi, reducedB2: recipe.reducedB2, inverseTau: recipe.inverseTau, contactEnergyKT: recipe.contactEnergyKT, polymerReservoir: recipe.polymerReservoir, predictedState: recipe.predictedState }
      : o;
    return { ...filled, recipeCode: recipe?.code ?? null, agrees: observationAgrees(filled.observedState, filled.predictedState) };
  });
}
