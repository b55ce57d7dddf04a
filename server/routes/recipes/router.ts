import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/common';
import { recipeInputSchema, recipeListQuerySchema } from '../../../shared/schemas/recipes';
import { route } from '../../http/route';
import { presentPage } from '../../presenters/page';
import { presentRecipe } from '../../presenters/recipe';
import { createRecipe, listRecipes, loadRecipe, observationCounts, setRecipeArchived, updateRecipe } from '../../services/recipes';

export const recipeRoutes = [
  route({
    method: 'get',
    path: '/api/recipes',
    access: 'data.read',
    summary: 'Recipes with filters (programme, predicted state, text), sort and paging',
    query: recipeListQuerySchema,
    async handler({ query }) {
      const { rows, count } = await listRecipes(query);
      const counts = await observationCounts(rows.map((r) => r.id));
      return { body: presentPage(query, rows.map((r) => presentRecipe(r, { observationCount: counts.get(r.id) ?? 0 })), count) };
    },
  }),
  route({
    method: 'get',
    path: '/api/recipes/code/:code',
    access: 'data.read',
    summary: 'One recipe by its code',
    params: z.object({ code: z.string().trim().toUpperCase().regex(/^[A-Z]{2,5}-\d{4,6}$/, 'code looks like HB-0012') }),
    async handler({ params }) {
      const recipe = await loadRecipe({ code: params.code });
      const counts = await observationCounts([recipe.id]);
      return { body: { recipe: presentRecipe(recipe, { observationCount: counts.get(recipe.id) ?? 0 }) } };
    },
  }),
  route({
    method: 'get',
    path: '/api/recipes/:id',
    access: 'data.read',
    summary: 'One recipe',
    params: idParamSchema,
    async handler({ params }) {
      const recipe = await loadRecipe({ id: params.id });
      const counts = await observationCounts([recipe.id]);
      return { body: { recipe: presentRecipe(recipe, { observationCount: counts.get(recipe.id) ?? 0 }) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/recipes',
    access: 'recipes.write',
    summary: 'Create a recipe; the server derives its parameters and prediction',
    body: recipeInputSchema,
    async handler(ctx) {
      return { status: 201, body: { recipe: presentRecipe(await createRecipe(ctx, ctx.body)) } };
    },
  }),
  route({
    method: 'put',
    path: '/api/recipes/:id',
    access: 'recipes.write',
    summary: 'Replace a recipe; the derived parameters are computed again',
    params: idParamSchema,
    body: recipeInputSchema,
    async handler(ctx) {
      return { body: { recipe: presentRecipe(await updateRecipe(ctx, ctx.params.id, ctx.body)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/recipes/:id/archive',
    access: 'recipes.write',
    summary: 'Archive a recipe (it stays on record and on its shortlists)',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { recipe: presentRecipe(await setRecipeArchived(ctx, ctx.params.id, true)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/recipes/:id/restore',
    access: 'recipes.write',
    summary: 'Bring a recipe back from the archive',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { recipe: presentRecipe(await setRecipeArchived(ctx, ctx.params.id, false)) } };
    },
  }),
];
