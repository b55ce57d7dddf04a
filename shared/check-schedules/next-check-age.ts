/**
 * The next check a schedule asks for after the last one made: the smallest scheduled age
 * greater than `lastCheckAgeDays`, or null once the schedule is used up (after its last age,
 * nothing more is due; the scientist can lengthen the schedule).
 * @example nextCheckAge([1, 3, 7, 14, 28, 56], 7) // 14
 * @example nextCheckAge([1, 3, 7, 14, 28, 56], 10) // 14 (a check made off-schedule still counts)
 * @example nextCheckAge([1, 3, 7], 7) // null
 */
export function nextCheckAge(agesDays: readonly number[], lastCheckAgeDays: number): number | null {
  let next: number | null = null;
  for (const age of agesDays) if (age > lastCheckAgeDays && (next === null || age < next)) next = age;
  return next;
}
