/**
 * The state map. Other features read the programme's overlay with these and refresh it with
 * mapPointKeys; the small maps (a recipe's, a plan's, a shortlist's) are drawn by these components.
 */
export { mapPointKeys, mapPointsQueryOptions, useMapPoints } from './api/get-map-points';
export { PlanMap } from './components/plan-map';
export { RecipesMap } from './components/recipes-map';
export { RecipeMiniMap } from './components/recipe-mini-map';
