import { latestSampleHeightMm } from '../shelf-life/latest-sample-height';
import type { ObservedState } from '../states';
import { nextCheckAge } from './next-check-age';
import { sampleAgeDays } from './sample-age-days';

/** One live (unarchived) bench check of a recipe's sample. */
export interface ScheduledCheck {
  observationId: number;
  recipeId: number;
  /** ISO mixing date; checks whose dates fall on the same day are one sample (as in survivalRecordsFromChecks). */
  mixedAt: string;
  ageDays: number;
  observedState: ObservedState;
  /** The fill height recorded at this check (mm), if any. */
  sampleHeightMm?: number | null;
}

export interface DueSample {
  recipeId: number;
  mixedAt: string;
  lastCheck: { observationId: number; ageDays: number; observedState: ObservedState };
  /** The sample's fill height: the latest recorded among its checks (latestSampleHeightMm), or null. */
  sampleHeightMm: number | null;
  dueAgeDays: number;
  ageTodayDays: number;
}

/**
 * The samples due for a check at `now`. A sample (recipe + mixing day) is due when
 * - its recipe has a schedule (`schedules`: recipe id → ages in days),
 * - none of its checks saw it collapsed (a collapse ends its shelf life: nothing more to watch),
 * - and the next scheduled age after its last check (the greatest age; ties by the later record)
 *   has been reached: whole days since mixing ≥ that age.
 * Each carries the sample's fill height (the latest recorded among its checks), so a check made
 * from the list can record it again.
 * Most overdue first (today's age minus the due age), then recipe, then mixing date, so the
 * list is the same on every call.
 * @example dueSamples([{ observationId: 1, recipeId: 9, mixedAt: '2026-06-01', ageDays: 3, observedState: 'gel' }],
 *   new Map([[9, [1, 3, 7]]]), new Date('2026-06-09')) // [{ recipeId: 9, dueAgeDays: 7, ageTodayDays: 8, … }]
 */
export function dueSamples(checks: readonly ScheduledCheck[], schedules: ReadonlyMap<number, readonly number[]>, now: Date): DueSample[] {
  const samples = new Map<string, { last: ScheduledCheck; collapsed: boolean; checks: ScheduledCheck[] }>();
  for (const check of checks) {
    if (!schedules.has(check.recipeId)) continue;
    const key = `${check.recipeId}|${check.mixedAt.slice(0, 10)}`;
    const sample = samples.get(key);
    const collapsed = check.observedState === 'collapsed';
    if (!sample) {
      samples.set(key, { last: check, collapsed, checks: [check] });
      continue;
    }
    sample.collapsed ||= collapsed;
    sample.checks.push(check);
    if (check.ageDays > sample.last.ageDays || (check.ageDays === sample.last.ageDays && check.observationId > sample.last.observationId)) sample.last = check;
  }
  const due: DueSample[] = [];
  for (const { last, collapsed, checks: sampleChecks } of samples.values()) {
    if (collapsed) continue;
    const dueAgeDays = nextCheckAge(schedules.get(last.recipeId)!, last.ageDays);
    if (dueAgeDays === null) continue;
    const ageTodayDays = sampleAgeDays(last.mixedAt, now);
    if (ageTodayDays < dueAgeDays) continue;
    due.push({
      recipeId: last.recipeId,
      mixedAt: last.mixedAt,
      lastCheck: { observationId: last.observationId, ageDays: last.ageDays, observedState: last.observedState },
      sampleHeightMm: latestSampleHeightMm(sampleChecks),
      dueAgeDays,
      ageTodayDays,
    });
  }
  return due.sort((a, b) => b.ageTodayDays - b.dueAgeDays - (a.ageTodayDays - a.dueAgeDays) || a.recipeId - b.recipeId || a.mixedAt.localeCompare(b.mixedAt));
}
