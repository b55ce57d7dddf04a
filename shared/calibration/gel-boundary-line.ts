import { gelBoundaryB2 } from './gel-boundary-b2';
import type { GelOnset } from './types';

/**
 * The rule's gel boundary under an attraction shift s and gel threshold t, as [φ, B2*] points of
 * the computed B2* where a sample starts being called a gel: G_φ(t) + s (gelBoundaryB2). NaN
 * where no gel is reached at that φ, so a line drawn through the points breaks there.
 * @example gelBoundaryLine(profile, 0.5, -3)[0] // [0.002, NaN]
 */
export function gelBoundaryLine(profile: { phi: number; onset: GelOnset }[], attractionShift: number, gelB2Threshold: number): [number, number][] {
  return profile.map(({ phi, onset }) => {
    const boundary = gelBoundaryB2(onset, gelB2Threshold);
    return [phi, boundary === null ? NaN : boundary + attractionShift];
  });
}
