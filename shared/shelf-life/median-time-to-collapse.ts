import type { MedianTimeToCollapse, SurvivalCurve } from './types';

/**
 * Median time to collapse from a Kaplan–Meier curve, with a 95 % interval read off its band.
 *
 * Median: the earliest time at which Ŝ(t) ≤ 0.5 (Klein & Moeschberger, *Survival Analysis*, 2nd
 * ed. (2003), §4.5; where Ŝ sits at exactly 0.5 over an interval this takes its start, where some
 * programs take the middle). Interval (Brookmeyer & Crowley, Biometrics 38, 29 (1982), by
 * inverting the pointwise band): low is the earliest time at which the band's lower edge is
 * ≤ 0.5 (it gets there first), high the earliest at which its upper edge is ≤ 0.5. Each is null when the curve or edge
 * never gets down to 0.5 within what was watched: the data say only "longer than the last check".
 *
 * Limits: a curve from kaplanMeier (steps in time order).
 * @example medianTimeToCollapse(kaplanMeier(sixMpRemissions)) // { timeDays: 23, low: 13, high: null }
 */
export function medianTimeToCollapse(curve: SurvivalCurve): MedianTimeToCollapse {
  return {
    timeDays: firstTimeAtOrBelowHalf(curve, (step) => step.survival),
    low: firstTimeAtOrBelowHalf(curve, (step) => step.low),
    high: firstTimeAtOrBelowHalf(curve, (step) => step.high),
  };
}

function firstTimeAtOrBelowHalf(curve: SurvivalCurve, value: (step: SurvivalCurve['steps'][number]) => number): number | null {
  for (const step of curve.steps) if (value(step) <= 0.5) return step.timeDays;
  return null;
}
