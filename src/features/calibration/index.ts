/** Calibration. Other features read a programme's calibrations (the one in use draws the map's calibrated lines). */
export { calibrationKeys } from './api/calibration-keys';
export { calibrationsQueryOptions, useCalibrations } from './api/get-calibrations';
