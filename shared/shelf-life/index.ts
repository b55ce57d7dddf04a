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
