import type { SurvivalCurve } from './types';

/**
 * The Kaplan–Meier curve read at age t: Ŝ and its band at the last step at or before t (the curve
 * is a right-continuous step function), 1 before the first step. Past the last check the curve is
 * not known: beyond lastTimeDays this returns null rather than extrapolating.
 *
 * Limits: t finite and ≥ 0.
 * @throws RangeError for a negative or non-finite t
 * @example survivalAt(kaplanMeier(sixMpRemissions), 12) // { survival: 0.7529, low: 0.5032, high: 0.8894 }
 */
export function survivalAt(curve: SurvivalCurve, timeDays: number): { survival: number; low: number; high: number } | null {
  if (!(Number.isFinite(timeDays) && timeDays >= 0)) throw new RangeError(`survivalAt: timeDays must be finite and ≥ 0, got ${timeDays}`);
  if (timeDays > curve.lastTimeDays) return null;
  let reading = { survival: 1, low: 1, high: 1 };
  for (const step of curve.steps) {
    if (step.timeDays > timeDays) break;
    reading = { survival: step.survival, low: step.low, high: step.high };
  }
  return reading;
}
