/**
 * Gelwright physics core: pure functions from published colloid theory (see
 * shared/design/physics.md and docs/physics.md). This file only re-exports, by topic.
 * Conventions: φ volume fraction, τ Baxter stickiness, B2* = B2/B2_HS, q = R_g/a, energies in kT;
 * bad input throws PhysicsArgumentError naming the argument and its valid range; "no real root"
 * and "no coexistence" are `null`, never NaN.
 */

// Errors
export { PhysicsArgumentError } from './validation/physics-argument-error';

// Version stored with every derived result
export { PHYSICS_MODEL_VERSION } from './map/model-version';

// Hard spheres
export { FCC_CLOSE_PACKING, RANDOM_CLOSE_PACKING } from './hard-spheres/close-packing';
export { carnahanStarlingCompressibility } from './hard-spheres/carnahan-starling-compressibility';
export { carnahanStarlingExcessFreeEnergy } from './hard-spheres/carnahan-starling-excess-free-energy';
export { carnahanStarlingExcessChemicalPotential } from './hard-spheres/carnahan-starling-excess-chemical-potential';
export { carnahanStarlingInverseCompressibility } from './hard-spheres/carnahan-starling-inverse-compressibility';
export { CELL_MODEL_FREE_ENERGY_CONSTANT } from './hard-spheres/cell-model-solid';
export { hardSphereFluidSolidCoexistence, type HardSphereCoexistence } from './hard-spheres/hard-sphere-fluid-solid-coexistence';

// Describing the attraction
export { squareWellReducedB2, MAX_WELL_DEPTH } from './attraction/square-well-reduced-b2';
export { squareWellDepthFromReducedB2 } from './attraction/square-well-depth-from-reduced-b2';
export { reducedB2FromStickiness } from './attraction/reduced-b2-from-stickiness';
export { stickinessFromReducedB2 } from './attraction/stickiness-from-reduced-b2';
export { inverseStickinessFromReducedB2 } from './attraction/inverse-stickiness-from-reduced-b2';
export { reducedB2FromPotential, type ReducedB2Options } from './attraction/reduced-b2-from-potential';
export { asakuraOosawaPairEnergy } from './attraction/asakura-oosawa-pair-energy';
export { asakuraOosawaContactEnergy } from './attraction/asakura-oosawa-contact-energy';
export { asakuraOosawaReducedB2 } from './attraction/asakura-oosawa-reduced-b2';
export { asakuraOosawaAttraction, type DepletionAttraction } from './attraction/asakura-oosawa-attraction';
export { hamakerSphereEnergy } from './attraction/hamaker-sphere-energy';
export { doubleLayerEnergy } from './attraction/double-layer-energy';
export { dlvoPairEnergy, dlvoReducedB2, type DlvoSystem, type DlvoSummary } from './attraction/dlvo-pair-energy';
export { attractionToReducedB2 } from './map/attraction-to-reduced-b2';
export { attractionToMapY } from './map/attraction-to-map-y';

// Fluid–fluid separation: mean field (CS + B2*)
export { meanFieldCriticalPoint } from './fluid-fluid/mean-field-critical-point';
export { meanFieldSpinodal, MEAN_FIELD_MIN_B2 } from './fluid-fluid/mean-field-spinodal';
export { meanFieldBinodal } from './fluid-fluid/mean-field-binodal';

// Fluid–fluid separation: Baxter adhesive spheres, Percus–Yevick
export { baxterPYLambda } from './fluid-fluid/baxter-py-lambda';
export { baxterPYInverseCompressibility } from './fluid-fluid/baxter-py-inverse-compressibility';
export { baxterPYSpinodalStickiness, BAXTER_SPINODAL_END } from './fluid-fluid/baxter-py-spinodal-stickiness';
export { baxterPYCriticalPoint } from './fluid-fluid/baxter-py-critical-point';
export { baxterPercolationStickiness } from './fluid-fluid/baxter-percolation-stickiness';
export { baxterPYNoSolutionBand } from './fluid-fluid/baxter-py-no-solution-band';
export { baxterPYPressure } from './fluid-fluid/baxter-py-pressure';
export { baxterPYChemicalPotential } from './fluid-fluid/baxter-py-chemical-potential';
export { baxterPYBinodal, BAXTER_MIN_TAU } from './fluid-fluid/baxter-py-binodal';

// Arrest: mode-coupling theory with Percus–Yevick structure factors
export { percusYevickHardSphereStructureFactor } from './arrest/percus-yevick-hard-sphere-structure-factor';
export { baxterStickyStructureFactor } from './arrest/baxter-sticky-structure-factor';
export { modeCouplingNonergodicity, type NonergodicityResult, type NonergodicityOptions } from './arrest/mode-coupling-nonergodicity';
export { modeCouplingGlassTransition, type GlassTransition, type GlassTransitionOptions } from './arrest/mode-coupling-glass-transition';
export { modeCouplingGlassLine, clearModeCouplingGlassLines, GLASS_LINE_LEVELS, GLASS_LINE_TAU_RANGE, type ModeCouplingGlassLine } from './arrest/mode-coupling-glass-line';
export { DEFAULT_MODE_COUPLING_GRID } from './arrest/mode-coupling-grid';

// Depletion: free-volume theory
export { freeVolumeFraction } from './depletion/free-volume-fraction';
export { freeVolumeCriticalPoint, type FreeVolumeCriticalPoint } from './depletion/free-volume-critical-point';
export { freeVolumeSpinodal } from './depletion/free-volume-spinodal';
export { freeVolumeFluidFluidBinodal } from './depletion/free-volume-fluid-fluid-binodal';
export { freeVolumeFluidSolidCoexistence } from './depletion/free-volume-fluid-solid-coexistence';
export { freeVolumeCriticalEndpoint } from './depletion/free-volume-critical-endpoint';
export { freeVolumeTriplePoint, type FreeVolumeTriplePoint } from './depletion/free-volume-triple-point';
export { systemPolymerFraction } from './depletion/system-polymer-fraction';
export { reservoirPolymerFraction } from './depletion/reservoir-polymer-fraction';
export { FREE_VOLUME_MAX_Q, FREE_VOLUME_MAX_POLYMER } from './depletion/free-volume-limits';

// Time, gravity, salt, polymer and composition
export {
  AVOGADRO_CONSTANT,
  BOLTZMANN_CONSTANT,
  ELEMENTARY_CHARGE,
  STANDARD_GRAVITY,
  VACUUM_PERMITTIVITY,
  WATER_RELATIVE_PERMITTIVITY,
  ZERO_CELSIUS,
} from './colloid/physical-constants';
export { stokesEinsteinDiffusion } from './colloid/stokes-einstein-diffusion';
export { brownianTime } from './colloid/brownian-time';
export { gravitationalPecletNumber } from './colloid/gravitational-peclet-number';
export { stokesSettlingSpeed } from './colloid/stokes-settling-speed';
export { debyeLength } from './colloid/debye-length';
export { symmetricSaltIonicStrength } from './colloid/symmetric-salt-ionic-strength';
export { polymerRadiusOfGyration } from './colloid/polymer-radius-of-gyration';
export { polymerOverlapConcentration } from './colloid/polymer-overlap-concentration';
export { volumeFractionFromMassFraction } from './colloid/volume-fraction-from-mass-fraction';

// The state map and the classifier
export type {
  AttractionInput,
  BoundaryId,
  ClassifiedPoint,
  ClassifierParameters,
  ClassifierTables,
  GlassLineMapping,
  GlassLineSource,
  MapAxis,
  MapBoundary,
  MapMarker,
  MapModel,
  MapVertex,
  PredictedState,
  StateMap,
  StateMapOptions,
  StateRegions,
} from './map/types';
export { DEFAULT_CLASSIFIER_PARAMETERS, GEL_THRESHOLD_SOURCE, resolveClassifierParameters } from './map/classifier-parameters';
export { buildStateMap, SIMULATION_CRITICAL_POINT } from './map/build-state-map';
export { DEFAULT_STRONGEST_B2 } from './map/build-axis';
export { SHORT_RANGE_LIMIT, attractionRangeOfModel, highestGlassPhi } from './map/glass-line-table';
export { DEFAULT_SQUARE_WELL_RANGE } from './map/resolve-map-model';
export { classifyPoint } from './map/classify-point';
export { PointClassification } from './map/point-classification';
export { signedBoundaryDistance } from './map/signed-boundary-distance';

// Recipe bridge
export {
  deriveRecipeParameters,
  DEFAULT_CLOSEST_APPROACH_NM,
  type PhysicsRecipeInput,
  type RecipeDerivation,
} from './recipe/derive-recipe-parameters';
