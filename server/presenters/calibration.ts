import type { CalibrationSummaryView, CalibrationView } from '../../shared/views/calibration';
import type { Calibration, User } from '../models';

export type LoadedCalibration = Calibration & { fitter?: User | null; acceptor?: User | null; ender?: User | null };

const person = (user: User | null | undefined) => (user ? { id: user.id, name: user.name } : null);

/** A calibration as the history shows it. */
export function presentCalibrationSummary(c: LoadedCalibration): CalibrationSummaryView {
  const result = c.result;
  return {
    id: c.id,
    programmeId: c.programmeId,
    status: c.status,
    parameters: { attractionShift: c.attractionShift, gelB2Threshold: c.gelB2Threshold },
    fitted: result.fitted,
    estimates: { attractionShift: result.fit.attractionShift, gelB2Threshold: result.fit.gelB2Threshold },
    method: result.fit.method,
    observationsUsed: c.observationCount,
    accuracy: { before: result.agreement.before.accuracy, after: result.agreement.after.accuracy },
    crossValidated: { folds: result.crossValidation.folds, before: c.cvAccuracyBefore, after: c.cvAccuracyAfter },
    verdict: result.verdict,
    modelVersion: c.modelVersion,
    note: c.note,
    fittedBy: person(c.fitter),
    fittedAt: c.createdAt.toISOString(),
    acceptedBy: person(c.acceptor),
    acceptedAt: c.acceptedAt ? c.acceptedAt.toISOString() : null,
    endedBy: person(c.ender),
    endedAt: c.endedAt ? c.endedAt.toISOString() : null,
  };
}

/** A calibration with the fit's whole report. */
export function presentCalibration(c: LoadedCalibration): CalibrationView {
  return { ...presentCalibrationSummary(c), result: c.result };
}
