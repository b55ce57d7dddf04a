import { describe, expect, it } from 'vitest';
import { dueSamples, type ScheduledCheck } from '../../shared/check-schedules/due-samples';
import { kaplanMeier } from '../../shared/shelf-life/kaplan-meier';
import { medianTimeToCollapse } from '../../shared/shelf-life/median-time-to-collapse';
import { stiffeningWithAge } from '../../shared/shelf-life/stiffening-with-age';
import { survivalRecordsFromChecks } from '../../shared/shelf-life/survival-records-from-checks';
import { seededRandom } from '../../shared/seeded-random';
import { DEMO_CHECK_AGES, demoAgeingSamples, demoCollapseScaleDays, demoSampleHeightMm } from './demo-ageing';

// The demo's ageing is invented; these checks hold it to what it claims to show: collapses
// sooner for weak dilute gels, censoring at the last check, G′ rising (or for one recipe falling)
// with log age, and a recent sample left due. Weak/strong values span the demo's gel recipes
// (U/kT 5.2–10.8, φ 0.04–0.39, read from a seeding run).
const WEAK = { phi: 0.04, contactEnergyKT: 5.2 };
const STRONG = { phi: 0.34, contactEnergyKT: 10.8 };
const DAY = 86_400_000;

const checksOf = (samples: ReturnType<typeof demoAgeingSamples>, now: Date, recipeId = 1): ScheduledCheck[] =>
  samples.flatMap((sample, s) =>
    sample.checks.map((c, i) => ({ observationId: s * 100 + i + 1, recipeId, mixedAt: new Date(now.getTime() - sample.mixedDaysAgo * DAY).toISOString(), ageDays: c.ageDays, observedState: c.state })),
  );

describe('demoAgeingSamples', () => {
  it('is the same on every run for one seed', () => {
    expect(demoAgeingSamples(WEAK, seededRandom(7), 16)).toEqual(demoAgeingSamples(WEAK, seededRandom(7), 16));
  });

  it('checks at the demo ages only, and never after a collapse', () => {
    const random = seededRandom(11);
    for (let i = 0; i < 50; i++) {
      for (const sample of demoAgeingSamples(i % 2 ? WEAK : STRONG, random, i % 3 ? undefined : 9 + i)) {
        const ages = sample.checks.map((c) => c.ageDays);
        expect(ages.every((a) => (DEMO_CHECK_AGES as readonly number[]).includes(a))).toBe(true);
        expect(ages).toEqual([...ages].sort((a, b) => a - b));
        const collapse = sample.checks.findIndex((c) => c.state === 'collapsed');
        if (collapse >= 0) expect(collapse).toBe(sample.checks.length - 1);
      }
    }
  });

  it('lets weak dilute gels collapse within days and strongly attractive crowded ones stand through the watch', () => {
    const pooled = (recipe: typeof WEAK, seed: number) => {
      const random = seededRandom(seed);
      const records = Array.from({ length: 40 }, () => survivalRecordsFromChecks(checksOf(demoAgeingSamples(recipe, random), new Date('2026-12-01')).map((c) => ({ ...c })))).flat();
      return kaplanMeier(records);
    };
    const weak = pooled(WEAK, 3);
    const strong = pooled(STRONG, 4);
    // Scale 12·e^{1.1(5.2−6)}·0.4^0.8 ≈ 2.4 days at 50 mm (the demo's own law): the weak median falls at an early check.
    expect(demoCollapseScaleDays(WEAK.phi, WEAK.contactEnergyKT, 50)).toBeCloseTo(12 * Math.exp(-0.88) * 0.4 ** 0.8, 10);
    expect(medianTimeToCollapse(weak).timeDays).toBeLessThanOrEqual(7);
    expect(strong.collapseCount).toBe(0);
    expect(strong.sampleCount).toBe(120);
    expect(strong.lastTimeDays).toBe(56);
  });

  it('leaves the recent sample of a scheduled recipe due at its next scheduled age', () => {
    const now = new Date('2026-12-01T10:00:00Z');
    for (const days of [9, 16, 30]) {
      const due = dueSamples(checksOf(demoAgeingSamples(STRONG, seededRandom(days), days), now), new Map([[1, [...DEMO_CHECK_AGES]]]), now);
      // 9 days → the 7-day check is due; 16 → 14; 30 → 28 (the latest schedule age reached).
      expect(due.map((d) => [d.ageTodayDays, d.dueAgeDays])).toEqual([[days, DEMO_CHECK_AGES.filter((a) => a <= days).at(-1)]]);
    }
  });

  it('fills each sample to its own height of 20–80 mm, and lets taller samples collapse sooner (the demo\'s law: scale ∝ (50 mm / H)^0.5)', () => {
    const random = seededRandom(21);
    const heights = Array.from({ length: 30 }, () => demoAgeingSamples(WEAK, random, 9)).flat().map((s) => s.sampleHeightMm);
    expect(heights.every((h) => Number.isInteger(h) && h >= 20 && h <= 80)).toBe(true);
    expect(new Set(heights).size).toBeGreaterThan(10);
    expect([demoSampleHeightMm(() => 0), demoSampleHeightMm(() => 1)]).toEqual([20, 80]);
    // (50/80)^0.5 / (50/20)^0.5 = 0.5: an 80 mm sample's scale is half a 20 mm one's (derived from the law).
    expect(demoCollapseScaleDays(0.1, 6, 80) / demoCollapseScaleDays(0.1, 6, 20)).toBeCloseTo(0.5, 12);
  });

  it('gives G′ that stiffens with log age, or softens for the recipe marked so', () => {
    const moduli = (softens: boolean) =>
      demoAgeingSamples({ ...STRONG, softens }, seededRandom(5))
        .flatMap((s) => s.checks)
        .filter((c) => c.storageModulusPa !== null)
        .map((c) => ({ ageDays: c.ageDays, storageModulusPa: c.storageModulusPa! }));
    expect(stiffeningWithAge(moduli(false))).toMatchObject({ status: 'fitted', trend: 'stiffens' });
    expect(stiffeningWithAge(moduli(true))).toMatchObject({ status: 'fitted', trend: 'softens' });
  });
});
