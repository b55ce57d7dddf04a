import { seededRandom } from '../seeded-random';

/**
 * k-fold cross-validation splits: the indices 0…n−1 shuffled with a seed and dealt into k
 * folds of near-equal size; each fold is held out once while the rest train.
 * Source: Hastie, Tibshirani & Friedman, *The Elements of Statistical Learning*, 2nd ed.
 * (2009), §7.10. With k = n this is leave-one-out.
 * @throws Error when k < 2 or k > n
 */
export function kFoldSplits(n: number, k: number, seed = 1): { train: number[]; test: number[] }[] {
  if (!Number.isInteger(k) || k < 2) throw new Error(`kFoldSplits: k must be a whole number of 2 or more, got ${k}`);
  if (k > n) throw new Error(`kFoldSplits: k (${k}) cannot exceed the number of items (${n})`);
  const random = seededRandom(seed);
  const order = Array.from({ length: n }, (_, i) => i);
  for (let i = n - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [order[i], order[j]] = [order[j], order[i]];
  }
  const folds = Array.from({ length: k }, (_, f) => order.filter((_, position) => position % k === f));
  return folds.map((test, f) => ({ test, train: folds.filter((_, g) => g !== f).flat() }));
}
