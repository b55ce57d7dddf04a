import type { AgreementTable, CrossValidation, GelBoundaryFit, VerdictKind } from './types';

const percent = (share: number) => `${Math.round(share * 100)} %`;
const signed = (value: number) => `${value >= 0 ? '+' : '−'}${Math.abs(value).toFixed(2)}`;

/**
 * The calibration's result in plain words, for the team deciding whether to accept it:
 * - 'generalises': held-out observations are called right more often than by the theory;
 * - 'fits-only': better on the observations it was fitted to, not on held-out ones;
 * - 'no-gain': no better than the theory even on its own observations.
 * and whether the shift is distinguishable from zero (its 95 % interval excludes 0).
 */
export function calibrationVerdict(fit: GelBoundaryFit, before: AgreementTable, after: AgreementTable, cv: CrossValidation, used: number): { kind: VerdictKind; text: string } {
  const heldRightBefore = Math.round(cv.before * used);
  const heldRightAfter = Math.round(cv.after * used);
  let kind: VerdictKind;
  let text: string;
  if (heldRightAfter > heldRightBefore) {
    kind = 'generalises';
    text = `Fitted on the other folds, the calibrated boundary calls ${heldRightAfter} of ${used} held-out observations right (${percent(cv.after)}), the published theory ${heldRightBefore} (${percent(cv.before)}): the calibration carries over to samples it was not fitted to.`;
  } else if (after.accuracy > before.accuracy) {
    kind = 'fits-only';
    text = `The calibrated boundary agrees better with the observations it was fitted to (${percent(after.accuracy)} against ${percent(before.accuracy)}), but not with held-out ones (${percent(cv.after)} against ${percent(cv.before)} for the theory): it describes these samples more than it predicts new ones. Record more samples near the boundary before relying on it.`;
  } else {
    kind = 'no-gain';
    text = `The published theory already calls the gel side as well as the calibration does (${percent(before.accuracy)} against ${percent(after.accuracy)}; held out ${percent(cv.before)} against ${percent(cv.after)}). There is no sign that the theory's boundary needs moving.`;
  }
  const shift = fit.attractionShift;
  const low = shift.low ?? -Infinity;
  const high = shift.high ?? Infinity;
  const excludesZero = low > 0 || high < 0;
  const direction = shift.value > 0 ? 'more attractive' : 'less attractive';
  text += excludesZero
    ? ` The bench behaves as if the samples were ${direction} than computed, by ${signed(shift.value)} ± ${shift.standardError.toFixed(2)} in B2* (95 % interval ${signed(low)} to ${signed(high)}).`
    : ` The fitted shift, ${signed(shift.value)} ± ${shift.standardError.toFixed(2)} in B2*, is within its uncertainty of zero.`;
  if (cv.failedFolds > 0) text += ` ${cv.failedFolds} of ${cv.folds} folds could not be fitted on their own and were predicted with the theory.`;
  return { kind, text };
}
