import type { PredictedState, StateMap } from '../physics';
import type { ObservedState } from '../states';

/** The classifier parameters a calibration can fit (see shared/physics classifier-parameters). */
export const CALIBRATION_PARAMETERS = ['attractionShift', 'gelB2Threshold'] as const;
export type CalibrationParameter = (typeof CALIBRATION_PARAMETERS)[number];

/** The classifier parameters a calibration sets: the one shape of them everywhere. */
export type CalibratedParameters = Record<CalibrationParameter, number>;

/** One bench observation offered to the fit, placed by its φ and computed B2*. */
export interface CalibrationObservation {
  id: number;
  phi: number | null;
  reducedB2: number | null;
  observedState: ObservedState;
  /** The uncalibrated map the observation is predicted on, or null when it cannot be placed. */
  map: StateMap | null;
}

/**
 * Where, at one φ, a sample moving toward stronger attraction enters the spinodal and the
 * binodal of the theory (B2* of the theory frame, no shift); null when it never does on the map.
 */
export interface GelOnset {
  spinodalB2: number | null;
  binodalB2: number | null;
}

/** An observation the fit uses: outcome 1 when the bench saw the gel side (gel or collapsed). */
export interface CalibrationPoint {
  id: number;
  phi: number;
  reducedB2: number;
  observedState: Exclude<ObservedState, 'unclear'>;
  outcome: 0 | 1;
  map: StateMap;
  onset: GelOnset;
  /** Between the binodal and the spinodal at its own φ and B2* (theory frame): where the gel threshold decides. */
  inBand: boolean;
}

/** Why an observation is not used. */
export const LEFT_OUT_REASONS = ['unclear', 'noAttraction', 'noMap', 'atGlass', 'outOfReach'] as const;
export type LeftOutReason = (typeof LEFT_OUT_REASONS)[number];

/**
 * A fitted value with its standard error and a 95 % interval (Wald, value ± 1.96 SE, unless the
 * fit says otherwise); an end is null when the observations do not bound it.
 */
export interface Estimate {
  value: number;
  standardError: number;
  low: number | null;
  high: number | null;
}

export type FitMethod = 'maximum-likelihood' | 'firth';

/** The logistic fit of the gel boundary (see fitGelBoundary). */
export interface GelBoundaryFit {
  method: FitMethod;
  attractionShift: Estimate;
  /** Null when the threshold was held at `threshold` rather than fitted. */
  gelB2Threshold: Estimate | null;
  threshold: number;
  /** β₁: the logit of "gel side" rises by this much per unit B2* of extra attraction. */
  sharpness: Estimate;
  logLikelihood: number;
  /** Covariance of (β₀, β₁[, threshold]) from the inverse information. */
  covariance: number[][];
  /** Observations whose gel call the threshold decides at the estimate. */
  thresholdDecides: number;
}

/** Predicted × observed counts over the observations used. */
export interface AgreementTable {
  predicted: PredictedState[];
  observed: Exclude<ObservedState, 'unclear'>[];
  /** counts[i][j]: predicted[i] and observed[j]. */
  counts: number[][];
  /** The gel-side call against what the bench saw. */
  gelSide: { truePositive: number; falsePositive: number; falseNegative: number; trueNegative: number };
  /** Fraction of gel-side calls that are right. */
  accuracy: number;
  /** Fraction whose predicted state is the observed one (a collapsed gel counts as gel). */
  sameState: number;
}

export interface CrossValidation {
  folds: number;
  seed: number;
  /** Gel-side accuracy of the theory on the held-out observations (nothing is fitted, so its plain accuracy). */
  before: number;
  /** Gel-side accuracy on the held-out observations of boundaries fitted to the other folds. */
  after: number;
  /** Folds whose training part could not be fitted; their observations are predicted with the theory. */
  failedFolds: number;
  perFold: { held: number; rightBefore: number; rightAfter: number; fitted: boolean }[];
}

export type VerdictKind = 'generalises' | 'fits-only' | 'no-gain';

/** Everything a calibration reports. */
export interface CalibrationFit {
  /** The classifier parameters to use when the calibration is accepted. */
  parameters: CalibratedParameters;
  fitted: CalibrationParameter[];
  fit: GelBoundaryFit;
  observations: {
    offered: number;
    used: number;
    gelSide: number;
    notGelSide: number;
    inBand: number;
    leftOut: Record<LeftOutReason, number>;
    usedIds: number[];
  };
  agreement: { before: AgreementTable; after: AgreementTable };
  crossValidation: CrossValidation;
  verdict: { kind: VerdictKind; text: string };
  notes: string[];
}
