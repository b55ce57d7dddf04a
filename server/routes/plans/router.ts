import { idParamSchema } from '../../../shared/schemas/common';
import { planExperimentRecipesSchema, planInputSchema, planListQuerySchema, planRecipesSchema } from '../../../shared/schemas/plans';
import { route } from '../../http/route';
import { presentPage } from '../../presenters/page';
import { presentPlan, presentPlanSummary } from '../../presenters/plan';
import { presentRecipe } from '../../presenters/recipe';
import { presentShortlist } from '../../presenters/shortlist';
import { makePlanRecipes, sendExperimentsToBench } from '../../services/plan-recipes';
import { listPlans, loadPlan, runPlan } from '../../services/plans';

export const planRoutes = [
  route({
    method: 'get',
    path: '/api/plans',
    access: 'data.read',
    summary: "A programme's plans, newest first",
    query: planListQuerySchema,
    async handler({ query }) {
      const { rows, count, counts } = await listPlans(query);
      return { body: presentPage(query, rows.map((p) => presentPlanSummary(p, counts.get(p.id) ?? 0)), count) };
    },
  }),
  route({
    method: 'get',
    path: '/api/plans/:id',
    access: 'data.read',
    summary: 'One plan: what was asked, the model, the candidates, advice, next experiments and the recipes made from it',
    params: idParamSchema,
    async handler({ params }) {
      return { body: { plan: presentPlan(await loadPlan(params.id, null)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/plans',
    access: 'plans.write',
    summary: 'Run the planner for a target state and store the plan',
    body: planInputSchema,
    // The planner runs outside any transaction; the service writes the plan in one of its own.
    transactional: false,
    async handler(ctx) {
      return { status: 201, body: { plan: presentPlan(await runPlan(ctx, ctx.body)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/plans/:id/recipes',
    access: 'plans.write',
    summary: 'Turn chosen candidates into recipes, optionally onto a new or existing draft shortlist, in one transaction',
    params: idParamSchema,
    body: planRecipesSchema,
    async handler(ctx) {
      const { recipes, shortlist } = await makePlanRecipes(ctx, ctx.params.id, ctx.body);
      return { status: 201, body: { recipes: recipes.map((r) => presentRecipe(r)), shortlist: shortlist ? presentShortlist(shortlist) : null } };
    },
  }),
  route({
    method: 'post',
    path: '/api/plans/:id/next-experiments/recipes',
    access: 'plans.write',
    summary: 'Send proposed next experiments to the bench as draft recipes with a note',
    params: idParamSchema,
    body: planExperimentRecipesSchema,
    async handler(ctx) {
      const { recipes } = await sendExperimentsToBench(ctx, ctx.params.id, ctx.body);
      return { status: 201, body: { recipes: recipes.map((r) => presentRecipe(r)) } };
    },
  }),
];
