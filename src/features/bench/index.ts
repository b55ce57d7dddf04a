/**
 * The bench: observations and the checks that are due. Other features read a recipe's outcomes
 * with these queries and refresh after a change with these keys; the bench log screen is BenchScreen.
 */
export { observationKeys, type ObservationFilters, type ObservationListQuery } from './api/observation-keys';
export { dueCheckKeys } from './api/due-check-keys';
export { recentRecipeObservationsQueryOptions, useRecentRecipeObservations, recipeObservationsQueryOptions, useRecipeObservations } from './api/get-recipe-observations';
export { observationsChanged } from './api/observations-changed';
export { BenchScreen } from './components/bench-screen';
