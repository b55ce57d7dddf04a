import type { ObservedState } from '../states';
import { latestSampleHeightMm } from './latest-sample-height';
import type { SurvivalRecord } from './types';

/** One bench check of a sample: when the sample was mixed, its age at the check, what was seen. */
export interface SampleCheck {
  /** The mixing date (ISO); checks with the same date are the same sample. */
  mixedAt: string;
  ageDays: number;
  observedState: ObservedState;
  /** The fill height recorded at this check (mm), if any. */
  sampleHeightMm?: number | null;
  /** The check's record id, when known: breaks ties between checks at the same age. */
  observationId?: number;
}

/** A sample's survival record with its fill height (latestSampleHeightMm; null when never recorded). */
export interface SampleSurvivalRecord extends SurvivalRecord {
  sampleHeightMm: number | null;
}

/**
 * The survival records of a recipe's samples, from its bench checks. A sample is one mixing date
 * (the bench log records each check of a sample against the date it was mixed). A sample counts
 * once it was seen as a gel or as collapsed — shelf life is the life of a gel; samples never seen
 * as either (they did not gel) are left out. Its record is the first age at which it was seen
 * collapsed (an event), or else the last age at which it was checked (right-censored: it stood
 * at least that long). An "unclear" check still proves the sample was watched up to that age.
 * Common practice of survival analysis (Klein & Moeschberger, Survival Analysis, 2nd ed. (2003),
 * §1.2: right censoring at the last follow-up). Its fill height is the latest one recorded among
 * its checks (latestSampleHeightMm), or null.
 * @example survivalRecordsFromChecks([
 *   { mixedAt: '2026-01-05', ageDays: 7, observedState: 'gel', sampleHeightMm: 40 },
 *   { mixedAt: '2026-01-05', ageDays: 21, observedState: 'collapsed' },
 *   { mixedAt: '2026-02-01', ageDays: 14, observedState: 'gel' },
 * ]) // [{ timeDays: 21, collapsed: true, sampleHeightMm: 40 }, { timeDays: 14, collapsed: false, sampleHeightMm: null }]
 */
export function survivalRecordsFromChecks(checks: readonly SampleCheck[]): SampleSurvivalRecord[] {
  const samples = new Map<string, { gelled: boolean; firstCollapse: number; lastCheck: number; checks: SampleCheck[] }>();
  for (const check of checks) {
    if (!(check.ageDays >= 0) || !Number.isFinite(check.ageDays)) continue;
    const key = check.mixedAt.slice(0, 10);
    const sample = samples.get(key) ?? { gelled: false, firstCollapse: Infinity, lastCheck: -Infinity, checks: [] };
    if (check.observedState === 'gel' || check.observedState === 'collapsed') sample.gelled = true;
    if (check.observedState === 'collapsed') sample.firstCollapse = Math.min(sample.firstCollapse, check.ageDays);
    sample.lastCheck = Math.max(sample.lastCheck, check.ageDays);
    sample.checks.push(check);
    samples.set(key, sample);
  }
  const records: SampleSurvivalRecord[] = [];
  for (const sample of samples.values()) {
    if (!sample.gelled) continue;
    const sampleHeightMm = latestSampleHeightMm(sample.checks);
    records.push(sample.firstCollapse < Infinity ? { timeDays: sample.firstCollapse, collapsed: true, sampleHeightMm } : { timeDays: sample.lastCheck, collapsed: false, sampleHeightMm });
  }
  return records;
}
