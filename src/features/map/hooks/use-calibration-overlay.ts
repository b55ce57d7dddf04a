import { useMemo } from 'react';
import { gelOnsetProfile } from '@shared/calibration/gel-onset-profile';
import type { StateMap } from '@shared/physics/map/types';
import { calibrationLines, type CalibrationOverlay } from '../geometry/calibration-lines';
import type { MapLine } from '../geometry/types';

/**
 * The calibration's lines for a built map, or none. The onset profile (the costly part, tens of
 * milliseconds) is computed once per map; the lines once per calibration.
 */
export function useCalibrationOverlay(map: StateMap | null, calibration: CalibrationOverlay | null, drawnCalibrated: boolean): MapLine[] {
  const profile = useMemo(() => (map && calibration ? gelOnsetProfile(map) : null), [map, calibration !== null]);
  const key = calibration ? JSON.stringify(calibration) : '';
  return useMemo(() => (map && calibration && profile ? calibrationLines(map, profile, calibration, drawnCalibrated) : []), [map, profile, key, drawnCalibrated]);
}
