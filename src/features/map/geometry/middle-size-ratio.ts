/**
 * The size ratio q a map of many depletion recipes is drawn at: the middle one of theirs (the
 * upper middle for an even count). Deliberately an element, not a statistical median (the mean of
 * the two middle values): the map's q is then one a recipe has, so those recipes sit on it by
 * their polymer dose (mapYOf) rather than by B2*. Null for no positive ratio.
 * @example middleSizeRatio([0.2, 0.05, 0.1, 0.3]) // 0.2
 */
export function middleSizeRatio(ratios: readonly number[]): number | null {
  const sorted = ratios.filter((q) => q > 0).sort((a, b) => a - b);
  return sorted.length ? sorted[Math.floor(sorted.length / 2)] : null;
}
