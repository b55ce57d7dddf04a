/**
 * Greedy choice of up to `count` items from a ranked list, best first, skipping any within
 * `spacing` (Euclidean, in the coordinates `position` gives) of one already chosen, so a short
 * list is not one recipe written ten ways (a maximin-distance rule as in batch-mode design:
 * M. E. Johnson, L. M. Moore & D. Ylvisaker, J. Statist. Plann. Inference 26, 131 (1990), from
 * memory). Each item must also pass `accept` (e.g. an exact re-derivation), tried at most
 * `budget` times in all. When spacing leaves the list short, a second pass fills it without it
 * (unless `fill` is false).
 *
 * @example pickSpaced(ranked, 5, 0.1, (c) => [c.x, c.y], () => true)
 */
export function pickSpaced<T>(ranked: readonly T[], count: number, spacing: number, position: (item: T) => readonly [number, number], accept: (item: T) => boolean, options: { budget?: number; fill?: boolean } = {}): { picked: T[]; tried: number; rejected: number } {
  const budget = options.budget ?? Infinity;
  const picked: T[] = [];
  const points: (readonly [number, number])[] = [];
  const verdict = new Map<T, boolean>();
  let tried = 0;
  let rejected = 0;
  const passes = (item: T) => {
    const known = verdict.get(item);
    if (known !== undefined) return known;
    if (tried >= budget) return false;
    tried += 1;
    const ok = accept(item);
    if (!ok) rejected += 1;
    verdict.set(item, ok);
    return ok;
  };
  const clear = (p: readonly [number, number]) => points.every((q) => (p[0] - q[0]) ** 2 + (p[1] - q[1]) ** 2 >= spacing * spacing);
  for (const spaced of options.fill === false ? [true] : [true, false]) {
    for (const item of ranked) {
      if (picked.length >= count) break;
      if (picked.includes(item)) continue;
      const p = position(item);
      if (spaced && !clear(p)) continue;
      if (!passes(item)) continue;
      picked.push(item);
      points.push(p);
    }
    if (picked.length >= count || tried >= budget) break;
  }
  return { picked, tried, rejected };
}
