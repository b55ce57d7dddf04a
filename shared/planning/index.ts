/**
 * The Planner's core: from a target state, materials and ranges to ranked compositions, the
 * feasible window, what to relax when nothing fits, and the next experiments. Pure functions, no
 * I/O. This file only re-exports.
 */
export type * from './types';
export { planCompositions } from './plan-compositions';
export { compositionSpace, SALT_TABLE_NODES } from './composition-space';
export { plannedRecipeInput, type PlanTemplate } from './planned-recipe-input';
export { materialCostPerLitre, type CostInputs } from './material-cost-per-litre';
export { DEFAULT_BOUNDARY_UNCERTAINTY } from './default-boundary-uncertainty';
export { DEFAULT_RANKING_WEIGHTS, rankCandidates, type Ranked } from './rank-candidates';
export { targetProbability } from './target-probability';
export { membershipOffset } from './membership-offset';
export { proposeExperiments, BAND_Z, EXPERIMENT_POOL } from './propose-experiments';
export { explainExperiments } from './explain-experiments';
export { relaxationAdvice, ADVICE_PHI, ADVICE_SAMPLES } from './relaxation-advice';
export { feasibleWindow, WINDOW_COLUMNS, WINDOW_ROWS } from './feasible-window';
export { sampleCompositions, type SampledComposition } from './sample-compositions';
export { screeningMap, SCREENING_MAX_LEVELS } from './screening-map';
export { placeEvidence, type PlacedEvidence } from './place-evidence';
export { nearestEvidence, NEAR_EVIDENCE_DISTANCE } from './nearest-evidence';
export { evidenceIndex } from './evidence-index';
export { mapPosition } from './map-position';
export { pickSpaced } from './pick-spaced';
export { haltonPoints } from './halton-points';
export { radicalInverse } from './radical-inverse';
export { monotoneInterpolant } from './monotone-interpolant';
export { roundComposition } from './round-composition';
