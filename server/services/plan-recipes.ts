import type { PlanExperimentRecipesInput, PlanRecipesInput } from '../../shared/schemas/plans';
import type { ShortlistInput } from '../../shared/schemas/shortlists';
import { STATE_LABELS } from '../../shared/states';
import { plannedRecipeInput } from '../../shared/planning';
import type { PlanCandidateView, PlanExperimentView } from '../../shared/views/plan';
import { badRequest, conflict, HttpError } from '../errors';
import type { HandlerContext } from '../http/route';
import { PlanRecipe, Recipe, type ShortlistItem } from '../models';
import { createRecipe } from './recipes';
import { createShortlist, loadShortlist, updateShortlist } from './shortlists';
import type { LoadedPlan } from '../models/plan';
import { loadPlan, planTemplate } from './plans';

type Ctx = HandlerContext<unknown, unknown, unknown>;

const round = (value: number, digits = 3) => Number(value.toPrecision(digits)).toString();
const doseText = (level: number, unit: string) => `${round(level)} ${unit}`;

/** The chosen items of a plan, or a 400 naming the list entry that points at nothing; a 409 for one already made. */
async function chosenItems<T extends { index: number }>(ctx: Ctx, plan: LoadedPlan, kind: 'candidate' | 'experiment', field: 'candidates' | 'experiments', indices: number[], items: T[]) {
  const chosen = indices.map((index, k) => {
    const item = items.find((i) => i.index === index);
    if (!item) throw badRequest(`${field}.${k}: plan ${plan.id} has no ${kind} ${index}`, `${field}.${k}`);
    return item;
  });
  const made = await PlanRecipe.findAll({ where: { planId: plan.id, kind }, include: [{ model: Recipe, as: 'recipe', attributes: ['code'] }], transaction: ctx.transaction });
  for (const item of chosen) {
    const earlier = made.find((m) => m.itemIndex === item.index) as (PlanRecipe & { recipe?: Recipe }) | undefined;
    if (earlier) throw conflict(`${kind === 'candidate' ? 'Candidate' : 'Experiment'} ${item.index + 1} of this plan is already recipe ${earlier.recipe?.code ?? earlier.recipeId}`, { recipeId: earlier.recipeId });
  }
  return chosen;
}

/** Each composition becomes a recipe with origin `plan:<id>`, linked to the item it was. */
async function makeRecipes(ctx: Ctx, plan: LoadedPlan, kind: 'candidate' | 'experiment', items: { index: number; phi: number; level: number; name: string; notes: string }[]) {
  const template = planTemplate(plan.inputs);
  const recipes = [];
  for (const item of items) {
    const recipe = await createRecipe(ctx, plannedRecipeInput(template, item.phi, item.level, item.name.slice(0, 120), item.notes), `plan:${plan.id}`);
    await PlanRecipe.create({ planId: plan.id, recipeId: recipe.id, kind, itemIndex: item.index }, { transaction: ctx.transaction });
    recipes.push(recipe);
  }
  return recipes;
}

const candidateSummary = (c: PlanCandidateView, unit: string) =>
  `predicted ${STATE_LABELS[c.predictedState].toLowerCase()} with margin ${round(c.margin, 2)} at φ ${c.phi.toFixed(3)}, ${doseText(c.level, unit)}; about ${round(c.costPerLitre.total, 3)} per litre in materials.`;
const candidateReason = (planId: number, c: PlanCandidateView, unit: string) => `From plan ${planId}: ${candidateSummary(c, unit)}`;

/**
 * Turns chosen candidates of a plan into recipes (origin `plan:<id>`) and, when asked, puts them
 * on a new draft shortlist or appends them to an existing draft one — all in the route's one
 * transaction, so either every recipe and the shortlist change are saved or nothing is.
 */
export async function makePlanRecipes(ctx: Ctx, planId: number, input: PlanRecipesInput) {
  const plan = await loadPlan(planId, ctx.transaction, true);
  const stored = plan.outcome;
  const unit = stored.levelUnit;
  const chosen = await chosenItems(ctx, plan, 'candidate', 'candidates', input.candidates, stored.outcome.candidates);
  const recipes = await makeRecipes(ctx, plan, 'candidate', chosen.map((c) => ({
    index: c.index, phi: c.phi, level: c.level,
    name: `${STATE_LABELS[plan.targetState]} candidate ${c.index + 1}: φ ${c.phi.toFixed(3)}, ${doseText(c.level, unit)}`,
    notes: `From plan ${plan.id} (${plan.title}), candidate ${c.index + 1}: ${candidateSummary(c, unit)} A prediction from approximate theory: test before relying on it.`,
  })));
  let shortlist = null;
  if (input.shortlist) {
    const items = recipes.map((r, k) => ({ recipeId: r.id, reason: candidateReason(plan.id, chosen[k], unit) }));
    if (input.shortlist.mode === 'new') {
      shortlist = await createShortlist(ctx, { programmeId: plan.programmeId, title: input.shortlist.title, purpose: input.shortlist.purpose ?? `Candidates from plan ${plan.id}: ${plan.title}`, targetState: plan.targetState, items });
    } else {
      const existing = (await loadShortlist(input.shortlist.shortlistId, ctx.transaction).catch((error) => {
        if (error instanceof HttpError && error.status === 404) throw badRequest('shortlist.shortlistId: no such shortlist', 'shortlist.shortlistId');
        throw error;
      })) as Awaited<ReturnType<typeof loadShortlist>> & { items?: ShortlistItem[] };
      if (existing.programmeId !== plan.programmeId) throw badRequest('shortlist.shortlistId: that shortlist belongs to another programme', 'shortlist.shortlistId');
      const kept = (existing.items ?? []).slice().sort((a, b) => a.position - b.position).map((i) => ({ recipeId: i.recipeId, reason: i.reason }));
      const replacement: ShortlistInput = { programmeId: existing.programmeId, title: existing.title, purpose: existing.purpose ?? undefined, targetState: existing.targetState, items: [...kept, ...items] };
      if (replacement.items.length > 100) throw badRequest('candidates: a shortlist holds at most 100 recipes', 'candidates');
      shortlist = await updateShortlist(ctx, existing.id, replacement);
    }
  }
  await ctx.audit({ action: 'plan.recipes_made', entityType: 'plan', entityId: plan.id, details: { candidates: input.candidates, recipes: recipes.map((r) => r.code), shortlistId: shortlist?.id ?? null } });
  return { recipes, shortlist };
}

/**
 * Sends proposed next experiments to the bench as draft recipes (origin `plan:<id>`), each with the
 * note given and a sentence on why it was chosen, in one transaction.
 */
export async function sendExperimentsToBench(ctx: Ctx, planId: number, input: PlanExperimentRecipesInput) {
  const plan = await loadPlan(planId, ctx.transaction, true);
  const stored = plan.outcome;
  const unit = stored.levelUnit;
  const target = STATE_LABELS[plan.targetState].toLowerCase();
  const chosen = await chosenItems(ctx, plan, 'experiment', 'experiments', input.experiments, stored.outcome.experiments.items);
  const why = (e: PlanExperimentView) =>
    `Next experiment ${e.index + 1} of plan ${plan.id}: on the edge of the ${target} region along the ${e.nearestBoundary.label}, where the model gives a ${Math.round(e.probability * 100)} % chance of ${target}. Mix it and record what the bench sees; the outcome narrows the boundary.`;
  const recipes = await makeRecipes(ctx, plan, 'experiment', chosen.map((e) => ({
    index: e.index, phi: e.phi, level: e.level,
    name: `Boundary probe ${e.index + 1}: φ ${e.phi.toFixed(3)}, ${doseText(e.level, unit)}`,
    notes: [input.note, why(e)].filter(Boolean).join('\n\n'),
  })));
  await ctx.audit({ action: 'plan.experiments_sent', entityType: 'plan', entityId: plan.id, details: { experiments: input.experiments, recipes: recipes.map((r) => r.code), note: input.note ?? null } });
  return { recipes };
}
