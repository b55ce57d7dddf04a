import { attractionToMapY } from '../physics';
import { Z_95 } from '../statistics/z-95';
import type { GoalState } from '../states';
import { mapPosition } from './map-position';
import { membershipOffset } from './membership-offset';
import { evidenceIndex } from './evidence-index';
import { NEAR_EVIDENCE_DISTANCE } from './nearest-evidence';
import { pickSpaced } from './pick-spaced';
import type { PlacedEvidence } from './place-evidence';
import type { SampledComposition } from './sample-compositions';
import { targetProbability } from './target-probability';
import type { BoundaryUncertainty, CompositionSpace, ProposedExperiment } from './types';

/** z of a two-sided 95 % band, the normal quantile at 0.975: 1.959963… (Z_95, shared/statistics/z-95.ts). */
export const BAND_Z = Z_95;
/** Compositions (the first ones of the plan's Halton sample) examined for experiments. */
export const EXPERIMENT_POOL = 600;
/** Informativeness × novelty below this is not worth a sample (e.g. within 0.01 of an observation). */
const MIN_VALUE = 0.02;

/**
 * The compositions whose bench outcome would narrow the uncertain boundary most: uncertainty
 * sampling (B. Settles, *Active Learning Literature Survey*, Computer Sciences Technical Report
 * 1648, University of Wisconsin–Madison, 2009, §3.1: query where the model is least certain),
 * for a batch, away from what the bench already knows.
 *
 * 1. For each composition of the pool, the signed B2* distance d to the edge of the target state
 *    (membershipOffset), searched within the 95 % band of the shift, ŝ ± 1.96σ; compositions the
 *    band does not reach are certain enough and left out.
 * 2. Its chance of the target state P = targetProbability(d) and its informativeness 1 − |2P − 1|
 *    (1 at 50/50, 0 when certain).
 * 3. Novelty 1 − exp(−(D/0.05)²), D the distance to the nearest bench observation in normalised map
 *    units (1 with no observations): an outcome next to one already known teaches little.
 * 4. Ranked by informativeness × novelty (those below 0.02 dropped), then chosen greedily at
 *    least 0.05 apart on the map, so a batch spreads along the boundary instead of piling onto one
 *    spot (pickSpaced); fewer than asked when the band holds fewer such places.
 */
export function proposeExperiments(space: CompositionSpace, pool: readonly SampledComposition[], target: GoalState, uncertainty: BoundaryUncertainty, evidence: readonly PlacedEvidence[], count: number): { items: ProposedExperiment<never>[]; band: { low: number; high: number } } {
  const reach = BAND_Z * uncertainty.standardError;
  const band = { low: uncertainty.shift - reach, high: uncertainty.shift + reach };
  if (count <= 0 || !(reach > 0)) return { items: [], band };
  const nearestTo = evidenceIndex(evidence, target);
  const scored: (ProposedExperiment<never> & { x: number; u: number; value: number })[] = [];
  for (const sample of pool.slice(0, EXPERIMENT_POOL)) {
    const attraction = space.place(sample.phi, sample.level);
    if (!attraction) continue;
    const offset = membershipOffset(space.map, { phi: sample.phi, attraction }, target, uncertainty.shift, reach);
    if (offset === null) continue;
    const probability = targetProbability(offset, uncertainty);
    const mapY = attractionToMapY(space.map, attraction);
    const { x, u } = mapPosition(space.map, sample.phi, mapY);
    const near = nearestTo(x, u);
    const novelty = near ? 1 - Math.exp(-((near.distance / NEAR_EVIDENCE_DISTANCE) ** 2)) : 1;
    const value = (1 - Math.abs(2 * probability - 1)) * novelty;
    // Next to a sample the bench already has (or certain after all): nothing to learn.
    if (value < MIN_VALUE) continue;
    scored.push({
      phi: sample.phi, level: sample.level, state: sample.state, probability, boundaryOffset: offset,
      nearestBoundary: sample.nearestBoundary, mapY, evidence: near, verified: null,
      x, u, value,
    });
  }
  scored.sort((a, b) => b.value - a.value);
  const { picked } = pickSpaced(scored, count, NEAR_EVIDENCE_DISTANCE, (s) => [s.x, s.u], () => true, { fill: false });
  return { items: picked.map(({ x: _x, u: _u, value: _value, ...item }) => item), band };
}
