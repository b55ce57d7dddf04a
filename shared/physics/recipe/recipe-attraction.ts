import { asakuraOosawaContactEnergy } from '../attraction/asakura-oosawa-contact-energy';
import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { dlvoReducedB2 } from '../attraction/dlvo-pair-energy';
import { squareWellReducedB2 } from '../attraction/square-well-reduced-b2';
import { debyeLength } from '../colloid/debye-length';
import { WATER_RELATIVE_PERMITTIVITY } from '../colloid/physical-constants';
import { polymerOverlapConcentration } from '../colloid/polymer-overlap-concentration';
import { polymerRadiusOfGyration } from '../colloid/polymer-radius-of-gyration';
import { symmetricSaltIonicStrength } from '../colloid/symmetric-salt-ionic-strength';
import { freeVolumeFraction } from '../depletion/free-volume-fraction';
import { FREE_VOLUME_MAX_Q } from '../depletion/free-volume-limits';
import type { AttractionInput, MapModel } from '../map/types';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireFinite } from '../validation/require-finite';
import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';
import type { PhysicsRecipeInput } from './recipe-types';
import { requireDepletionWithinModel } from './require-depletion-within-model';
import { fractionArgument } from './fraction-argument';

/** DLVO closest surface separation used unless a recipe gives one (physics.md §2: 0.2–0.5 nm). */
export const DEFAULT_CLOSEST_APPROACH_NM = 0.4;

export interface RecipeAttraction {
  source: 'direct' | 'depletion' | 'salt' | 'none';
  mapModel: MapModel;
  /** How the point is placed on the map (B2* when not depletion at the map's q). */
  attraction: AttractionInput;
  b2: number | null;
  contactEnergyKT: number | null;
  rangeSigma: number | null;
  q: number | null;
  radiusOfGyrationNm: number | null;
  overlapConcentrationGL: number | null;
  systemPolymerFraction: number | null;
  reservoirPolymerFraction: number | null;
  debyeLengthNm: number | null;
  closestApproachNm: number | null;
  barrierKT: number | null;
  warnings: string[];
}

/**
 * The attraction of a recipe from its materials: direct (square well), depletion (Asakura–
 * Oosawa with free-volume theory), salt (DLVO) or none. Internal to deriveRecipeParameters.
 */
export function recipeAttraction(input: PhysicsRecipeInput, phi: number, temperature: number): RecipeAttraction {
  const warnings: string[] = [];
  const theory = input.theory ?? 'meanField';
  if (theory !== 'meanField' && theory !== 'baxterPY') throw new PhysicsArgumentError('theory', "'meanField' or 'baxterPY'", theory);
  const genericB2: MapModel = { kind: 'generic', theory, axis: 'b2' };
  const radiusNm = input.particle.radiusNm;
  const debyeLengthNm = input.salt ? saltDebyeLengthNm(input, temperature, warnings) : null;
  const empty = {
    q: null, radiusOfGyrationNm: null, overlapConcentrationGL: null, systemPolymerFraction: null,
    reservoirPolymerFraction: null, debyeLengthNm, closestApproachNm: null, barrierKT: null,
  };
  const sources = [input.direct && 'direct', input.depletant && 'depletion', input.salt && 'salt'].filter(Boolean);
  if (sources.length > 1) warnings.push(`Several attraction sources given (${sources.join(', ')}); only the first is used (direct > depletion > salt).`);

  if (input.direct) {
    const depth = requireInRange('direct.contactEnergyKT', input.direct.contactEnergyKT, 0, 700, { what: 'a contact energy in kT', lowEnd: 'closed', highEnd: 'closed' });
    const range = requireInRange('direct.range', input.direct.range, 0, 2, { what: 'a well width in units of σ', highEnd: 'closed' });
    const lambda = 1 + range;
    const b2 = squareWellReducedB2(depth, lambda);
    return {
      ...empty, source: 'direct', warnings,
      mapModel: { kind: 'generic', theory, axis: 'squareWellDepth', lambda },
      attraction: { kind: 'squareWell', depth, lambda },
      b2, contactEnergyKT: depth, rangeSigma: range,
    };
  }

  if (input.depletant) {
    const depletant = input.depletant;
    const molarMassGMol = requirePositive('depletant.molarMassKgMol', depletant.molarMassKgMol, 'a molar mass in kg/mol') * 1000;
    let radiusOfGyrationNm: number;
    if (depletant.radiusOfGyrationNm !== undefined) {
      radiusOfGyrationNm = requirePositive('depletant.radiusOfGyrationNm', depletant.radiusOfGyrationNm, 'a radius of gyration in nm');
    } else if (depletant.scaling) {
      radiusOfGyrationNm = polymerRadiusOfGyration(molarMassGMol, depletant.scaling.prefactorNm, depletant.scaling.exponent);
    } else {
      throw new PhysicsArgumentError('depletant.radiusOfGyrationNm', 'a radius of gyration in nm, or depletant.scaling { prefactorNm, exponent }', undefined);
    }
    const concentration = requireInRange('depletant.concentrationGL', depletant.concentrationGL, 0, 1e4, { what: 'a concentration in g/L', lowEnd: 'closed' });
    const basis = depletant.concentrationBasis ?? 'sample';
    if (basis !== 'sample' && basis !== 'solvent') throw new PhysicsArgumentError('depletant.concentrationBasis', "'sample' or 'solvent'", basis);
    const q = radiusOfGyrationNm / radiusNm;
    const overlap = polymerOverlapConcentration(molarMassGMol, radiusOfGyrationNm);
    // Before φ_p^R = φ_p/α: dense recipes with large coils leave α → 0 and the attraction unbounded.
    requireDepletionWithinModel({
      phi, q, radiusNm, radiusOfGyrationNm, concentrationGL: concentration, overlapGL: overlap, basis,
      fractionArgument: fractionArgument(input),
    });
    const perSample = basis === 'solvent' ? concentration * (1 - phi) : concentration;
    const systemPolymer = perSample / overlap;
    const reservoir = systemPolymer === 0 ? 0 : systemPolymer / freeVolumeFraction(phi, q);
    const contact = -asakuraOosawaContactEnergy(q, reservoir);
    if (systemPolymer > 1) warnings.push(`Polymer above its overlap concentration (c/c* = ${systemPolymer.toFixed(2)}): the ideal-polymer depletion theory is outside its range.`);
    if (reservoir > 1) warnings.push(`Reservoir polymer fraction φ_p^R = ${reservoir.toFixed(2)} above 1: beyond the dilute ideal-polymer assumption of free-volume theory.`);
    if (q > 0.6) warnings.push(`Size ratio q = ${q.toFixed(3)} above 0.6: the Asakura–Oosawa pair potential and free-volume theory are only indicative.`);
    // Representable: requireDepletionWithinModel keeps the contact attraction within 600 kT.
    const b2 = asakuraOosawaReducedB2(q, reservoir);
    const useFreeVolume = q <= FREE_VOLUME_MAX_Q;
    if (!useFreeVolume) warnings.push(`Size ratio q = ${q.toFixed(2)} beyond free-volume theory's range (q ≤ ${FREE_VOLUME_MAX_Q}); placed on the generic B2* map instead.`);
    if (input.salt) warnings.push('Salt does not enter the depletion attraction here; its Debye length is reported only.');
    return {
      source: 'depletion', warnings,
      mapModel: useFreeVolume ? { kind: 'depletion', q } : genericB2,
      attraction: useFreeVolume ? { kind: 'depletion', q, polymerReservoir: reservoir } : { kind: 'b2', value: b2 },
      b2, contactEnergyKT: contact, rangeSigma: q, q, radiusOfGyrationNm, overlapConcentrationGL: overlap,
      systemPolymerFraction: systemPolymer, reservoirPolymerFraction: reservoir, debyeLengthNm,
      closestApproachNm: null, barrierKT: null,
    };
  }

  if (input.salt) {
    const surfacePotentialMv = requireFinite('particle.surfacePotentialMv', input.particle.surfacePotentialMv as number, 'a surface potential in mV (needed with salt)');
    const hamaker = requirePositive('particle.hamakerJ', input.particle.hamakerJ as number, 'a Hamaker constant in J (needed with salt)');
    const closestApproachNm = requireInRange('closestApproachNm', input.closestApproachNm ?? DEFAULT_CLOSEST_APPROACH_NM, 0, radiusNm, { what: 'a closest surface separation in nm' });
    const debyeNm = debyeLengthNm as number;
    const summary = dlvoReducedB2({
      radius: radiusNm * 1e-9,
      hamaker,
      surfacePotential: surfacePotentialMv * 1e-3,
      inverseDebyeLength: 1 / (debyeNm * 1e-9),
      relativePermittivity: input.solvent.relativePermittivity ?? WATER_RELATIVE_PERMITTIVITY,
      temperature,
    }, closestApproachNm * 1e-9);
    warnings.push(`DLVO with a hard core at a closest surface separation of ${closestApproachNm} nm; results depend on it.`);
    if (radiusNm / debyeNm < 5) warnings.push(`κa = ${(radiusNm / debyeNm).toFixed(2)} < 5: the Derjaguin double-layer formula needs κa ≫ 1.`);
    if (summary.barrier !== null && summary.barrier > 5) warnings.push(`A repulsive barrier of ${summary.barrier.toFixed(1)} kT separates the particles from the primary minimum: the sample may be kinetically stable; B2* assumes the barrier is crossed.`);
    if (summary.b2 === null) warnings.push(`Contact attraction ${(-summary.contactEnergy).toFixed(0)} kT beyond 700 kT: B2* cannot be represented (no solution); placed at the top of the map.`);
    if (input.particle.surfacePotentialMv === undefined) warnings.push('No surface potential given.');
    return {
      ...empty, source: 'salt', warnings, mapModel: genericB2,
      attraction: { kind: 'b2', value: summary.b2 ?? -1e6 },
      b2: summary.b2, contactEnergyKT: -summary.contactEnergy, rangeSigma: summary.range,
      closestApproachNm, barrierKT: summary.barrier,
    };
  }

  warnings.push('No depletant, salt or direct attraction: treated as hard spheres (charge repulsion not modelled).');
  return { ...empty, source: 'none', warnings, mapModel: genericB2, attraction: { kind: 'b2', value: 1 }, b2: 1, contactEnergyKT: 0, rangeSigma: 0 };
}

/**
 * Highest ionic strength (mol/L) at which the Debye length is evaluated. A 2 M 3:3 salt reaches
 * 18 mol/L; long before that the double layer is screened within a fraction of the 0.2–0.5 nm
 * closest approach (0.096 nm at 10 mol/L), so screening as at 10 mol/L leaves van der Waals alone,
 * which is what the formula at the true ionic strength would give too.
 */
const SCREENING_IONIC_STRENGTH_CAP = 10;

function saltDebyeLengthNm(input: PhysicsRecipeInput, temperature: number, warnings: string[]): number {
  const salt = input.salt!;
  const concentration = requireInRange('salt.concentrationMM', salt.concentrationMM, 0, 1e4, { what: 'a salt concentration in mM', highEnd: 'closed' });
  const ionicStrength = symmetricSaltIonicStrength(concentration / 1000, salt.valence);
  if (ionicStrength > SCREENING_IONIC_STRENGTH_CAP) {
    warnings.push(`Ionic strength ${Number(ionicStrength.toPrecision(3))} mol/L is far beyond Debye–Hückel screening; the double layer is taken as screened as at ${SCREENING_IONIC_STRENGTH_CAP} mol/L (negligible next to van der Waals).`);
  }
  const screening = Math.min(ionicStrength, SCREENING_IONIC_STRENGTH_CAP);
  return debyeLength(screening, temperature, input.solvent.relativePermittivity ?? WATER_RELATIVE_PERMITTIVITY) * 1e9;
}
