import { gelBoundaryLine } from '@shared/calibration/gel-boundary-line';
import type { CalibratedParameters, GelOnset } from '@shared/calibration/types';
import { Z_95 } from '@shared/calibration/wald-estimate';
import { attractionToMapY } from '@shared/physics/map/attraction-to-map-y';
import { DEFAULT_CLASSIFIER_PARAMETERS } from '@shared/physics/map/classifier-parameters';
import type { StateMap } from '@shared/physics/map/types';
import { drawnY } from './from-state-map';
import type { MapLine, XY } from './types';

/** What the map needs of an accepted calibration. */
export interface CalibrationOverlay {
  parameters: CalibratedParameters;
  shiftStandardError: number;
  /** e.g. "14 Mar 2026", shown in the line's label. */
  dateLabel: string;
}

/**
 * The calibrated gel boundary, its 95 % band (the boundary at shift ± 1.96 SE, dashed) and —
 * when the map itself is drawn calibrated — the uncalibrated theory's gel boundary beside them,
 * as lines in the drawing's coordinates. Each boundary is the computed B2* at which the rule
 * starts calling a gel (shared/calibration gelBoundaryLine), placed on the map's own y axis.
 */
export function calibrationLines(map: StateMap, profile: { phi: number; onset: GelOnset }[], calibration: CalibrationOverlay, drawnCalibrated: boolean): MapLine[] {
  const place = (points: [number, number][]): XY[] =>
    points.map(([phi, b2]) => {
      if (!Number.isFinite(b2)) return [phi, NaN];
      try {
        const y = attractionToMapY(map, { kind: 'b2', value: b2 });
        return [phi, Number.isFinite(y) ? drawnY(map, y) : NaN];
      } catch {
        return [phi, NaN];
      }
    });
  const { attractionShift, gelB2Threshold } = calibration.parameters;
  const spread = Z_95 * calibration.shiftStandardError;
  const band = 'Calibration, 95 % band';
  const lines: MapLine[] = [
    { id: 'calibrated-gel', label: `Calibrated gel boundary, ${calibration.dateLabel}`, points: place(gelBoundaryLine(profile, attractionShift, gelB2Threshold)), dashed: false, approximate: false, tone: 'calibrated' },
    { id: 'calibrated-gel-weak', label: band, points: place(gelBoundaryLine(profile, attractionShift + spread, gelB2Threshold)), dashed: true, approximate: false, tone: 'calibrated' },
    { id: 'calibrated-gel-strong', label: band, points: place(gelBoundaryLine(profile, attractionShift - spread, gelB2Threshold)), dashed: true, approximate: false, tone: 'calibrated' },
  ];
  if (drawnCalibrated) {
    lines.push({ id: 'theory-gel', label: 'Uncalibrated gel boundary', points: place(gelBoundaryLine(profile, 0, DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold)), dashed: false, approximate: true, tone: 'gel' });
  }
  return lines;
}
