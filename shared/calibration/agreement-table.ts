import { classifyPoint, type ClassifierParameters } from '../physics';
import { observationAgrees, PREDICTED_STATES } from '../states';
import type { AgreementTable, CalibrationPoint } from './types';

const OBSERVED: AgreementTable['observed'] = ['fluid', 'gel', 'collapsed', 'separated', 'crystal', 'glass'];

/**
 * Predicted × observed counts of the observations used, with the classifier at the given
 * parameters on each observation's own map (placed by its B2*), and two summaries:
 * `accuracy`, the share of right gel-side calls (predicted gel ↔ observed gel or collapsed) —
 * the call the calibration fits — and `sameState`, the share whose predicted state is the one
 * observed (collapsed counted as gel). A confusion matrix in the sense of any text on
 * classification, e.g. Hastie, Tibshirani & Friedman, *The Elements of Statistical Learning*,
 * 2nd ed. (2009).
 *
 * @param parameters classifier parameters to apply on top of each map's own (e.g. a calibration)
 * @example agreementTable(points, { attractionShift: 0.5 }).accuracy // 0.85
 */
export function agreementTable(points: CalibrationPoint[], parameters: Partial<ClassifierParameters>): AgreementTable {
  const counts = PREDICTED_STATES.map(() => OBSERVED.map(() => 0));
  const gelSide = { truePositive: 0, falsePositive: 0, falseNegative: 0, trueNegative: 0 };
  let same = 0;
  for (const p of points) {
    const predicted = classifyPoint(p.map, { phi: p.phi, attraction: { kind: 'b2', value: p.reducedB2 } }, parameters).state;
    counts[PREDICTED_STATES.indexOf(predicted)][OBSERVED.indexOf(p.observedState)]++;
    const predictedGel = predicted === 'gel';
    if (predictedGel && p.outcome === 1) gelSide.truePositive++;
    else if (predictedGel) gelSide.falsePositive++;
    else if (p.outcome === 1) gelSide.falseNegative++;
    else gelSide.trueNegative++;
    if (observationAgrees(p.observedState, predicted) === true) same++;
  }
  const n = points.length;
  return {
    predicted: [...PREDICTED_STATES],
    observed: [...OBSERVED],
    counts,
    gelSide,
    accuracy: n === 0 ? 0 : (gelSide.truePositive + gelSide.trueNegative) / n,
    sameState: n === 0 ? 0 : same / n,
  };
}
