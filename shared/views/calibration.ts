import type { CalibratedParameters, CalibrationFit, CalibrationParameter, Estimate, VerdictKind } from '../calibration/types';
import type { PersonRef } from './person';

/** A calibration's life: proposed when fitted; accepted; superseded by a later one or withdrawn. */
export const CALIBRATION_STATUSES = ['proposed', 'accepted', 'superseded', 'withdrawn'] as const;
export type CalibrationStatus = (typeof CALIBRATION_STATUSES)[number];

export const CALIBRATION_STATUS_LABELS: Record<CalibrationStatus, string> = {
  proposed: 'Proposed',
  accepted: 'In use',
  superseded: 'Superseded',
  withdrawn: 'Withdrawn',
};

/** What the history shows of a calibration. */
export interface CalibrationSummaryView {
  id: number;
  programmeId: number;
  status: CalibrationStatus;
  /** The classifier parameters the calibration sets when accepted. */
  parameters: CalibratedParameters;
  fitted: CalibrationParameter[];
  /** The fitted values with their standard errors and intervals (`parameters` holds the numbers in use). */
  estimates: {
    attractionShift: Estimate;
    /** Null when the gel threshold was held at the theory's value. */
    gelB2Threshold: Estimate | null;
  };
  method: CalibrationFit['fit']['method'];
  observationsUsed: number;
  /** Gel-side accuracy on the observations used, theory and calibrated. */
  accuracy: { before: number; after: number };
  /** Gel-side accuracy on held-out observations (k-fold). */
  crossValidated: { folds: number; before: number; after: number };
  verdict: { kind: VerdictKind; text: string };
  modelVersion: string;
  note: string | null;
  fittedBy: PersonRef | null;
  fittedAt: string;
  acceptedBy: PersonRef | null;
  acceptedAt: string | null;
  /** Who superseded or withdrew it, and when. */
  endedBy: PersonRef | null;
  endedAt: string | null;
}

/** One calibration with everything the fit reported. */
export interface CalibrationView extends CalibrationSummaryView {
  result: CalibrationFit;
}

/** A programme's calibrations, newest first, and the one in use (null: the uncalibrated theory). */
export interface CalibrationListView {
  items: CalibrationSummaryView[];
  inUse: CalibrationSummaryView | null;
}

/** What accepting or withdrawing did to the programme's stored predictions. */
export interface PredictionRecompute {
  recipes: number;
  observations: number;
  /** Recipes and ad-hoc observations whose predicted state changed. */
  changedStates: number;
}
