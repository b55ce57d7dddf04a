import type { RankingWeights } from '@shared/planning/types';

/** Ranking presets offered on the form (weights of margin, cost per litre and bench evidence). */
export const RANKINGS = {
  balanced: { label: 'Balanced: margin, then cost, then evidence', weights: { margin: 0.5, cost: 0.3, evidence: 0.2 } },
  margin: { label: 'Widest margin first', weights: { margin: 1, cost: 0, evidence: 0 } },
  cost: { label: 'Cheapest per litre first', weights: { margin: 0.2, cost: 0.8, evidence: 0 } },
  evidence: { label: 'Closest to bench samples in the target state', weights: { margin: 0.3, cost: 0.1, evidence: 0.6 } },
} as const satisfies Record<string, { label: string; weights: RankingWeights }>;

export type RankingKey = keyof typeof RANKINGS;

/** The preset a stored plan used, or balanced for weights that are none of them. */
export function rankingOf(weights: RankingWeights | undefined): RankingKey {
  if (!weights) return 'balanced';
  const found = (Object.keys(RANKINGS) as RankingKey[]).find((key) => {
    const w = RANKINGS[key].weights;
    return w.margin === weights.margin && w.cost === weights.cost && w.evidence === weights.evidence;
  });
  return found ?? 'balanced';
}
