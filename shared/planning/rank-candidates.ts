import { NEAR_EVIDENCE_DISTANCE } from './nearest-evidence';
import type { CostPerLitre, NearestEvidence, RankingWeights } from './types';

/** Default weights: staying clear of boundaries first, then cost, then bench support. */
export const DEFAULT_RANKING_WEIGHTS: Readonly<RankingWeights> = Object.freeze({ margin: 0.5, cost: 0.3, evidence: 0.2 });

interface Rankable {
  margin: number;
  cost: CostPerLitre;
  evidence: NearestEvidence | null;
}

export interface Ranked<T> {
  item: T;
  score: number;
  scores: { margin: number; cost: number; evidence: number };
}

/**
 * Orders compositions that meet a plan by a weighted sum of three scores, each in [0, 1]
 * (simple additive weighting with linear min–max normalisation: C.-L. Hwang & K. Yoon,
 * *Multiple Attribute Decision Making* (Springer, 1981), ch. 3, from memory):
 * - margin: (m − m_min)/(m_max − m_min) over the set — further from every boundary is better;
 * - cost: (c_max − c)/(c_max − c_min) — cheaper per litre is better;
 * - evidence: exp(−d/0.05) when the nearest bench observation, at distance d in normalised map
 *   units, showed the target state; 0 when it showed something else or there is none.
 * A score whose criterion does not vary over the set is 1 for all. Ties go to the larger margin.
 *
 * @param weights non-negative, not all zero (normalised here).
 * @throws RangeError for negative or all-zero weights.
 * @example rankCandidates([{ margin: 0.2, cost, evidence: null }, …], DEFAULT_RANKING_WEIGHTS)[0].score
 */
export function rankCandidates<T extends Rankable>(items: readonly T[], weights: RankingWeights): Ranked<T>[] {
  const { margin: wm, cost: wc, evidence: we } = weights;
  if (!(wm >= 0 && wc >= 0 && we >= 0) || wm + wc + we === 0) throw new RangeError('rankCandidates: weights must be ≥ 0 and not all zero');
  const total = wm + wc + we;
  let marginLow = Infinity;
  let marginHigh = -Infinity;
  let costLow = Infinity;
  let costHigh = -Infinity;
  for (const item of items) {
    if (item.margin < marginLow) marginLow = item.margin;
    if (item.margin > marginHigh) marginHigh = item.margin;
    if (item.cost.total < costLow) costLow = item.cost.total;
    if (item.cost.total > costHigh) costHigh = item.cost.total;
  }
  const ranked: Ranked<T>[] = new Array(items.length);
  for (let i = 0; i < items.length; i++) {
    const item = items[i];
    const scores = {
      margin: marginHigh > marginLow ? (item.margin - marginLow) / (marginHigh - marginLow) : 1,
      cost: costHigh > costLow ? (costHigh - item.cost.total) / (costHigh - costLow) : 1,
      evidence: item.evidence && item.evidence.agrees ? Math.exp(-item.evidence.distance / NEAR_EVIDENCE_DISTANCE) : 0,
    };
    ranked[i] = { item, scores, score: (wm * scores.margin + wc * scores.cost + we * scores.evidence) / total };
  }
  return ranked.sort((a, b) => b.score - a.score || b.item.margin - a.item.margin);
}
