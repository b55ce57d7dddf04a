import { stickinessFromReducedB2 } from '../attraction/stickiness-from-reduced-b2';
import { brownianTime } from '../colloid/brownian-time';
import { gravitationalPecletNumber } from '../colloid/gravitational-peclet-number';
import { ZERO_CELSIUS } from '../colloid/physical-constants';
import { stokesEinsteinDiffusion } from '../colloid/stokes-einstein-diffusion';
import { stokesSettlingSpeed } from '../colloid/stokes-settling-speed';
import { volumeFractionFromMassFraction } from '../colloid/volume-fraction-from-mass-fraction';
import { baxterLambdaUnchecked } from '../fluid-fluid/baxter-py-lambda';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { attractionToMapY } from '../map/attraction-to-map-y';
import { FREE_VOLUME_MAX_POLYMER } from '../depletion/free-volume-limits';
import { buildStateMap } from '../map/build-state-map';
import { SHORT_RANGE_LIMIT } from '../map/glass-line-table';
import { classifyPoint } from '../map/classify-point';
import { PHYSICS_MODEL_VERSION } from '../map/model-version';
import type { MapModel, StateMap } from '../map/types';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { recipeAttraction } from './recipe-attraction';
import type { RecipeDerivation, PhysicsRecipeInput } from './recipe-types';
import { fractionArgument } from './fraction-argument';

export { DEFAULT_CLOSEST_APPROACH_NM } from './recipe-attraction';
export type { RecipeDerivation, PhysicsRecipeInput } from './recipe-types';

/**
 * Every derived parameter a recipe stores, from its materials and composition: φ (from the mass
 * fraction if given), the attraction (contact U/kT, range in σ, B2*, τ; depletion: q, R_g, c*,
 * φ_p = c/c*, φ_p^R = φ_p/α(φ); salt: Debye length and DLVO with closest approach h_min),
 * transport (Stokes–Einstein D, Brownian time a²/D, gravitational Péclet number, Stokes
 * settling speed), the map model to use (free-volume depletion map for depletant recipes, the
 * generic map otherwise: B2* axis for salt or none, U/kT at λ = 1 + range for direct input), the
 * predicted state with its nearest boundary and margin, the model version and warnings.
 *
 * Sources: see each function (physics.md §2, §4, §6). The polymer's own volume is neglected in
 * the concentration conversion; a 'solvent' concentration basis is scaled by (1 − φ).
 *
 * @param input the recipe (see RecipeInput for units).
 * @param options.mapFor gives the map to classify against for the model the recipe needs, built
 *   with `input.parameters` and the particle's polydispersity (e.g. from a cache: see
 *   shared/state-map-cache.ts); without it a map is built (~10–40 ms).
 * @throws PhysicsArgumentError naming the field for missing or out-of-range input (e.g.
 *   `particle.radiusNm must be a radius in nm in (0, Infinity); got 0`).
 * @example deriveRecipeParameters({ particle: { radiusNm: 100, densityGcm3: 1.05 }, solvent: { viscosityMPas: 0.89002, densityGcm3: 0.997 }, temperatureC: 25, fraction: { kind: 'volume', value: 0.2 } }).diffusionM2PerS // 2.4537e-12
 */
export function deriveRecipeParameters(input: PhysicsRecipeInput, options: { mapFor?: (model: MapModel) => StateMap } = {}): RecipeDerivation {
  if (input === null || typeof input !== 'object') throw new PhysicsArgumentError('input', 'a recipe object', input);
  if (!input.particle || !input.solvent) throw new PhysicsArgumentError(input.particle ? 'solvent' : 'particle', 'an object with the material properties', undefined);
  const radiusNm = requirePositive('particle.radiusNm', input.particle.radiusNm, 'a radius in nm');
  const particleDensity = requirePositive('particle.densityGcm3', input.particle.densityGcm3, 'a density in g/cm³');
  const viscosity = requirePositive('solvent.viscosityMPas', input.solvent.viscosityMPas, 'a viscosity in mPa·s') * 1e-3;
  const solventDensity = requirePositive('solvent.densityGcm3', input.solvent.densityGcm3, 'a density in g/cm³');
  const temperature = requireInRange('temperatureC', input.temperatureC, -30, 200, { what: 'a temperature in °C', lowEnd: 'closed', highEnd: 'closed' }) + ZERO_CELSIUS;
  const polydispersity = input.particle.polydispersityPct === undefined
    ? undefined
    : requireInRange('particle.polydispersityPercent', input.particle.polydispersityPct, 0, 100, { what: 'a polydispersity in %', lowEnd: 'closed', highEnd: 'closed' });
  const phi = volumeFraction(input, particleDensity, solventDensity);
  const warnings: string[] = [];

  const radius = radiusNm * 1e-9;
  const densityDifference = (particleDensity - solventDensity) * 1000;
  const diffusion = stokesEinsteinDiffusion(temperature, viscosity, radius);

  const attraction = recipeAttraction(input, phi, temperature);
  warnings.push(...attraction.warnings);
  const b2 = attraction.b2;
  const tau = b2 !== null && b2 < 1 ? stickinessFromReducedB2(b2) : null;
  if ((input.theory ?? 'meanField') === 'baxterPY' && tau !== null && baxterLambdaUnchecked(phi, tau) === null) {
    warnings.push('Percus–Yevick has no real root at this φ and τ (inside its no-solution band): reported as no solution; the map keeps the nearest computed boundaries.');
  }

  const given = options.mapFor !== undefined;
  let map = given ? options.mapFor!(attraction.mapModel) : buildStateMap(attraction.mapModel, { parameters: input.parameters, polydispersity });
  if (map.crystalSuppressed) warnings.push(`Polydispersity ${polydispersity} % above ${map.parameters.polydispersityCrystalThreshold} %: crystallisation taken as suppressed.`);
  const mapY = attractionToMapY(map, attraction.attraction);
  const uOnMap = (mapY - map.y.weakest) / (map.y.strongest - map.y.weakest);
  let parametersForPoint = given ? input.parameters : undefined;
  if (uOnMap > 1 && map.model.kind === 'depletion' && map.model.q > SHORT_RANGE_LIMIT) {
    // Long-range depletion is placed by free-volume theory itself, whose domes keep widening
    // far above the default top: classify on a map tall enough to hold the sample.
    map = buildStateMap(map.model, { parameters: { ...map.parameters, ...input.parameters }, ...(polydispersity !== undefined ? { polydispersity } : {}), yMax: Math.min(FREE_VOLUME_MAX_POLYMER, mapY * 1.05) });
    parametersForPoint = undefined;
    if (mapY > FREE_VOLUME_MAX_POLYMER) warnings.push(`The reservoir polymer fraction (${mapY.toPrecision(3)}) is beyond what free-volume theory is computed for (${FREE_VOLUME_MAX_POLYMER}); the prediction extrapolates its strongest boundaries.`);
  } else if (uOnMap > 1) {
    warnings.push('The attraction lies beyond the top of the map; the prediction extrapolates its strongest boundaries.');
  }
  const classification = classifyPoint(map, { phi, attraction: attraction.attraction }, parametersForPoint).toJSON();

  return {
    modelVersion: PHYSICS_MODEL_VERSION,
    attractionSource: attraction.source,
    phi,
    sizeRatio: attraction.q,
    radiusOfGyrationNm: attraction.radiusOfGyrationNm,
    overlapConcentrationGL: attraction.overlapConcentrationGL,
    polymerSystem: attraction.systemPolymerFraction,
    polymerReservoir: attraction.reservoirPolymerFraction,
    contactEnergyKT: attraction.contactEnergyKT,
    rangeSigma: attraction.rangeSigma,
    reducedB2: b2,
    stickiness: tau,
    debyeLengthNm: attraction.debyeLengthNm,
    closestApproachNm: attraction.closestApproachNm,
    barrierKT: attraction.barrierKT,
    diffusionM2PerS: diffusion,
    brownianTimeS: brownianTime(radius, diffusion),
    gravitationalPeclet: gravitationalPecletNumber(radius, densityDifference, temperature),
    settlingSpeedMPerS: stokesSettlingSpeed(radius, densityDifference, viscosity),
    mapModel: map.model,
    mapY,
    predictedState: classification.state,
    nearestBoundary: { ...classification.nearestBoundary },
    margin: classification.margin,
    marginDescription: classification.marginDescription,
    reason: classification.reason,
    warnings,
  };
}

function volumeFraction(input: PhysicsRecipeInput, particleDensity: number, solventDensity: number): number {
  const { kind, value } = input.fraction;
  if (kind !== 'mass' && kind !== 'volume') throw new PhysicsArgumentError('fraction.kind', "'mass' or 'volume'", kind);
  const phi = kind === 'mass' ? volumeFractionFromMassFraction(value, particleDensity, solventDensity) : value;
  return requireVolumeFraction(fractionArgument(input), phi, FCC_CLOSE_PACKING);
}
