/** What the height rule reads of one bench check of a sample. */
export interface HeightAtCheck {
  ageDays: number;
  /** The fill height recorded at this check (mm); absent or null when none was given. */
  sampleHeightMm?: number | null;
  /** Breaks ties between checks at the same age (the greater is the later record). */
  observationId?: number;
}

/**
 * A sample's fill height (mm): the one recorded at its most recent check that recorded a height
 * (the greatest age; at equal ages the later record: the greater observationId, else the later in
 * `checks`); null when no check of the sample recorded one. A height is written once when the
 * sample is filled and again only if it was corrected, so the latest one given is the best known.
 * @example latestSampleHeightMm([{ ageDays: 1, sampleHeightMm: 40 }, { ageDays: 7, sampleHeightMm: 42 }, { ageDays: 14 }]) // 42
 */
export function latestSampleHeightMm(checks: readonly HeightAtCheck[]): number | null {
  let latest: HeightAtCheck | null = null;
  for (const check of checks) {
    const height = check.sampleHeightMm;
    if (height === null || height === undefined || !Number.isFinite(height) || !Number.isFinite(check.ageDays)) continue;
    if (
      latest === null ||
      check.ageDays > latest.ageDays ||
      (check.ageDays === latest.ageDays && (check.observationId ?? 0) >= (latest.observationId ?? 0))
    ) latest = check;
  }
  return latest === null ? null : latest.sampleHeightMm!;
}
