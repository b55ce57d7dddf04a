import { useMemo } from 'react';
import type { StateMap } from '@shared/physics/map/types';
import { pickRecipeMaterials } from '@shared/pick-recipe-materials';
import { recipeStateMap } from '@shared/recipe-derivation';
import type { RecipeInput } from '@shared/schemas/recipes';
import type { RecipeView } from '@shared/views/recipe';
import { useLiveMaterials } from '@/features/library';

/** A stored recipe as the editor's input (what PUT /api/recipes/:id takes). */
export function recipeAsInput(recipe: RecipeView): RecipeInput {
  return {
    programmeId: recipe.programmeId,
    name: recipe.name,
    particleId: recipe.particleId,
    solventId: recipe.solventId,
    fraction: recipe.fraction,
    temperatureC: recipe.temperatureC,
    attraction: recipe.attraction,
    notes: recipe.notes ?? undefined,
  };
}

/** The map a stored recipe is predicted on, rebuilt in the browser from the same library rows. */
export function useRecipeMap(recipe: RecipeView | undefined): StateMap | null {
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  const depletants = useLiveMaterials('depletants');
  const salts = useLiveMaterials('salts');
  return useMemo(() => {
    if (!recipe || !particles.data || !solvents.data || !depletants.data || !salts.data) return null;
    const byId = <M extends { id: number }>(rows: M[]) => (id: number) => rows.find((m) => m.id === id);
    const picked = pickRecipeMaterials(recipe, { particle: byId(particles.data), solvent: byId(solvents.data), depletant: byId(depletants.data), salt: byId(salts.data) });
    if ('missing' in picked) return null;
    try {
      return recipeStateMap(recipeAsInput(recipe), picked);
    } catch {
      return null;
    }
  }, [recipe, particles.data, solvents.data, depletants.data, salts.data]);
}
