import { kFoldSplits } from '../statistics/k-fold';

/**
 * Stratified k-fold splits of items with a 0/1 outcome: each outcome's items are dealt into the
 * k folds separately (kFoldSplits, seeded), so every fold holds both outcomes in about their
 * overall proportion and every training part can be fitted. Source: Kohavi, "A study of
 * cross-validation and bootstrap for accuracy estimation and model selection", IJCAI (1995);
 * Hastie, Tibshirani & Friedman (2009), §7.10.
 *
 * @throws Error when k < 2 or either outcome has fewer than k items
 * @example stratifiedFolds([1, 1, 0, 0, 1, 0], 3).length // 3
 */
export function stratifiedFolds(outcomes: (0 | 1)[], k: number, seed = 1): { train: number[]; test: number[] }[] {
  const byOutcome = [0, 1].map((value) => outcomes.flatMap((o, i) => (o === value ? [i] : [])));
  for (const [value, items] of byOutcome.entries()) {
    if (items.length < k) throw new Error(`stratifiedFolds: ${k} folds need at least ${k} items with outcome ${value}; there are ${items.length}`);
  }
  const splits = byOutcome.map((items, value) => kFoldSplits(items.length, k, seed + value).map((split) => split.test.map((position) => items[position])));
  const tests = Array.from({ length: k }, (_, f) => [...splits[0][f], ...splits[1][f]].sort((a, b) => a - b));
  return tests.map((test, f) => ({ test, train: tests.filter((_, g) => g !== f).flat().sort((a, b) => a - b) }));
}
