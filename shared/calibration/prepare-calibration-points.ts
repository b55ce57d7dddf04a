import { highestGlassPhi } from '../physics';
import { gelOnset } from './gel-onset';
import { gelSideOutcome } from './gel-side-outcome';
import { LEFT_OUT_REASONS, type CalibrationObservation, type CalibrationPoint, type LeftOutReason } from './types';

/**
 * The observations a calibration can use, each with its gel-side outcome and where its φ enters
 * the spinodal and the binodal; the others counted by why they are left out:
 * - `unclear`: the bench could not tell;
 * - `noAttraction`: no B2* (attraction beyond what the physics can represent) or no φ;
 * - `noMap`: the observation's recipe could not be placed on a map;
 * - `atGlass`: φ at or above the glass line's highest point, where the rule never predicts a gel;
 * - `outOfReach`: φ outside the binodal even at the strongest attraction, so no boundary to
 *   be on either side of.
 * Onsets are computed once per map and φ (observations of one recipe at several ages share them).
 */
export function prepareCalibrationPoints(observations: CalibrationObservation[]): { points: CalibrationPoint[]; leftOut: Record<LeftOutReason, number> } {
  const leftOut = Object.fromEntries(LEFT_OUT_REASONS.map((reason) => [reason, 0])) as Record<LeftOutReason, number>;
  const points: CalibrationPoint[] = [];
  const onsets = new Map<object, Map<number, ReturnType<typeof gelOnset>>>();
  for (const observation of observations) {
    const outcome = gelSideOutcome(observation.observedState);
    if (outcome === null) { leftOut.unclear++; continue; }
    const { phi, reducedB2, map } = observation;
    if (phi === null || reducedB2 === null || !Number.isFinite(phi) || !Number.isFinite(reducedB2)) { leftOut.noAttraction++; continue; }
    if (map === null) { leftOut.noMap++; continue; }
    if (phi >= highestGlassPhi(map)) { leftOut.atGlass++; continue; }
    let byPhi = onsets.get(map);
    if (!byPhi) onsets.set(map, (byPhi = new Map()));
    let onset = byPhi.get(phi);
    if (!onset) byPhi.set(phi, (onset = gelOnset(map, phi)));
    if (onset.binodalB2 === null) { leftOut.outOfReach++; continue; }
    const inBand = reducedB2 <= onset.binodalB2 && (onset.spinodalB2 === null || reducedB2 > onset.spinodalB2);
    points.push({ id: observation.id, phi, reducedB2, observedState: observation.observedState as CalibrationPoint['observedState'], outcome, map, onset, inBand });
  }
  return { points, leftOut };
}
