import { greenwoodTerm, greenwoodVariance } from './greenwood-variance';
import { logLogBand } from './log-log-band';
import type { SurvivalCurve, SurvivalRecord, SurvivalStep } from './types';

/**
 * Kaplan–Meier (product-limit) estimate of the chance that a sample is still standing at age t,
 * from samples that either collapsed at a known age or were last seen standing (right-censored).
 *
 * Ŝ(t) = Π over distinct collapse times tᵢ ≤ t of (1 − dᵢ / nᵢ), where dᵢ samples collapsed at tᵢ
 * and nᵢ were at risk just before it (not yet collapsed, not yet censored). Every distinct time
 * gets a step, also those with censorings only (Ŝ unchanged there), so a plot can mark them.
 * Each step carries Greenwood's variance and the 95 % log(−log) band (greenwoodVariance,
 * logLogBand).
 *
 * Ties: at one time, collapses come before censorings, so a sample last seen standing at t counts
 * as at risk for the collapses at t (the usual convention: Kaplan & Meier 1958, §2; Klein &
 * Moeschberger 2003, §4.2).
 *
 * Source: E. L. Kaplan & P. Meier, J. Am. Stat. Assoc. 53, 457 (1958); Klein & Moeschberger,
 * *Survival Analysis*, 2nd ed. (2003), §4.2; freely readable: Wikipedia, "Kaplan–Meier estimator".
 *
 * Written here because no well-kept npm package offers it (the statistics libraries in use,
 * simple-statistics and the like, have no survival analysis); it is a sort and one pass, O(n log n).
 *
 * Limits: timeDays finite and ≥ 0; collapsed a boolean. No records gives an empty curve.
 * @throws RangeError naming the first record with a bad time or flag
 * @example kaplanMeier([{ timeDays: 6, collapsed: true }, { timeDays: 6, collapsed: false },
 *   { timeDays: 9, collapsed: true }]).steps.map((s) => s.survival) // [0.6667, 0]
 */
export function kaplanMeier(records: readonly SurvivalRecord[]): SurvivalCurve {
  records.forEach(checkRecord);
  const sorted = [...records].sort((a, b) => a.timeDays - b.timeDays);
  const steps: SurvivalStep[] = [];
  let atRisk = sorted.length;
  let survival = 1;
  let greenwoodSum = 0;
  for (let start = 0; start < sorted.length; ) {
    const timeDays = sorted[start].timeDays;
    let events = 0;
    let end = start;
    for (; end < sorted.length && sorted[end].timeDays === timeDays; end++) if (sorted[end].collapsed) events++;
    const censored = end - start - events;
    if (events > 0) {
      survival *= 1 - events / atRisk;
      greenwoodSum = events === atRisk ? Infinity : greenwoodSum + greenwoodTerm(atRisk, events);
    }
    const variance = Number.isFinite(greenwoodSum) ? greenwoodVariance(survival, greenwoodSum) : NaN;
    steps.push({ timeDays, atRisk, events, censored, survival, variance, ...logLogBand(survival, greenwoodSum) });
    atRisk -= end - start;
    start = end;
  }
  const collapseCount = steps.reduce((sum, step) => sum + step.events, 0);
  return { sampleCount: sorted.length, collapseCount, lastTimeDays: sorted.length ? sorted[sorted.length - 1].timeDays : 0, steps };
}

function checkRecord(record: SurvivalRecord, index: number): void {
  if (!(Number.isFinite(record.timeDays) && record.timeDays >= 0)) throw new RangeError(`kaplanMeier: record ${index} has timeDays ${record.timeDays}; times must be finite and ≥ 0`);
  if (typeof record.collapsed !== 'boolean') throw new RangeError(`kaplanMeier: record ${index} has collapsed ${String(record.collapsed)}; it must be true or false`);
}
