const DAY_MS = 86_400_000;

/**
 * A sample's age in whole days at `now`: the full days elapsed since it was mixed,
 * ⌊(now − mixedAt) / 1 day⌋ (so a sample mixed on 1 June is 7 days old from 8 June on).
 * Negative for a mixing date in the future.
 * @throws RangeError when either date is not a real date
 * @example sampleAgeDays('2026-06-01T00:00:00Z', new Date('2026-06-08T09:30:00Z')) // 7
 */
export function sampleAgeDays(mixedAt: string | Date, now: Date): number {
  const mixed = typeof mixedAt === 'string' ? Date.parse(mixedAt) : mixedAt.getTime();
  const at = now.getTime();
  if (!Number.isFinite(mixed) || !Number.isFinite(at)) throw new RangeError(`sampleAgeDays: ${String(mixedAt)} or ${String(now)} is not a date`);
  return Math.floor((at - mixed) / DAY_MS);
}
