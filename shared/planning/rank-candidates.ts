import { NEAR_EVIDENCE_DISTANCE } from './nearest-evidence';
import type { CostPerLitre, NearestEvidence, RankingWeights } from './types';

/** Default weights: staying clear of boundaries first, then cost, then bench support. */
export const DEFAULT_RANKING_WEIGHTS: Readonly<RankingWeights> = Object.freeze({ margin: 0.5, cost: 0.3, evidence: 0.2 });

interface Rankable {
  margin: number;
  cost: CostPerLitre;
  evidence: NearestEvidence | null;
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
export function rankCandidates<T extends Rankable>(items: readonly T[], weights: RankingWeights): (T & { score: number; scores: { margin: number; cost: number; evidence: number } })[] {
  const { margin: wm, cost: wc, evidence: we } = weights;
  if (!(wm >= 0 && wc >= 0 && we >= 0) || wm + wc + we === 0) throw new RangeError('rankCandidates: weights must be ≥ 0 and not all zero');
  const total = wm + wc + we;
  const [marginLow, marginHigh] = extent(items.map((i) => i.margin));
  const [costLow, costHigh] = extent(items.map((i) => i.cost.total));
  const scale = (value: number, low: number, high: number) => (high > low ? (value - low) / (high - low) : 1);
  return items
    .map((item) => {
      const scores = {
        margin: scale(item.margin, marginLow, marginHigh),
        cost: costHigh > costLow ? (costHigh - item.cost.total) / (costHigh - costLow) : 1,
        evidence: item.evidence && item.evidence.agrees ? Math.exp(-item.evidence.distance / NEAR_EVIDENCE_DISTANCE) : 0,
      };
      return { ...item, scores, score: (wm * scores.margin + wc * scores.cost + we * scores.evidence) / total };
    })
    .sort((a, b) => b.score - a.score || b.margin - a.margin);
}

function extent(values: number[]): [number, number] {
  let low = Infinity;
  let high = -Infinity;
  for (const v of values) {
    if (v < low) low = v;
    if (v > high) high = v;
  }
  return [low, high];
}
