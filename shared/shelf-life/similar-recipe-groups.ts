/** A recipe as the grouping rule sees it: its materials and its place on the map. */
export interface RecipeOnMap<Id extends string | number = number> {
  id: Id;
  particleId: string | number;
  /** null for a recipe without depletant (salt- or temperature-driven attraction). */
  depletantId: string | number | null;
  solventId: string | number;
  /** φ / φ_cp: the map's normalised x (planning's mapPosition). */
  x: number;
  /** Normalised attraction, 0 at the map's weakest and 1 at its strongest (mapPosition's u). */
  u: number;
}

/** Default map distance within which two recipes of the same materials count as similar. */
export const SIMILAR_RECIPE_DISTANCE = 0.05;

/**
 * Groups of "similar recipes", whose shelf-life records are pooled into one survival curve.
 *
 * The rule: two recipes are neighbours when they use the same particle system, the same depletant
 * (or both none) and the same solvent, and lie within `distance` of each other on the map in
 * normalised coordinates (x = φ/φ_cp, u = normalised attraction; Euclidean distance, the metric of
 * the map's margins). Groups are the connected sets of neighbours (single linkage): the result
 * does not depend on the order of the input, and a chain of close recipes forms one group even if
 * its ends lie further apart than `distance`. The default 0.05 is a twentieth of the map, the
 * distance the planner already treats as "near" bench evidence (planning's NEAR_EVIDENCE_DISTANCE).
 * Salt concentration and temperature enter only through the map position.
 *
 * Cost: cells of side `distance` in a hash, so each recipe is compared only with the nine cells
 * around it; O(n) for recipes spread over the map.
 *
 * Limits: distance ≥ 0 and finite; x and u finite; ids unique.
 * @throws RangeError for a bad distance, a non-finite position or a repeated id (naming it)
 * @returns groups of ids, each in input order, groups ordered by their first member; a recipe with
 *   no neighbour is a group of one
 * @example similarRecipeGroups([
 *   { id: 1, particleId: 7, depletantId: 3, solventId: 1, x: 0.20, u: 0.50 },
 *   { id: 2, particleId: 7, depletantId: 3, solventId: 1, x: 0.23, u: 0.53 },
 *   { id: 3, particleId: 7, depletantId: null, solventId: 1, x: 0.20, u: 0.50 },
 * ]) // [[1, 2], [3]]
 */
export function similarRecipeGroups<Id extends string | number>(recipes: readonly RecipeOnMap<Id>[], options: { distance?: number } = {}): Id[][] {
  const distance = options.distance ?? SIMILAR_RECIPE_DISTANCE;
  if (!(Number.isFinite(distance) && distance >= 0)) throw new RangeError(`similarRecipeGroups: distance must be finite and ≥ 0, got ${distance}`);
  const seen = new Set<Id>();
  recipes.forEach((recipe) => {
    if (!(Number.isFinite(recipe.x) && Number.isFinite(recipe.u))) throw new RangeError(`similarRecipeGroups: recipe ${recipe.id} has a non-finite map position (${recipe.x}, ${recipe.u})`);
    if (seen.has(recipe.id)) throw new RangeError(`similarRecipeGroups: recipe ${recipe.id} appears twice`);
    seen.add(recipe.id);
  });
  const parent = recipes.map((_, index) => index);
  const root = (index: number): number => {
    while (parent[index] !== index) index = parent[index] = parent[parent[index]];
    return index;
  };
  const join = (a: number, b: number) => {
    const [ra, rb] = [root(a), root(b)];
    if (ra !== rb) parent[Math.max(ra, rb)] = Math.min(ra, rb);
  };
  // A cell of side `distance` (or 1 when distance is 0: then only identical positions join).
  const cellSize = distance > 0 ? distance : 1;
  const cells = new Map<string, number[]>();
  const limit2 = distance * distance;
  recipes.forEach((recipe, index) => {
    const materials = materialsKey(recipe);
    const cx = Math.floor(recipe.x / cellSize);
    const cu = Math.floor(recipe.u / cellSize);
    for (let dx = -1; dx <= 1; dx++) {
      for (let du = -1; du <= 1; du++) {
        for (const other of cells.get(`${materials}|${cx + dx}|${cu + du}`) ?? []) {
          const d2 = (recipes[other].x - recipe.x) ** 2 + (recipes[other].u - recipe.u) ** 2;
          if (d2 <= limit2) join(index, other);
        }
      }
    }
    const key = `${materials}|${cx}|${cu}`;
    const cell = cells.get(key);
    if (cell) cell.push(index);
    else cells.set(key, [index]);
  });
  const groups = new Map<number, Id[]>();
  recipes.forEach((recipe, index) => {
    const r = root(index);
    const group = groups.get(r);
    if (group) group.push(recipe.id);
    else groups.set(r, [recipe.id]);
  });
  return [...groups.values()];
}

function materialsKey(recipe: RecipeOnMap<string | number>): string {
  // JSON keeps 7 and "7" apart and null apart from "null".
  return JSON.stringify([recipe.particleId, recipe.depletantId, recipe.solventId]);
}
