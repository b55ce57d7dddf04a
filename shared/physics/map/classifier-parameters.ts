import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import type { ClassifierParameters } from './types';

/**
 * Default thresholds of Gelwright's state rule (physics.md §5). Every one is meant to be moved
 * by a calibration against the team's observations; the values below are starting points:
 * - attractionShift 0 — shift of the attraction scale in B2* units. Every point is classified at
 *   B2*_effective = B2*_computed − attractionShift; a positive shift says "our samples are more
 *   attractive than the theory computes" and moves every drawn boundary toward weaker attraction.
 * - gelB2Threshold −3 — inside the binodal but outside the spinodal, B2*_effective ≤ −3 counts
 *   as a deep quench that arrests into a gel; above it the sample separates slowly. Placed well
 *   below the critical B2* (−1.65 mean field, −1.56 Percus–Yevick); not from a source.
 * - glassPhi 0.58 — repulsive glass transition of hard-sphere colloids (Pusey & van Megen,
 *   Nature 320, 340 (1986), from memory).
 * - polydispersityCrystalThreshold 12 % — above it crystallisation is taken as suppressed and the
 *   crystal region greyed (common practice quotes 8–12 %).
 * - attractiveGlassB2 −4 and attractiveGlassSlope 20 — the approximate attractive-glass line
 *   B2*_AG(φ) = attractiveGlassB2 − attractiveGlassSlope·(glassPhi − φ): at φ = glassPhi it sits
 *   at B2* = −4 and needs 2 units of B2* more attraction per 0.1 lower φ. Re-entrant and
 *   attractive glasses are established (Pham et al., Science 296, 104 (2002)) but there are no
 *   reliable numbers; these are placeholders to be calibrated, drawn as approximate.
 */
export const DEFAULT_CLASSIFIER_PARAMETERS: Readonly<ClassifierParameters> = Object.freeze({
  attractionShift: 0,
  gelB2Threshold: -3,
  glassPhi: 0.58,
  polydispersityCrystalThreshold: 12,
  attractiveGlassB2: -4,
  attractiveGlassSlope: 20,
});

/**
 * Complete and check a (partial) set of classifier parameters.
 *
 * Limits: attractionShift in [−20, 20]; gelB2Threshold and attractiveGlassB2 in [−100, 1];
 * glassPhi in [0.5, φ_cp); polydispersityCrystalThreshold in [0, 100] %; attractiveGlassSlope in
 * [0, 1000].
 *
 * @throws PhysicsArgumentError naming the parameter (e.g. `parameters.glassPhi must be …`).
 * @example resolveClassifierParameters({ gelB2Threshold: -4 }).glassPhi // 0.58
 */
export function resolveClassifierParameters(parameters: Partial<ClassifierParameters> = {}): ClassifierParameters {
  if (parameters === null || typeof parameters !== 'object') {
    throw new PhysicsArgumentError('parameters', 'an object of classifier parameters', parameters);
  }
  const merged: ClassifierParameters = { ...DEFAULT_CLASSIFIER_PARAMETERS, ...definedOnly(parameters) };
  requireInRange('parameters.attractionShift', merged.attractionShift, -20, 20, { what: 'a B2* shift', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('parameters.gelB2Threshold', merged.gelB2Threshold, -100, 1, { what: 'a reduced second virial coefficient', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('parameters.glassPhi', merged.glassPhi, 0.5, FCC_CLOSE_PACKING, { what: 'a volume fraction', lowEnd: 'closed' });
  requireInRange('parameters.polydispersityCrystalThreshold', merged.polydispersityCrystalThreshold, 0, 100, { what: 'a polydispersity in %', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('parameters.attractiveGlassB2', merged.attractiveGlassB2, -100, 1, { what: 'a reduced second virial coefficient', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('parameters.attractiveGlassSlope', merged.attractiveGlassSlope, 0, 1000, { what: 'a slope dB2*/dφ', lowEnd: 'closed', highEnd: 'closed' });
  return merged;
}

function definedOnly(parameters: Partial<ClassifierParameters>): Partial<ClassifierParameters> {
  return Object.fromEntries(Object.entries(parameters).filter(([, value]) => value !== undefined)) as Partial<ClassifierParameters>;
}

/** B2* of the approximate attractive-glass line at φ (theory frame). */
export function attractiveGlassLineB2(phi: number, parameters: ClassifierParameters): number {
  return parameters.attractiveGlassB2 - parameters.attractiveGlassSlope * (parameters.glassPhi - phi);
}
