import type { PlanRecipeRef, PlanSummaryView, PlanView } from '../../shared/views/plan';
import type { Plan, User } from '../models';
import type { LoadedPlan } from '../models/plan';

const person = (u: User | null | undefined) => (u ? { id: u.id, name: u.name } : null);

/** A stored plan with the recipes made from it marked on its candidates and experiments. */
export function presentPlan(plan: LoadedPlan): PlanView {
  const recipes: PlanRecipeRef[] = (plan.made ?? [])
    .filter((m) => m.recipe)
    .map((m) => ({ recipeId: m.recipeId, code: m.recipe!.code, name: m.recipe!.name, kind: m.kind, index: m.itemIndex }))
    .sort((a, b) => (a.kind === b.kind ? a.index - b.index : a.kind === 'candidate' ? -1 : 1));
  const madeFrom = (kind: PlanRecipeRef['kind'], index: number) => {
    const ref = recipes.find((r) => r.kind === kind && r.index === index);
    return ref ? { id: ref.recipeId, code: ref.code } : null;
  };
  const stored = plan.outcome;
  return {
    id: plan.id,
    programmeId: plan.programmeId,
    title: plan.title,
    targetState: plan.targetState,
    source: plan.attractionSource,
    inputs: plan.inputs,
    materials: stored.materials,
    prices: stored.prices,
    levelUnit: stored.levelUnit,
    modelVersion: plan.modelVersion,
    calibration: stored.calibration,
    uncertainty: stored.uncertainty,
    map: stored.map,
    outcome: {
      ...stored.outcome,
      candidates: stored.outcome.candidates.map((c) => ({ ...c, recipe: madeFrom('candidate', c.index) })),
      experiments: { ...stored.outcome.experiments, items: stored.outcome.experiments.items.map((e) => ({ ...e, recipe: madeFrom('experiment', e.index) })) },
    },
    recipes,
    createdBy: person(plan.creator),
    createdAt: plan.createdAt.toISOString(),
  };
}

export function presentPlanSummary(plan: Plan & { creator?: User | null }, recipeCount: number): PlanSummaryView {
  return {
    id: plan.id,
    programmeId: plan.programmeId,
    title: plan.title,
    targetState: plan.targetState,
    source: plan.attractionSource,
    feasible: plan.feasible,
    candidateCount: plan.candidateCount,
    recipeCount,
    calibrationId: plan.calibrationId,
    createdBy: person(plan.creator),
    createdAt: plan.createdAt.toISOString(),
  };
}
