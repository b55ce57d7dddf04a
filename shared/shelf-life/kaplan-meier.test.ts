import { describe, expect, it } from 'vitest';
import { seededRandom } from '../seeded-random';
import { Z_95 } from '../statistics/z-95';
import { describeSurvival } from './describe-survival';
import { greenwoodTerm } from './greenwood-variance';
import { kaplanMeier } from './kaplan-meier';
import { logLogBand } from './log-log-band';
import { medianTimeToCollapse } from './median-time-to-collapse';
import { survivalAt } from './survival-at';
import type { SurvivalRecord } from './types';

// 6-MP arm of the leukaemia remission trial (Freireich et al., Blood 21, 699 (1963)), weeks in
// remission, * = censored: 6,6,6,6*,7,9*,10,10*,11*,13,16,17*,19*,20*,22,23,25*,32*,32*,34*,35*.
// Tabulated in Klein & Moeschberger, *Survival Analysis*, 2nd ed. (2003), and Kleinbaum & Klein,
// *Survival Analysis: A Self-Learning Text*. Here weeks stand in for days.
function records(spec: string): SurvivalRecord[] {
  return spec.split(',').map((item) => ({ timeDays: Number(item.replace('*', '')), collapsed: !item.endsWith('*') }));
}
const SIX_MP = records('6,6,6,6*,7,9*,10,10*,11*,13,16,17*,19*,20*,22,23,25*,32*,32*,34*,35*');

function stepAt(curve: ReturnType<typeof kaplanMeier>, time: number) {
  const step = curve.steps.find((s) => s.timeDays === time);
  if (!step) throw new Error(`no step at ${time}`);
  return step;
}

describe('kaplanMeier', () => {
  it('reproduces the 6-MP remission curve (published values, from memory; re-derived by hand below)', () => {
    const curve = kaplanMeier(SIX_MP);
    // Published (from memory): Klein & Moeschberger / Kleinbaum tables of this curve.
    const published: [number, number][] = [[6, 0.857], [7, 0.807], [10, 0.753], [13, 0.69], [16, 0.627], [22, 0.538], [23, 0.448]];
    for (const [time, survival] of published) expect(stepAt(curve, time).survival).toBeCloseTo(survival, 3);
    // Re-derived by hand: product of (1 − d/n) with n = 21, 17, 15, 12, 11, 7, 6 at risk.
    const byHand: [number, number][] = [
      [6, 18 / 21],
      [7, (18 / 21) * (16 / 17)],
      [10, (18 / 21) * (16 / 17) * (14 / 15)],
      [13, (18 / 21) * (16 / 17) * (14 / 15) * (11 / 12)],
      [16, (18 / 21) * (16 / 17) * (14 / 15) * (11 / 12) * (10 / 11)],
      [22, (18 / 21) * (16 / 17) * (14 / 15) * (11 / 12) * (10 / 11) * (6 / 7)],
      [23, (18 / 21) * (16 / 17) * (14 / 15) * (11 / 12) * (10 / 11) * (6 / 7) * (5 / 6)],
    ];
    for (const [time, survival] of byHand) expect(stepAt(curve, time).survival).toBeCloseTo(survival, 12);
    expect([6, 7, 10, 13, 16, 22, 23].map((t) => stepAt(curve, t).atRisk)).toEqual([21, 17, 15, 12, 11, 7, 6]);
    expect(curve.collapseCount).toBe(9);
    expect(curve.sampleCount).toBe(21);
    expect(curve.lastTimeDays).toBe(35);
  });

  it('counts collapses before censorings at a tied time: the censored 6 and 10 are at risk there (by hand)', () => {
    const curve = kaplanMeier(SIX_MP);
    expect(stepAt(curve, 6)).toMatchObject({ atRisk: 21, events: 3, censored: 1 });
    expect(stepAt(curve, 10)).toMatchObject({ atRisk: 15, events: 1, censored: 1 });
    expect(stepAt(curve, 9)).toMatchObject({ atRisk: 16, events: 0, censored: 1 });
    expect(stepAt(curve, 9).survival).toBe(stepAt(curve, 7).survival);
  });

  it("gives Greenwood's standard error 0.0764 at week 6 (published, from memory; by hand: √(S²·3/(21·18)))", () => {
    const step = stepAt(kaplanMeier(SIX_MP), 6);
    expect(Math.sqrt(step.variance)).toBeCloseTo(0.0764, 4);
    expect(step.variance).toBeCloseTo((18 / 21) ** 2 * (3 / (21 * 18)), 14);
    // By hand at week 7: S² · (3/(21·18) + 1/(17·16)).
    expect(stepAt(kaplanMeier(SIX_MP), 7).variance).toBeCloseTo(((18 / 21) * (16 / 17)) ** 2 * (3 / (21 * 18) + 1 / (17 * 16)), 14);
  });

  it('gives the log(−log) band [0.620, 0.952] at week 6 (derived by hand from Klein & Moeschberger eq. 4.3.2)', () => {
    const step = stepAt(kaplanMeier(SIX_MP), 6);
    const s = 18 / 21;
    const theta = Math.exp((Z_95 * Math.sqrt(3 / (21 * 18))) / Math.log(s));
    expect(step.low).toBeCloseTo(s ** (1 / theta), 12);
    expect(step.high).toBeCloseTo(s ** theta, 12);
    expect(step.low).toBeCloseTo(0.6197, 4); // hand arithmetic: θ = 0.32216, 0.857143^3.1040
    expect(step.high).toBeCloseTo(0.9516, 4);
  });

  it('matches the published standard errors and log(−log) bands of the 6-MP curve (published, from memory: R survfit conf.type "log-log" output as printed in texts)', () => {
    const curve = kaplanMeier(SIX_MP);
    const published: [number, number, number, number][] = [
      [6, 0.0764, 0.62, 0.952], [7, 0.0869, 0.563, 0.923], [10, 0.0963, 0.503, 0.889], [13, 0.1068, 0.432, 0.849],
      [16, 0.1141, 0.368, 0.805], [22, 0.1282, 0.268, 0.747], [23, 0.1346, 0.188, 0.680],
    ];
    for (const [time, se, low, high] of published) {
      const step = stepAt(curve, time);
      expect(Math.sqrt(step.variance)).toBeCloseTo(se, 4);
      expect(step.low).toBeCloseTo(low, 3);
      expect(step.high).toBeCloseTo(high, 3);
    }
  });

  it('gives the median 23 (published, from memory; by hand: Ŝ(22) = 0.538 > 0.5 ≥ Ŝ(23) = 0.448) and its band interval', () => {
    const curve = kaplanMeier(SIX_MP);
    const median = medianTimeToCollapse(curve);
    expect(median.timeDays).toBe(23);
    // Derived in the test: the first step times at which the band's edges fall to 0.5 or below.
    expect(median.low).toBe(curve.steps.find((s) => s.low <= 0.5)!.timeDays);
    expect(median.high).toBe(curve.steps.find((s) => s.high <= 0.5)?.timeDays ?? null);
    // Published (from memory): median 23, 95 % limits 13 and not reached (NA), log(−log) band.
    expect(median).toEqual({ timeDays: 23, low: 13, high: null });
  });

  it('reads the step function at any age and refuses to read past the last check', () => {
    const curve = kaplanMeier(SIX_MP);
    expect(survivalAt(curve, 5)).toEqual({ survival: 1, low: 1, high: 1 });
    expect(survivalAt(curve, 12)!.survival).toBeCloseTo((18 / 21) * (16 / 17) * (14 / 15), 12);
    expect(survivalAt(curve, 36)).toBeNull();
  });

  it('says "no collapse seen in N samples up to T days" when nothing collapsed', () => {
    const curve = kaplanMeier(records('30*,42*,14*'));
    expect(curve.steps.every((s) => s.survival === 1 && s.low === 1 && s.high === 1)).toBe(true);
    expect(medianTimeToCollapse(curve)).toEqual({ timeDays: null, low: null, high: null });
    expect(describeSurvival(curve)).toBe('no collapse seen in 3 samples up to 42 days');
    expect(describeSurvival(kaplanMeier([]))).toBe('no samples checked yet');
    expect(describeSurvival(kaplanMeier(SIX_MP))).toMatch(/^half collapsed by 23 days \(95 % interval \d+(–\d+ days| days or later); 9 collapses in 21 samples\)$/);
    expect(describeSurvival(kaplanMeier(records('5,40*,40*,40*')))).toBe('more than half still standing at 40 days (1 collapse in 4 samples)');
  });

  it('drops to 0 with band [0, 0] when the last sample at risk collapses', () => {
    const curve = kaplanMeier(records('6,6*,9'));
    // By hand: 3 at risk at 6, one collapses (S = 2/3), the tied censoring leaves 1, which collapses at 9.
    expect(curve.steps[0].survival).toBeCloseTo(2 / 3, 15);
    expect(curve.steps[1].survival).toBe(0);
    expect(curve.steps[1]).toMatchObject({ atRisk: 1, events: 1, low: 0, high: 0 });
    expect(Number.isNaN(curve.steps[1].variance)).toBe(true);
  });

  it('refuses a negative or non-finite time and a non-boolean flag, naming the record', () => {
    expect(() => kaplanMeier([{ timeDays: 1, collapsed: true }, { timeDays: -1, collapsed: true }])).toThrow(/record 1 has timeDays -1/);
    expect(() => kaplanMeier([{ timeDays: Number.NaN, collapsed: true }])).toThrow(RangeError);
    expect(() => kaplanMeier([{ timeDays: 3, collapsed: 1 as unknown as boolean }])).toThrow(/record 0 has collapsed 1/);
    expect(() => greenwoodTerm(2, 3)).toThrow(RangeError);
    expect(() => logLogBand(1.2, 0)).toThrow(RangeError);
  });

  it('agrees with a naive O(n²) product-limit loop on random censored data (derived: independent implementation)', () => {
    const random = seededRandom(1407);
    for (let trial = 0; trial < 20; trial++) {
      const n = 5 + Math.floor(random() * 120);
      // Whole days so that ties (events with events, events with censorings) are common.
      const data: SurvivalRecord[] = Array.from({ length: n }, () => ({ timeDays: Math.floor(random() * 40), collapsed: random() < 0.6 }));
      const curve = kaplanMeier(data);
      const times = [...new Set(data.map((r) => r.timeDays))].sort((a, b) => a - b);
      expect(curve.steps.map((s) => s.timeDays)).toEqual(times);
      for (const step of curve.steps) {
        // Reference: at each time, recount everything from scratch over all earlier times.
        let survival = 1;
        let sum = 0;
        for (const t of times.filter((u) => u <= step.timeDays)) {
          const atRisk = data.filter((r) => r.timeDays >= t).length;
          const events = data.filter((r) => r.timeDays === t && r.collapsed).length;
          survival *= 1 - events / atRisk;
          sum += events === 0 ? 0 : events / (atRisk * (atRisk - events));
        }
        expect(step.atRisk).toBe(data.filter((r) => r.timeDays >= step.timeDays).length);
        expect(step.survival).toBeCloseTo(survival, 12);
        if (survival > 0) expect(step.variance).toBeCloseTo(survival * survival * sum, 12);
        if (survival > 0 && survival < 1) {
          const theta = Math.exp((Z_95 * Math.sqrt(sum)) / Math.log(survival));
          expect(step.low).toBeCloseTo(survival ** (1 / theta), 10);
          expect(step.high).toBeCloseTo(survival ** theta, 10);
        }
        expect(step.low).toBeGreaterThanOrEqual(0);
        expect(step.high).toBeLessThanOrEqual(1);
        expect(step.low).toBeLessThanOrEqual(step.survival);
        expect(step.high).toBeGreaterThanOrEqual(step.survival);
      }
    }
  });
});
