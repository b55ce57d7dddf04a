/**
 * One sample followed on the shelf: its age in days at the check where it was last seen, and
 * whether it had collapsed by then (the event) or was still standing (right-censored: all we
 * know is that it lasted at least that long).
 */
export interface SurvivalRecord {
  timeDays: number;
  collapsed: boolean;
}

/** One step of the Kaplan–Meier curve, at a distinct time where something was recorded. */
export interface SurvivalStep {
  timeDays: number;
  /** Samples still standing and under watch just before this time. */
  atRisk: number;
  /** Collapses seen at this time. */
  events: number;
  /** Samples last seen standing at this time (counted after the collapses: see kaplanMeier). */
  censored: number;
  /** Ŝ(t): the estimated chance that a sample is still standing just after this time. */
  survival: number;
  /** Greenwood's variance of Ŝ(t); NaN once Ŝ has reached 0 (undefined there). */
  variance: number;
  /** Pointwise 95 % band, log(−log) transform, clipped to [0, 1]. */
  low: number;
  high: number;
}

/** A Kaplan–Meier survival curve: a step function, constant between the steps' times. */
export interface SurvivalCurve {
  sampleCount: number;
  collapseCount: number;
  /** The latest time at which any sample was seen (0 with no samples). */
  lastTimeDays: number;
  steps: SurvivalStep[];
}

/** The median time to collapse and its 95 % interval; null where the curve or band never reaches 0.5. */
export interface MedianTimeToCollapse {
  timeDays: number | null;
  low: number | null;
  high: number | null;
}
