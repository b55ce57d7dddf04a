import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import type { ClassifierParameters } from './types';

/**
 * Default thresholds of Gelwright's state rule (physics.md §5). Every one can be moved by a
 * calibration against the team's observations; each default has a source:
 * - attractionShift 0 — shift of the attraction scale in B2* units. Every point is classified at
 *   B2*_effective = B2*_computed − attractionShift; a positive shift says "our samples are more
 *   attractive than the theory computes" and moves every drawn boundary toward weaker attraction.
 * - gelB2Threshold −1.5 — inside the binodal but outside the spinodal, B2*_effective ≤ this
 *   arrests into a gel, above it the sample separates slowly. Lu et al. (Nature 453, 499 (2008))
 *   found that short-range attractive colloids gel wherever the quench enters the two-phase
 *   region, mapped through B2* by the extended law of corresponding states: the threshold is the
 *   gas–liquid critical value B2*_c ≈ −1.5 (Vliegenthart & Lekkerkerker, J. Chem. Phys. 112, 5364
 *   (2000); Noro & Frenkel, J. Chem. Phys. 113, 2941 (2000); from memory). With it every binodal
 *   point of the short-range models gels; a calibration can lower it where the bench sees slow
 *   separation.
 * - glassPhi 0.58 — the observed glass transition of hard-sphere colloids (Pusey & van Megen,
 *   Nature 320, 340 (1986), from memory): the mode-coupling glass line (hard spheres at
 *   φ_c = 0.5159) is rescaled onto it unless the map asks for the computed line.
 * - polydispersityCrystalThreshold 12 % — above it crystallisation is taken as suppressed and the
 *   crystal region greyed (common practice quotes 8–12 %).
 */
/** Highest observed glass φ accepted: the rescaled re-entrant nose (×1.082 of it) stays below φ_cp. */
export const MAX_GLASS_PHI = 0.66;

/** Where the default gel threshold comes from, in words a screen can show beside it. */
export const GEL_THRESHOLD_SOURCE = 'the gas–liquid critical B2* ≈ −1.5, because Lu et al. (Nature 453, 499 (2008)) saw short-range attractive colloids gel wherever the quench entered the two-phase region';

export const DEFAULT_CLASSIFIER_PARAMETERS: Readonly<ClassifierParameters> = Object.freeze({
  attractionShift: 0,
  gelB2Threshold: -1.5,
  glassPhi: 0.58,
  polydispersityCrystalThreshold: 12,
});

/**
 * Complete and check a (partial) set of classifier parameters.
 *
 * Limits: attractionShift in [−20, 20]; gelB2Threshold in [−100, 1]; glassPhi in [0.5, 0.66]
 * (the rescaled line's nose must stay below close packing); polydispersityCrystalThreshold in
 * [0, 100] %. Unknown keys (e.g. the retired attractive-glass placeholders of stored
 * calibrations) are dropped.
 *
 * @throws PhysicsArgumentError naming the parameter (e.g. `parameters.glassPhi must be …`).
 * @example resolveClassifierParameters({ gelB2Threshold: -4 }).glassPhi // 0.58
 */
export function resolveClassifierParameters(parameters: Partial<ClassifierParameters> = {}): ClassifierParameters {
  if (parameters === null || typeof parameters !== 'object') {
    throw new PhysicsArgumentError('parameters', 'an object of classifier parameters', parameters);
  }
  const given = definedOnly(parameters);
  const merged: ClassifierParameters = {
    attractionShift: given.attractionShift ?? DEFAULT_CLASSIFIER_PARAMETERS.attractionShift,
    gelB2Threshold: given.gelB2Threshold ?? DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold,
    glassPhi: given.glassPhi ?? DEFAULT_CLASSIFIER_PARAMETERS.glassPhi,
    polydispersityCrystalThreshold: given.polydispersityCrystalThreshold ?? DEFAULT_CLASSIFIER_PARAMETERS.polydispersityCrystalThreshold,
  };
  requireInRange('parameters.attractionShift', merged.attractionShift, -20, 20, { what: 'a B2* shift', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('parameters.gelB2Threshold', merged.gelB2Threshold, -100, 1, { what: 'a reduced second virial coefficient', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('parameters.glassPhi', merged.glassPhi, 0.5, MAX_GLASS_PHI, { what: 'a volume fraction', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('parameters.polydispersityCrystalThreshold', merged.polydispersityCrystalThreshold, 0, 100, { what: 'a polydispersity in %', lowEnd: 'closed', highEnd: 'closed' });
  return merged;
}

function definedOnly(parameters: Partial<ClassifierParameters>): Partial<ClassifierParameters> {
  return Object.fromEntries(Object.entries(parameters).filter(([, value]) => value !== undefined)) as Partial<ClassifierParameters>;
}

