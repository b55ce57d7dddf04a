/**
 * Recipes. Other features list and read recipes with these queries (one key factory for every
 * recipe list and detail) and refresh them with recipeKeys.
 */
export { recipeKeys, type RecipeFilters } from './api/recipe-keys';
export { recipesQueryOptions, useRecipes } from './api/get-recipes';
export { recipeQueryOptions, useRecipe } from './api/get-recipe';
