import { fitGelBoundary, type GelBoundaryFitOptions } from './fit-gel-boundary';
import { gelSideCall } from './gel-side-call';
import { stratifiedFolds } from './stratified-folds';
import type { CalibratedParameters, CalibrationPoint, CrossValidation } from './types';

/**
 * k-fold cross-validated gel-side accuracy of the calibration, beside the theory's: each fold is
 * held out once, the boundary is fitted to the other folds with the same options, and the
 * held-out observations are called with it. The theory fits nothing, so its held-out accuracy
 * is its plain accuracy. A fold whose training part cannot be fitted is predicted with the
 * theory (counted in `failedFolds`), which can only make the calibration look worse, never better.
 * Folds are stratified by outcome (stratifiedFolds) and seeded, so the result is reproducible;
 * k is capped at the smaller outcome count. Source: Hastie, Tibshirani & Friedman, *The
 * Elements of Statistical Learning*, 2nd ed. (2009), §7.10.
 *
 * @param theory the uncalibrated parameters (shift 0 and the maps' gel threshold)
 */
export function crossValidateCalibration(
  points: CalibrationPoint[],
  options: GelBoundaryFitOptions & { folds: number; seed: number },
  theory: CalibratedParameters,
): CrossValidation {
  const outcomes = points.map((p) => p.outcome);
  const ones = outcomes.filter((o) => o === 1).length;
  const k = Math.max(2, Math.min(options.folds, ones, points.length - ones));
  const perFold: CrossValidation['perFold'] = [];
  let rightBefore = 0;
  let rightAfter = 0;
  for (const split of stratifiedFolds(outcomes, k, options.seed)) {
    let fitted: { shift: number; threshold: number } | null = null;
    try {
      const fit = fitGelBoundary(split.train.map((i) => points[i]), options);
      fitted = { shift: fit.attractionShift.value, threshold: fit.threshold };
    } catch {
      fitted = null;
    }
    const held = split.test.map((i) => points[i]);
    const before = held.filter((p) => gelSideCall(p, theory.attractionShift, theory.gelB2Threshold) === p.outcome).length;
    const after = fitted ? held.filter((p) => gelSideCall(p, fitted.shift, fitted.threshold) === p.outcome).length : before;
    rightBefore += before;
    rightAfter += after;
    perFold.push({ held: held.length, rightBefore: before, rightAfter: after, fitted: fitted !== null });
  }
  return {
    folds: k,
    seed: options.seed,
    before: rightBefore / points.length,
    after: rightAfter / points.length,
    failedFolds: perFold.filter((f) => !f.fitted).length,
    perFold,
  };
}
