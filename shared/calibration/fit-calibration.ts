import { DEFAULT_CLASSIFIER_PARAMETERS } from '../physics';
import { agreementTable } from './agreement-table';
import { requireEnoughObservations } from './calibration-readiness';
import { calibrationVerdict } from './calibration-verdict';
import { crossValidateCalibration } from './cross-validate-calibration';
import { fitGelBoundary } from './fit-gel-boundary';
import { prepareCalibrationPoints } from './prepare-calibration-points';
import type { CalibrationFit, CalibrationObservation, CalibrationParameter } from './types';

const toThousandth = (value: number) => Math.round(value * 1000) / 1000 + 0;

export interface CalibrationOptions {
  /** What to fit; the attraction shift always, the gel threshold when listed. */
  parameters: CalibrationParameter[];
  /** Cross-validation folds (capped at the smaller outcome count). */
  folds: number;
  seed?: number;
}

/**
 * Calibrates the gel boundary of Gelwright's state rule to a programme's bench observations.
 *
 * 1. Outcome: gel side (gel, collapsed) against not (fluid, separated, crystal, glass);
 *    unclear observations and those the rule cannot place are left out (prepareCalibrationPoints).
 * 2. Refuses with too few observations (requireEnoughObservations).
 * 3. Fits the attraction shift, and optionally the gel threshold, by maximum likelihood of a
 *    logistic model in the B2* distance to the boundary (fitGelBoundary), with standard errors.
 * 4. Agreement before (the uncalibrated theory) and after, as predicted × observed tables.
 * 5. Stratified k-fold cross-validated accuracy before and after (crossValidateCalibration).
 * 6. A verdict in plain words (calibrationVerdict).
 * Methods and sources: see each step; logistic regression after McCullagh & Nelder,
 * *Generalized Linear Models*, 2nd ed. (1989), and Agresti, *Categorical Data Analysis*,
 * 3rd ed. (2013).
 *
 * Observations must be placed on uncalibrated maps: the fit is always relative to the theory.
 * @throws CalibrationRefused when the observations cannot support the fit
 */
export function fitCalibration(observations: CalibrationObservation[], options: CalibrationOptions): CalibrationFit {
  const fitThreshold = options.parameters.includes('gelB2Threshold');
  const seed = options.seed ?? 1;
  const theory = { attractionShift: 0, gelB2Threshold: DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold };
  const { points, leftOut } = prepareCalibrationPoints(observations);
  requireEnoughObservations(points, fitThreshold);
  const fitOptions = { fitThreshold, threshold: theory.gelB2Threshold };
  const fit = fitGelBoundary(points, fitOptions);
  // Applied to 0.001 in B2*: far inside any uncertainty a bench gives, and readable where the
  // map writes the parameters into its labels and notes.
  const parameters = { attractionShift: toThousandth(fit.attractionShift.value), gelB2Threshold: toThousandth(fit.threshold) };
  const before = agreementTable(points, theory);
  const after = agreementTable(points, parameters);
  const crossValidation = crossValidateCalibration(points, { ...fitOptions, folds: options.folds, seed }, theory);
  const gelSide = points.filter((p) => p.outcome === 1).length;
  const notes = [
    'Outcome modelled: gel side (gel, or a gel that later collapsed) against not gel (fluid, phase-separated, crystal, glass); unclear observations are left out.',
    `Distance to the boundary measured in B2* along the attraction axis, on each observation's own map (so maps of different size ratios pool into one fit).`,
    fit.method === 'firth'
      ? "The observations are perfectly separated by the boundary at some setting, so ordinary maximum likelihood has no finite answer; the estimates use Firth's penalised likelihood (Firth 1993), which stays finite."
      : 'Estimated by maximum likelihood (iteratively reweighted least squares); uncertainties from the inverse information, the shift by the delta method.',
    fitThreshold
      ? `Gel threshold fitted by profile likelihood; at the estimate it decides the gel call of ${fit.thresholdDecides} observations.`
      : `Gel threshold held at the theory's ${theory.gelB2Threshold}.`,
  ];
  return {
    parameters,
    fitted: fitThreshold ? ['attractionShift', 'gelB2Threshold'] : ['attractionShift'],
    fit,
    observations: {
      offered: observations.length,
      used: points.length,
      gelSide,
      notGelSide: points.length - gelSide,
      inBand: points.filter((p) => p.inBand).length,
      leftOut,
      usedIds: points.map((p) => p.id),
    },
    agreement: { before, after },
    crossValidation,
    verdict: calibrationVerdict(fit, before, after, crossValidation, points.length),
    notes,
  };
}
