import { describe, expect, it } from 'vitest';
import { seededRandom } from '../seeded-random';
import type { ObservedState } from '../states';
import { dueSamples, type ScheduledCheck } from './due-samples';
import { nextCheckAge } from './next-check-age';
import { sampleAgeDays } from './sample-age-days';

const SCHEDULE = [1, 3, 7, 14, 28, 56];
let id = 0;
const check = (recipeId: number, mixedAt: string, ageDays: number, observedState: ObservedState = 'gel'): ScheduledCheck => ({ observationId: ++id, recipeId, mixedAt, ageDays, observedState });

describe('sampleAgeDays', () => {
  it('counts whole days elapsed since mixing (calendar counted by hand)', () => {
    // 1 June → 8 June is 7 days; 31 January → 1 March 2028 (a leap year) is 30 days (derived by counting).
    expect(sampleAgeDays('2026-06-01T00:00:00.000Z', new Date('2026-06-08T09:30:00Z'))).toBe(7);
    expect(sampleAgeDays('2026-06-01T00:00:00.000Z', new Date('2026-06-07T23:59:59Z'))).toBe(6);
    expect(sampleAgeDays('2028-01-31', new Date('2028-03-01T00:00:00Z'))).toBe(30);
    expect(sampleAgeDays('2026-06-10', new Date('2026-06-08'))).toBe(-2);
    expect(() => sampleAgeDays('not a date', new Date())).toThrow(RangeError);
  });
});

describe('nextCheckAge', () => {
  it('takes the first scheduled age after the last check, or null when the schedule is used up', () => {
    expect(nextCheckAge(SCHEDULE, 0)).toBe(1);
    expect(nextCheckAge(SCHEDULE, 7)).toBe(14);
    expect(nextCheckAge(SCHEDULE, 10)).toBe(14);
    expect(nextCheckAge(SCHEDULE, 56)).toBeNull();
  });
});

describe('dueSamples', () => {
  const now = new Date('2026-06-20T12:00:00Z');
  it('lists a standing sample whose next scheduled age has come, and not one checked on time, collapsed or unscheduled', () => {
    const checks = [
      // Mixed 1 June, last checked at 7 days; on 20 June it is 19 days old, so the 14-day check is 5 days overdue.
      check(1, '2026-06-01T00:00:00.000Z', 1), check(1, '2026-06-01T00:00:00.000Z', 7),
      // Mixed 10 June, checked at 7 days; 10 days old now, next check at 14: not yet.
      check(1, '2026-06-10T00:00:00.000Z', 7),
      // Mixed 1 June, collapsed at 3 days: finished.
      check(1, '2026-06-01T08:00:00.000Z', 1, 'unclear'),
      check(2, '2026-06-01T00:00:00.000Z', 1), check(2, '2026-06-01T00:00:00.000Z', 3, 'collapsed'),
      // Recipe 3 has no schedule.
      check(3, '2026-05-01T00:00:00.000Z', 1),
      // Mixed 18 June, never checked beyond age 0: 2 days old, the 1-day check is 1 day overdue.
      check(2, '2026-06-18T00:00:00.000Z', 0, 'fluid'),
    ];
    const due = dueSamples(checks, new Map([[1, SCHEDULE], [2, SCHEDULE]]), now);
    expect(due).toEqual([
      // Recipe 1, 1 June: its two mixing times that day are one sample (as survivalRecordsFromChecks groups them);
      // the last check is the 7-day one.
      { recipeId: 1, mixedAt: '2026-06-01T00:00:00.000Z', lastCheck: { observationId: 2, ageDays: 7, observedState: 'gel' }, sampleHeightMm: null, dueAgeDays: 14, ageTodayDays: 19 },
      { recipeId: 2, mixedAt: '2026-06-18T00:00:00.000Z', lastCheck: { observationId: checks[7].observationId, ageDays: 0, observedState: 'fluid' }, sampleHeightMm: null, dueAgeDays: 1, ageTodayDays: 2 },
    ]);
  });

  it('carries the sample\'s latest recorded fill height, even when its last check gave none (the rule of docs/shelf-life.md)', () => {
    const checks = [
      { ...check(5, '2026-06-01T00:00:00.000Z', 1), sampleHeightMm: 45 },
      { ...check(5, '2026-06-01T00:00:00.000Z', 3), sampleHeightMm: 47 },
      check(5, '2026-06-01T00:00:00.000Z', 7),
      { ...check(5, '2026-06-02T00:00:00.000Z', 7), sampleHeightMm: 30 },
    ];
    const due = dueSamples(checks, new Map([[5, SCHEDULE]]), now);
    expect(due.map((d) => [d.mixedAt.slice(0, 10), d.lastCheck.ageDays, d.sampleHeightMm])).toEqual([['2026-06-01', 7, 47], ['2026-06-02', 7, 30]]);
  });

  it('stops once the schedule is used up, and counts an off-schedule check as the last one', () => {
    const checks = [check(4, '2026-01-01T00:00:00.000Z', 56), check(4, '2026-06-01T00:00:00.000Z', 10)];
    // 1 June + 10 days checked; next is 14, and the sample is 19 days old: due. The January one ran its course.
    expect(dueSamples(checks, new Map([[4, SCHEDULE]]), now).map((d) => [d.mixedAt.slice(0, 10), d.dueAgeDays])).toEqual([['2026-06-01', 14]]);
  });

  it('agrees with a day-by-day reference on random benches', () => {
    // Reference (written independently here): step through the calendar one UTC day at a time from
    // the mixing day; the sample is due when some scheduled age lies after its last check and at or
    // before the number of days stepped.
    const random = seededRandom(1414);
    const seen = { due: 0, notDue: 0 };
    for (let trial = 0; trial < 200; trial++) {
      const schedule = SCHEDULE.filter(() => random() < 0.7);
      if (schedule.length === 0) continue;
      const start = Date.UTC(2026, 0, 1 + Math.floor(random() * 60));
      const today = new Date(start + Math.floor(random() * 90) * 86_400_000 + Math.floor(random() * 86_400_000));
      const lastAge = Math.floor(random() * 60);
      const state: ObservedState = random() < 0.2 ? 'collapsed' : 'gel';
      const mixedAt = new Date(start).toISOString();
      const got = dueSamples([check(9, mixedAt, lastAge, state)], new Map([[9, schedule]]), today);
      let days = 0;
      for (let day = new Date(start); ; day = new Date(day.getTime() + 86_400_000)) {
        if (day.getTime() + 86_400_000 > today.getTime()) break;
        days++;
      }
      const expected = state !== 'collapsed' && schedule.some((age) => age > lastAge && age <= days);
      expect(got.length, `trial ${trial}: schedule ${schedule}, last ${lastAge}, ${days} days`).toBe(expected ? 1 : 0);
      if (expected) expect(got[0].ageTodayDays).toBe(days);
      seen[expected ? 'due' : 'notDue']++;
    }
    // Both answers were exercised, so the comparison checked something either way.
    expect(seen.due).toBeGreaterThan(20);
    expect(seen.notDue).toBeGreaterThan(20);
  });
});
