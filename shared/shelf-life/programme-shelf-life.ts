import type { PredictedState } from '../states';
import { describeSurvival } from './describe-survival';
import { kaplanMeier } from './kaplan-meier';
import { medianTimeToCollapse } from './median-time-to-collapse';
import { similarRecipeGroups, SIMILAR_RECIPE_DISTANCE } from './similar-recipe-groups';
import { describePrediction, fitShelfLifeModel, modelMedianDays, type ShelfLifeModel, type ShelfLifeRecipeCovariates } from './shelf-life-model';
import type { MedianTimeToCollapse, SurvivalCurve, SurvivalRecord } from './types';

/** A live recipe of the programme as the analysis reads it. */
export interface ShelfLifeRecipeInput {
  id: number;
  code: string;
  name: string;
  particleId: number;
  depletantId: number | null;
  solventId: number;
  /** Normalised position on the programme's common map (x = φ/φ_cp, u); null when it cannot be placed. */
  position: { x: number; u: number } | null;
  /** The recipe's predicted state: the map region it lies in (null: not predicted). */
  region: PredictedState | null;
  covariates: ShelfLifeRecipeCovariates;
}

/** One sample of a recipe (one mixing date): collapsed at an age, or last seen standing. */
export interface ShelfLifeSampleInput extends SurvivalRecord {
  recipeId: number;
  /** Its fill height (mm), the latest recorded among its checks; absent or null when never recorded. */
  sampleHeightMm?: number | null;
}

export type ShelfLifeRegion = PredictedState | 'unpredicted';

/** A Kaplan–Meier curve with its median and its plain-words summary. */
export interface SurvivalSummary {
  curve: SurvivalCurve;
  median: MedianTimeToCollapse;
  /** describeSurvival's words, e.g. "no collapse seen in 4 samples up to 60 days". */
  summary: string;
}

export interface RecipeShelfLife extends SurvivalSummary {
  recipeId: number;
  code: string;
  name: string;
  /** Index into the analysis' own numbering of similar-recipe groups. */
  group: number;
  region: ShelfLifeRegion;
  /** What the programme's Cox model predicts for this recipe's covariates (null when the fit was refused). */
  predicted: { medianDays: number | null; reading: string } | null;
}

export interface GroupShelfLife extends SurvivalSummary {
  group: number;
  /** Every live recipe of the group, and those of them with samples. */
  recipeIds: number[];
  sampledRecipeIds: number[];
}

export interface RegionShelfLife extends SurvivalSummary {
  region: ShelfLifeRegion;
  label: string;
  sampledRecipeCount: number;
}

export interface ProgrammeShelfLife {
  sampleCount: number;
  collapseCount: number;
  /** Recipes with samples (or only the one asked for, with or without). */
  recipes: RecipeShelfLife[];
  groups: GroupShelfLife[];
  regions: RegionShelfLife[];
  drivers: ShelfLifeModel;
  rules: { group: string; region: string };
}

export const REGION_LABELS: Record<ShelfLifeRegion, string> = {
  gel: 'predicted gel region',
  glass: 'predicted glass region',
  fluid: 'predicted fluid region',
  crystal: 'predicted crystal region',
  separated: 'predicted two-phase region',
  unpredicted: 'recipes without a prediction',
};

export const SHELF_LIFE_RULES = {
  group: `Similar recipes: the same particle system, depletant (or none) and solvent, within ${SIMILAR_RECIPE_DISTANCE} of each other on the normalised map (φ/φ_cp and the attraction placed through B2* on the programme's common map), joined in chains.`,
  region: 'Map region: the state the recipe is predicted to be in (the shaded region of the map it sits in), so all recipes predicted to gel share one curve.',
};

/**
 * A programme's shelf life from its samples: Kaplan–Meier curve, median and words per recipe, per
 * group of similar recipes (similarRecipeGroups over every live recipe placed on the map; an
 * unplaced recipe is a group of its own) and per map region (the recipe's predicted state), and
 * the Cox model of what drives collapse (fitShelfLifeModel) with each recipe's predicted median.
 * With `focusRecipeId`, `recipes` and `groups` hold only that recipe and its group (even without
 * samples); regions and the model always use the whole programme.
 * Samples of recipes not in `recipes` are ignored.
 * @example programmeShelfLife(recipes, samples).regions.find((r) => r.region === 'gel')?.summary
 */
export function programmeShelfLife(recipes: readonly ShelfLifeRecipeInput[], samples: readonly ShelfLifeSampleInput[], options: { focusRecipeId?: number } = {}): ProgrammeShelfLife {
  const byId = new Map(recipes.map((r) => [r.id, r]));
  const samplesOf = new Map<number, SurvivalRecord[]>();
  for (const s of samples) {
    if (!byId.has(s.recipeId)) continue;
    const list = samplesOf.get(s.recipeId);
    const record = { timeDays: s.timeDays, collapsed: s.collapsed };
    if (list) list.push(record);
    else samplesOf.set(s.recipeId, [record]);
  }
  const placed = recipes.filter((r) => r.position !== null && Number.isFinite(r.position.x) && Number.isFinite(r.position.u));
  const groupLists = [
    ...similarRecipeGroups(placed.map((r) => ({ id: r.id, particleId: r.particleId, depletantId: r.depletantId, solventId: r.solventId, x: r.position!.x, u: r.position!.u }))),
    ...recipes.filter((r) => !placed.includes(r)).map((r) => [r.id]),
  ];
  const groupOf = new Map<number, number>();
  groupLists.forEach((ids, g) => ids.forEach((id) => groupOf.set(id, g)));

  const used = recipes.filter((r) => samplesOf.has(r.id));
  const modelRecords = modelRecordsOf(recipes, samples);
  const drivers = fitShelfLifeModel(modelRecords);
  const focus = options.focusRecipeId;
  const recipeEntries = (focus === undefined ? used : recipes.filter((r) => r.id === focus)).map((r): RecipeShelfLife => {
    const predicted = drivers.status === 'fitted' ? modelMedianDays(drivers, r.covariates) : undefined;
    return {
      recipeId: r.id,
      code: r.code,
      name: r.name,
      group: groupOf.get(r.id)!,
      region: r.region ?? 'unpredicted',
      predicted: predicted === undefined || drivers.status !== 'fitted' ? null : { medianDays: predicted, reading: describePrediction(drivers, predicted) },
      ...summarise(samplesOf.get(r.id) ?? []),
    };
  });
  const wantedGroups = focus === undefined ? groupLists.map((_, g) => g) : recipeEntries.map((r) => r.group);
  const groups = wantedGroups.flatMap((g): GroupShelfLife[] => {
    const recipeIds = groupLists[g];
    const sampledRecipeIds = recipeIds.filter((id) => samplesOf.has(id));
    if (focus === undefined && sampledRecipeIds.length === 0) return [];
    return [{ group: g, recipeIds, sampledRecipeIds, ...summarise(sampledRecipeIds.flatMap((id) => samplesOf.get(id)!)) }];
  });
  const regionSamples = new Map<ShelfLifeRegion, { records: SurvivalRecord[]; recipes: number }>();
  for (const r of used) {
    const key = r.region ?? 'unpredicted';
    const entry = regionSamples.get(key) ?? { records: [], recipes: 0 };
    entry.records.push(...samplesOf.get(r.id)!);
    entry.recipes++;
    regionSamples.set(key, entry);
  }
  const regions = (Object.keys(REGION_LABELS) as ShelfLifeRegion[])
    .filter((key) => regionSamples.has(key))
    .map((region) => ({ region, label: REGION_LABELS[region], sampledRecipeCount: regionSamples.get(region)!.recipes, ...summarise(regionSamples.get(region)!.records) }));
  return {
    sampleCount: modelRecords.length,
    collapseCount: modelRecords.filter((r) => r.collapsed).length,
    recipes: recipeEntries,
    groups,
    regions,
    drivers,
    rules: SHELF_LIFE_RULES,
  };
}

function summarise(records: readonly SurvivalRecord[]): SurvivalSummary {
  const curve = kaplanMeier(records);
  return { curve, median: medianTimeToCollapse(curve), summary: describeSurvival(curve) };
}

/**
 * The programme's model of what drives collapse alone (fitShelfLifeModel on every sample with its
 * recipe's covariates and its own height), for callers that need no curves, such as the planner.
 */
export function programmeShelfLifeModel(recipes: readonly ShelfLifeRecipeInput[], samples: readonly ShelfLifeSampleInput[]): ShelfLifeModel {
  return fitShelfLifeModel(modelRecordsOf(recipes, samples));
}

function modelRecordsOf(recipes: readonly ShelfLifeRecipeInput[], samples: readonly ShelfLifeSampleInput[]) {
  const byId = new Map(recipes.map((r) => [r.id, r]));
  return samples.flatMap((s) => {
    const recipe = byId.get(s.recipeId);
    return recipe ? [{ timeDays: s.timeDays, collapsed: s.collapsed, covariates: { ...recipe.covariates, sampleHeightMm: s.sampleHeightMm ?? null } }] : [];
  });
}
