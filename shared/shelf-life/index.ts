// Shelf life: how long gels last on the bench (survival with censoring), what drives collapse
// (proportional hazards), and how G′ changes with age. Pure functions; see docs/shelf-life.md.
export type { SurvivalRecord, SurvivalStep, SurvivalCurve, MedianTimeToCollapse } from './types';
export { kaplanMeier } from './kaplan-meier';
export { greenwoodTerm, greenwoodVariance } from './greenwood-variance';
export { logLogBand } from './log-log-band';
export { medianTimeToCollapse } from './median-time-to-collapse';
export { survivalAt } from './survival-at';
export { describeSurvival } from './describe-survival';
export { similarRecipeGroups, SIMILAR_RECIPE_DISTANCE, type RecipeOnMap } from './similar-recipe-groups';
export { coxProportionalHazards, type CoxCovariate, type CoxRecord, type CoxTerm, type CoxFit } from './cox-proportional-hazards';
export { CoxFitRefused, MIN_COX_EVENTS, type CoxRefusalReason } from './cox-fit-refused';
export { breslowPartialLikelihood } from './breslow-partial-likelihood';
export { hazardReading } from './hazard-reading';
export { stiffeningWithAge, MIN_STIFFENING_AGES, type ModulusAtAge, type StiffeningFit } from './stiffening-with-age';
export { studentTQuantile } from './student-t-quantile';
export { Z_95 } from '../statistics/z-95';
export { breslowBaselineHazard, type BaselineHazard } from './breslow-baseline-hazard';
export { predictedSurvival, predictedMedianDays, predictedSurvivalAt, type PredictedSurvival } from './predicted-survival';
export {
  fitShelfLifeModel,
  modelMedianDays,
  modelSurvivalAt,
  valuesFor,
  describePrediction,
  COLLAPSE_PHYSICS_CONTEXT,
  SHELF_LIFE_COVARIATES,
  type ShelfLifeCovariateKey,
  type ShelfLifeCovariates,
  type ShelfLifeRecipeCovariates,
  type ShelfLifeModel,
  type ShelfLifeModelFitted,
  type ShelfLifeModelRefused,
  type ShelfLifeModelRecord,
  type OmittedCovariate,
} from './shelf-life-model';
export {
  programmeShelfLife,
  programmeShelfLifeModel,
  REGION_LABELS,
  SHELF_LIFE_RULES,
  type ProgrammeShelfLife,
  type RecipeShelfLife,
  type GroupShelfLife,
  type RegionShelfLife,
  type ShelfLifeRecipeInput,
  type ShelfLifeSampleInput,
  type ShelfLifeRegion,
  type SurvivalSummary,
} from './programme-shelf-life';
export { shelfLifeCovariatesOf } from './shelf-life-covariates-of';
export { latestSampleHeightMm, type HeightAtCheck } from './latest-sample-height';
export { shelfLifeVerdict, shelfLifeRequestNote, type ShelfLifeVerdict } from './shelf-life-requirement';
