import { medianTimeToCollapse } from './median-time-to-collapse';
import type { SurvivalCurve } from './types';

/**
 * The survival curve in plain words, for a panel or a dossier line:
 * - no samples: "no samples checked yet";
 * - no collapse: "no collapse seen in N samples up to T days";
 * - median reached: "half collapsed by M days (95 % interval L–H days; K collapses in N samples)",
 *   with "L days or later" when the band's upper edge never reaches 0.5;
 * - median not reached: "more than half still standing at T days (K collapses in N samples)".
 * Whole days print as such, other ages with one decimal.
 * @example describeSurvival(kaplanMeier([{ timeDays: 30, collapsed: false }, { timeDays: 42, collapsed: false }]))
 *   // "no collapse seen in 2 samples up to 42 days"
 */
export function describeSurvival(curve: SurvivalCurve): string {
  const n = curve.sampleCount;
  if (n === 0) return 'no samples checked yet';
  const samples = `${n} sample${n === 1 ? '' : 's'}`;
  if (curve.collapseCount === 0) return `no collapse seen in ${samples} up to ${days(curve.lastTimeDays)}`;
  const collapses = `${curve.collapseCount} collapse${curve.collapseCount === 1 ? '' : 's'} in ${samples}`;
  const median = medianTimeToCollapse(curve);
  if (median.timeDays === null) return `more than half still standing at ${days(curve.lastTimeDays)} (${collapses})`;
  // The band's lower edge is below Ŝ, so it reaches 0.5 no later than Ŝ does: low is set here.
  const low = formatDays(median.low ?? median.timeDays);
  const interval = median.high === null ? `${low} days or later` : `${low}–${formatDays(median.high)} days`;
  return `half collapsed by ${days(median.timeDays)} (95 % interval ${interval}; ${collapses})`;
}

function days(value: number): string {
  return `${formatDays(value)} day${value === 1 ? '' : 's'}`;
}

function formatDays(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toFixed(1);
}
