import type { GelOnset } from './types';

/**
 * B2* (theory frame) at which the gel rule of physics.md §5 starts calling a sample at this φ a
 * gel, for a gel threshold t: inside the spinodal always, inside the binodal when B2* ≤ t. Moving
 * toward stronger attraction the sample enters the binodal at B2*_bin and the spinodal at
 * B2*_sp ≤ B2*_bin, so the boundary is
 *   G(t) = max(B2*_sp, min(t, B2*_bin))   (only min(t, B2*_bin) where the spinodal is out of reach).
 * With an attraction shift s, a sample of computed B2* is on the gel side when B2* − s ≤ G(t).
 *
 * @returns G(t), or null when the binodal is out of reach (never a gel at this φ).
 * @example gelBoundaryB2({ spinodalB2: -2.5, binodalB2: -1.8 }, -3) // -2.5 (the spinodal decides)
 */
export function gelBoundaryB2(onset: GelOnset, threshold: number): number | null {
  if (onset.binodalB2 === null) return null;
  const binodalPart = Math.min(threshold, onset.binodalB2);
  return onset.spinodalB2 === null ? binodalPart : Math.max(onset.spinodalB2, binodalPart);
}
