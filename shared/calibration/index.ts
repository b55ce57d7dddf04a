/**
 * Calibration of the state map's gel boundary to a programme's bench observations: pure
 * functions, no I/O. This file only re-exports.
 */
export * from './types';
export { CalibrationRefused, type RefusalReason } from './calibration-refused';
export { fitCalibration, type CalibrationOptions } from './fit-calibration';
export { fitGelBoundary, type GelBoundaryFitOptions } from './fit-gel-boundary';
export { prepareCalibrationPoints } from './prepare-calibration-points';
export { requireEnoughObservations, MIN_PER_SIDE, MIN_IN_BAND } from './calibration-readiness';
export { agreementTable } from './agreement-table';
export { crossValidateCalibration } from './cross-validate-calibration';
export { calibrationVerdict } from './calibration-verdict';
export { gelSideOutcome } from './gel-side-outcome';
export { gelSideCall } from './gel-side-call';
export { gelOnset } from './gel-onset';
export { gelBoundaryB2 } from './gel-boundary-b2';
export { thresholdDecides } from './threshold-decides';
export { gelOnsetProfile } from './gel-onset-profile';
export { gelBoundaryLine } from './gel-boundary-line';
export { firthLogisticRegression } from './firth-logistic-regression';
export { stratifiedFolds } from './stratified-folds';
export { goldenSectionMaximum } from './golden-section-maximum';
export { waldEstimate, Z_95 } from './wald-estimate';
export { strongestReducedB2 } from './strongest-reduced-b2';
