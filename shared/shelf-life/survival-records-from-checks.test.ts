import { describe, expect, it } from 'vitest';
import { survivalRecordsFromChecks } from './survival-records-from-checks';

// Right censoring at the last check (common practice: Klein & Moeschberger, Survival Analysis,
// 2nd ed. (2003), §1.2). Inputs are test data, not check values.

describe('survivalRecordsFromChecks', () => {
  it('makes one record per mixing date: the first collapse, or the last check as censored', () => {
    const records = survivalRecordsFromChecks([
      { mixedAt: '2026-01-05T00:00:00.000Z', ageDays: 7, observedState: 'gel' },
      { mixedAt: '2026-01-05T00:00:00.000Z', ageDays: 35, observedState: 'collapsed' },
      { mixedAt: '2026-01-05T00:00:00.000Z', ageDays: 21, observedState: 'collapsed' },
      { mixedAt: '2026-02-01T00:00:00.000Z', ageDays: 14, observedState: 'gel' },
      { mixedAt: '2026-02-01T00:00:00.000Z', ageDays: 28, observedState: 'unclear' },
    ]);
    expect(records).toEqual([{ timeDays: 21, collapsed: true, sampleHeightMm: null }, { timeDays: 28, collapsed: false, sampleHeightMm: null }]);
  });

  it('gives each sample the latest fill height recorded among its checks (docs/shelf-life.md), null when none was', () => {
    const records = survivalRecordsFromChecks([
      { mixedAt: '2026-04-01', ageDays: 1, observedState: 'gel', sampleHeightMm: 40 },
      { mixedAt: '2026-04-01', ageDays: 14, observedState: 'gel', sampleHeightMm: 42 },
      { mixedAt: '2026-04-01', ageDays: 28, observedState: 'collapsed' },
      { mixedAt: '2026-04-01', ageDays: 7, observedState: 'gel', sampleHeightMm: 39 },
      { mixedAt: '2026-04-08', ageDays: 3, observedState: 'gel', sampleHeightMm: 61 },
      { mixedAt: '2026-04-15', ageDays: 3, observedState: 'gel', sampleHeightMm: null },
    ]);
    expect(records).toEqual([
      { timeDays: 28, collapsed: true, sampleHeightMm: 42 },
      { timeDays: 3, collapsed: false, sampleHeightMm: 61 },
      { timeDays: 3, collapsed: false, sampleHeightMm: null },
    ]);
  });

  it('leaves out samples never seen as a gel or collapsed, and checks without a usable age', () => {
    expect(survivalRecordsFromChecks([
      { mixedAt: '2026-03-01', ageDays: 3, observedState: 'fluid' },
      { mixedAt: '2026-03-02', ageDays: Number.NaN, observedState: 'gel' },
    ])).toEqual([]);
  });
});
