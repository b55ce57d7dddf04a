import { deriveRecipeParameters, PhysicsArgumentError, type ClassifierParameters, type MapModel, type StateMap } from './physics';
import { volumeFractionFromMassFraction } from './physics/colloid/volume-fraction-from-mass-fraction';
import { recipeAttraction } from './physics/recipe/recipe-attraction';
import { cachedStateMap } from './state-map-cache';
import type { PhysicsRecipeInput } from './physics/recipe/recipe-types';
import type { RecipeInput } from './schemas/recipes';
import type { DepletantView, ParticleView, SaltView, SolventView } from './views/materials';
import type { RecipeDerived } from './views/recipe';

/** The library rows a recipe refers to (only the fields the physics reads). */
export interface RecipeMaterials {
  particle: Pick<ParticleView, 'radiusNm' | 'densityGcm3' | 'polydispersityPct' | 'surfacePotentialMv' | 'hamakerZj'>;
  solvent: Pick<SolventView, 'viscosityMPas' | 'densityGcm3' | 'relativePermittivity'>;
  depletant?: Pick<DepletantView, 'molarMassKgMol' | 'rgNm' | 'rgPrefactorNm' | 'rgExponent'> | null;
  salt?: Pick<SaltView, 'valence'> | null;
}

/**
 * The physics input of a recipe: our stored units turned into shared/physics' (zJ → J for the
 * Hamaker constant; polymer concentration per litre of solvent). Used by the server on save
 * and by the editor's live preview, so both compute the same numbers.
 */
export function physicsInputFor(recipe: RecipeInput, materials: RecipeMaterials, parameters?: Partial<ClassifierParameters>): PhysicsRecipeInput {
  const { particle, solvent } = materials;
  const input: PhysicsRecipeInput = {
    particle: {
      radiusNm: particle.radiusNm,
      densityGcm3: particle.densityGcm3,
      polydispersityPct: particle.polydispersityPct,
      ...(particle.surfacePotentialMv != null ? { surfacePotentialMv: particle.surfacePotentialMv } : {}),
      ...(particle.hamakerZj != null ? { hamakerJ: particle.hamakerZj * 1e-21 } : {}),
    },
    solvent: {
      viscosityMPas: solvent.viscosityMPas,
      densityGcm3: solvent.densityGcm3,
      ...(solvent.relativePermittivity != null ? { relativePermittivity: solvent.relativePermittivity } : {}),
    },
    temperatureC: recipe.temperatureC,
    fraction: recipe.fraction,
    ...(parameters ? { parameters } : {}),
  };
  const a = recipe.attraction;
  if (a.source === 'depletion' && materials.depletant) {
    const d = materials.depletant;
    input.depletant = {
      molarMassKgMol: d.molarMassKgMol,
      ...(d.rgNm != null ? { radiusOfGyrationNm: d.rgNm } : { scaling: { prefactorNm: d.rgPrefactorNm!, exponent: d.rgExponent! } }),
      concentrationGL: a.concentrationGL,
      concentrationBasis: 'solvent',
    };
  }
  if (a.source === 'salt' && materials.salt) input.salt = { concentrationMM: a.concentrationMM, valence: materials.salt.valence };
  if (a.source === 'direct') input.direct = { contactEnergyKT: a.contactEnergyKT, range: a.rangeSigma };
  return input;
}

/** Which field of our recipe form a physics complaint is about. */
export function recipeFieldOf(error: PhysicsArgumentError): string {
  const argument = error.argument;
  if (argument === 'fraction.kind') return 'fraction.kind';
  if (argument.startsWith('fraction.')) return 'fraction.value';
  if (argument === 'temperatureC') return 'temperatureC';
  if (argument.startsWith('particle.')) return 'particleId';
  if (argument.startsWith('solvent.')) return 'solventId';
  if (argument.startsWith('depletant.concentration')) return 'attraction.concentrationGL';
  if (argument.startsWith('depletant')) return 'attraction.depletantId';
  if (argument.startsWith('salt.concentration')) return 'attraction.concentrationMM';
  if (argument.startsWith('salt')) return 'attraction.saltId';
  if (argument === 'direct.contactEnergyKT') return 'attraction.contactEnergyKT';
  if (argument.startsWith('direct')) return 'attraction.rangeSigma';
  return 'attraction';
}

/**
 * Derives and shapes what a recipe stores, classified on the map the recipe is predicted on
 * (from the shared cache, built with `parameters` and the particle's polydispersity: see
 * recipeStateMap); returns that map too, for drawing the recipe on it. `calibration` labels the
 * result when calibrated parameters were used.
 */
export function deriveRecipe(recipe: RecipeInput, materials: RecipeMaterials, options: { parameters?: Partial<ClassifierParameters>; calibration?: { id: number; acceptedAt: string } | null } = {}): { derived: RecipeDerived; map: StateMap } {
  let map: StateMap | undefined;
  const mapFor = (model: MapModel) => (map = cachedStateMap(model, mapOptions(materials, options.parameters)));
  const d = deriveRecipeParameters(physicsInputFor(recipe, materials, options.parameters), { mapFor });
  const derived: RecipeDerived = {
    modelVersion: d.modelVersion,
    phi: d.phi,
    sizeRatio: d.sizeRatio,
    polymerReservoir: d.polymerReservoir,
    polymerSystem: d.polymerSystem,
    overlapConcentrationGL: d.overlapConcentrationGL,
    contactEnergyKT: d.contactEnergyKT,
    rangeSigma: d.rangeSigma,
    reducedB2: d.reducedB2,
    stickiness: d.stickiness,
    debyeLengthNm: d.debyeLengthNm,
    closestApproachNm: d.closestApproachNm,
    predictedState: d.predictedState,
    nearestBoundary: d.nearestBoundary,
    margin: d.margin,
    marginDescription: d.marginDescription,
    reason: d.reason,
    map: d.mapModel.kind === 'depletion' ? { kind: 'depletion', q: d.mapModel.q } : { kind: 'generic', theory: d.mapModel.theory },
    timescales: { diffusionM2s: d.diffusionM2PerS, brownianTimeS: d.brownianTimeS, gravitationalPeclet: d.gravitationalPeclet, settlingSpeedMs: d.settlingSpeedMPerS },
    warnings: d.warnings,
    calibration: options.calibration ?? null,
  };
  return { derived, map: map! };
}

/** The cache options of a recipe's map: the same for deriveRecipe and recipeStateMap, so both find one map. */
const mapOptions = (materials: RecipeMaterials, parameters: Partial<ClassifierParameters> | undefined) => ({ parameters, polydispersity: materials.particle.polydispersityPct });

/**
 * The map a recipe is predicted on (free-volume map at its q for depletion, generic otherwise),
 * from the shared cache: the same map the server stores predictions against.
 */
export function recipeStateMap(recipe: RecipeInput, materials: RecipeMaterials, parameters?: Partial<ClassifierParameters>): StateMap {
  const physics = physicsInputFor(recipe, materials, parameters);
  // The map model needs only q (or the theory), but the attraction is checked at the recipe's φ,
  // so a mass fraction is converted as deriveRecipeParameters does (clamped: that one names a bad φ).
  const { kind, value } = physics.fraction;
  const phi = kind === 'volume' ? value : Math.min(0.7, volumeFractionFromMassFraction(value, physics.particle.densityGcm3, physics.solvent.densityGcm3));
  const model = recipeAttraction(physics, phi, recipe.temperatureC + 273.15).mapModel;
  return cachedStateMap(model, mapOptions(materials, parameters));
}
