import { asakuraOosawaReducedB2, freeVolumeFraction, polymerOverlapConcentration, polymerRadiusOfGyration, type ClassifierParameters } from '../physics';
import { deriveRecipe, recipeStateMap, type RecipeMaterials } from '../recipe-derivation';
import { monotoneInterpolant } from './monotone-interpolant';
import { plannedRecipeInput, type PlanTemplate } from './planned-recipe-input';
import { screeningMap } from './screening-map';
import type { CompositionSpace, ValueRange } from './types';

/** Salt doses whose B2* is computed exactly (DLVO, 1–10 ms each); the rest are interpolated. */
export const SALT_TABLE_NODES = 20;
/** Contact attraction above which a depletion composition is not placed (as in the recipe derivation). */
const MAX_CONTACT_KT = 600;
/** Upper ends of the recipe form's doses (shared/schemas/recipes). */
const POLYMER_LIMIT_GL = 1000;
const SALT_LIMIT_MM = 5000;
/** The DLVO Debye length needs some salt; doses below this are computed at it. */
const SALT_FLOOR_MM = 0.01;

const saltB2Cache = new Map<string, number>();

/**
 * The composition space of a plan: φ × polymer (g per litre of solvent) or φ × salt (mM), placed
 * on the programme's map exactly as a saved recipe would be (recipeStateMap, same parameters).
 *
 * Depletion: φ_p = c(1 − φ)/c* with the overlap concentration c* = 3M/(4πN_A R_g³) and
 * φ_p^R = φ_p/α(φ) (free-volume fraction, Lekkerkerker et al. 1992) — the steps of the recipe
 * derivation, written out so 10,000 points cost microseconds; placed at the map's own size ratio
 * on a screening map extended to the largest φ_p^R of the ranges (screeningMap). Beyond 600 kT
 * at contact nothing is placed. With q above free-volume theory's range the recipe uses the
 * generic B2* map, and so does this (one Asakura–Oosawa quadrature per point: slower).
 *
 * Salt: B2* depends on the dose only (DLVO at the particle's surface potential and Hamaker
 * constant). It is computed exactly by the recipe derivation at SALT_TABLE_NODES doses evenly
 * spaced in √c (the Debye length goes as 1/√c) and interpolated between them by a monotone cubic
 * (monotoneInterpolant); exact values are cached across plans.
 *
 * @throws PhysicsArgumentError from the physics when the materials cannot be derived (e.g. salt
 *   with particles that lack a surface potential).
 */
export function compositionSpace(template: PlanTemplate, materials: RecipeMaterials, parameters: Partial<ClassifierParameters> | undefined, phi: ValueRange, levels: ValueRange): CompositionSpace {
  const probe = plannedRecipeInput(template, Math.min(phi.max, Math.max(phi.min, 0.1)), Math.max(levels.min, 1), 'probe');
  const programmeMap = recipeStateMap(probe, materials, parameters);
  if (template.attraction.source === 'depletion') {
    const depletant = materials.depletant;
    if (!depletant) throw new Error('compositionSpace: a depletion plan needs its depletant');
    const molarMass = depletant.molarMassKgMol * 1000;
    const rg = depletant.rgNm ?? polymerRadiusOfGyration(molarMass, depletant.rgPrefactorNm!, depletant.rgExponent!);
    const overlap = polymerOverlapConcentration(molarMass, rg);
    const q = programmeMap.model.kind === 'depletion' ? programmeMap.model.q : rg / materials.particle.radiusNm;
    const contactPerUnit = 1 + 3 / (2 * q);
    const reservoir = (p: number, c: number) => (c * (1 - p)) / overlap / freeVolumeFraction(p, q);
    const top = reservoir(phi.max, levels.max);
    const screened = screeningMap(programmeMap, top);
    const onDepletionMap = programmeMap.model.kind === 'depletion';
    const notes = [`Polymer placed as in the recipe derivation: size ratio q = ${q.toPrecision(3)}, overlap concentration c* = ${overlap.toPrecision(3)} g/L.`];
    return {
      kind: 'depletion',
      map: screened.map,
      place(p, c) {
        const polymerReservoir = reservoir(p, c);
        if (!(polymerReservoir * contactPerUnit <= MAX_CONTACT_KT)) return null;
        return onDepletionMap ? { kind: 'depletion', q, polymerReservoir } : { kind: 'b2', value: asakuraOosawaReducedB2(q, polymerReservoir) };
      },
      level: { name: 'polymer', unit: 'g/L', floor: 0, limit: POLYMER_LIMIT_GL },
      notes,
    };
  }
  const reducedB2At = (c: number) => {
    const dose = Math.max(SALT_FLOOR_MM, c);
    const key = JSON.stringify([materials.particle, materials.solvent, materials.salt?.valence, template.temperatureC, dose]);
    let b2 = saltB2Cache.get(key);
    if (b2 === undefined) {
      const { derived } = deriveRecipe(plannedRecipeInput(template, 0.1, dose, 'probe'), materials, { parameters });
      b2 = derived.reducedB2 ?? -1e6;
      saltB2Cache.set(key, b2);
      if (saltB2Cache.size > 5000) saltB2Cache.delete(saltB2Cache.keys().next().value!);
    }
    return b2;
  };
  const low = Math.sqrt(Math.max(SALT_FLOOR_MM, levels.min));
  const high = Math.sqrt(Math.max(SALT_FLOOR_MM * 1.01, levels.max));
  const roots = Array.from({ length: SALT_TABLE_NODES }, (_, i) => low + ((high - low) * i) / (SALT_TABLE_NODES - 1));
  const interpolate = monotoneInterpolant(roots, roots.map((r) => reducedB2At(r * r)));
  return {
    kind: 'salt',
    map: programmeMap,
    place: (_p, c) => ({ kind: 'b2', value: interpolate(Math.sqrt(Math.max(SALT_FLOOR_MM, c))) }),
    level: { name: 'salt', unit: 'mM', floor: 0, limit: SALT_LIMIT_MM },
    notes: [`Salt screened on B2* computed exactly (DLVO) at ${SALT_TABLE_NODES} doses from ${formatDose(low * low)} to ${formatDose(high * high)} mM and interpolated between them; every listed composition is derived exactly.`],
  };
}

const formatDose = (mM: number) => Number(mM.toPrecision(3)).toString();
