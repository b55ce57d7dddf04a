import type { GelOnset } from './types';

/**
 * Whether the gel threshold t is the part of the gel boundary that decides at this φ, i.e.
 * B2*_sp < t < B2*_bin (see gelBoundaryB2): there dG/dt = 1, elsewhere 0. The derivative of the
 * logistic model with respect to the threshold, and so the threshold's information, comes only
 * from such observations.
 *
 * @example thresholdDecides({ spinodalB2: -4, binodalB2: -1.8 }, -3) // true
 */
export function thresholdDecides(onset: GelOnset, threshold: number): boolean {
  if (onset.binodalB2 === null || !(threshold < onset.binodalB2)) return false;
  return onset.spinodalB2 === null || threshold > onset.spinodalB2;
}
