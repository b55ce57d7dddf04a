import { gelBoundaryB2 } from './gel-boundary-b2';
import type { CalibrationPoint } from './types';

/**
 * The rule's gel-side call for an observation under an attraction shift s and gel threshold t:
 * 1 when B2* − s ≤ G_φ(t) (gelBoundaryB2). The same call classifyPoint makes ("gel") with those
 * parameters on the observation's map — a test checks it — without rebuilding anything.
 * @example gelSideCall(point, 0.4, -3) // 1
 */
export function gelSideCall(point: CalibrationPoint, attractionShift: number, gelB2Threshold: number): 0 | 1 {
  const boundary = gelBoundaryB2(point.onset, gelB2Threshold);
  return boundary !== null && point.reducedB2 - attractionShift <= boundary ? 1 : 0;
}
