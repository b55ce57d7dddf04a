import { attractionToMapY } from '../physics';
import { STATE_LABELS } from '../states';
import { explainExperiments } from './explain-experiments';
import { feasibleWindow } from './feasible-window';
import { mapPosition } from './map-position';
import { evidenceIndex } from './evidence-index';
import { pickSpaced } from './pick-spaced';
import { placeEvidence } from './place-evidence';
import { proposeExperiments } from './propose-experiments';
import { rankCandidates } from './rank-candidates';
import { relaxationAdvice } from './relaxation-advice';
import { sampleCompositions } from './sample-compositions';
import type { PlanOutcome, PlanProblem, PlannedCandidate, ValueRange } from './types';

/** How far (normalised map units) ranking looks for bench evidence: e^(−0.25/0.05) < 0.007. */
const RANKING_EVIDENCE_REACH = 0.25;

/**
 * From a target state to ranked compositions, and the next experiments (the Planner).
 *
 * 1. Sample: `samples` compositions spread over φ × dose by the Halton sequence, rounded to bench
 *    precision, each classified with classifyPoint on the programme's map (calibrated when the
 *    space was built with calibrated parameters) — sampleCompositions.
 * 2. Keep those in the target state whose margin (distance to the nearest state-changing
 *    boundary, normalised map units) is at least `minMargin`.
 * 3. Rank them by margin, material cost per litre and support from nearby bench evidence
 *    (rankCandidates), and choose `count` of them spread across the ranges (pickSpaced, at least
 *    0.5/√count apart in φ and dose scaled to their ranges), each confirmed by `verify` — the exact
 *    recipe derivation on the server — which drops any the fast screen got wrong.
 * 4. Draw the feasible window (feasibleWindow); when nothing meets the request, say what to relax
 *    and by how much (relaxationAdvice).
 * 5. Propose `experimentCount` compositions whose outcome would narrow the boundary most
 *    (proposeExperiments), explained in words (explainExperiments).
 *
 * @throws RangeError for empty ranges, a negative margin or non-positive counts.
 */
export function planCompositions<V>(problem: PlanProblem<V>): PlanOutcome<V> {
  const { phi, level, target, minMargin } = problem;
  checkRange('phi', phi);
  checkRange('level', level);
  if (!(minMargin >= 0)) throw new RangeError(`minMargin must be ≥ 0; got ${minMargin}`);
  if (!(problem.count >= 1) || !(problem.samples >= 1)) throw new RangeError('count and samples must be at least 1');
  const space = problem.space(level);
  const { samples, unplaced } = sampleCompositions(space, phi, level, problem.samples);
  const inTarget = samples.filter((s) => s.state === target);
  const feasible = inTarget.filter((s) => s.margin >= minMargin);
  let bestInRange: PlanOutcome['bestInRange'] = null;
  for (const s of inTarget) if (!bestInRange || s.margin > bestInRange.margin) bestInRange = { phi: s.phi, level: s.level, margin: s.margin };

  const evidence = placeEvidence(space.map, problem.evidence);
  const nearest = evidenceIndex(evidence, target);
  const enriched = feasible.map((s) => {
    const mapY = attractionToMapY(space.map, space.place(s.phi, s.level)!);
    const { x, u } = mapPosition(space.map, s.phi, mapY);
    // Evidence further than RANKING_EVIDENCE_REACH scores below e^−5 (rankCandidates): not looked for here.
    return { sample: s, mapY, x, u, margin: s.margin, cost: problem.cost(s.phi, s.level), evidence: nearest(x, u, RANKING_EVIDENCE_REACH) };
  });
  const ranked = rankCandidates(enriched, problem.weights);
  const scaled = (c: (typeof ranked)[number]) => [(c.item.sample.phi - phi.min) / (phi.max - phi.min), (c.item.sample.level - level.min) / (level.max - level.min)] as const;
  const verified = new Map<(typeof ranked)[number], V>();
  const { picked, tried, rejected } = pickSpaced(ranked, problem.count, 0.5 / Math.sqrt(problem.count), scaled, (candidate) => {
    if (!problem.verify) return true;
    const exact = problem.verify(candidate.item.sample.phi, candidate.item.sample.level);
    if (!exact || exact.state !== target || exact.margin === null || exact.margin < minMargin) return false;
    verified.set(candidate, exact.detail);
    return true;
  }, { budget: 3 * problem.count + 10 });
  const candidates: PlannedCandidate<V>[] = picked.map((c) => ({
    phi: c.item.sample.phi, level: c.item.sample.level, state: c.item.sample.state, margin: c.item.margin, nearestBoundary: c.item.sample.nearestBoundary, mapY: c.item.mapY,
    cost: c.item.cost, evidence: c.item.evidence ?? nearest(c.item.x, c.item.u), score: c.score, scores: c.scores, verified: verified.get(c) ?? null,
  }));

  const window = feasibleWindow(space, phi, level, target, minMargin);
  const advice = candidates.length === 0 ? relaxationAdvice(problem, space.level.limit, bestInRange) : [];
  const proposed = proposeExperiments(space, samples, target, problem.uncertainty, evidence, problem.experimentCount);
  const experiments = proposed.items.map((item) => ({ ...item, verified: problem.verify ? (problem.verify(item.phi, item.level)?.detail ?? null) : null }));

  const name = STATE_LABELS[target].toLowerCase();
  const notes = [
    'Candidates are predictions from approximate published theory (and the programme’s calibration, if accepted); they do not replace mixing and stability testing.',
    ...space.notes,
  ];
  if (unplaced > 0) notes.push(`${unplaced} of ${problem.samples} sampled compositions could not be placed on the map (beyond the theory's reach) and were left out.`);
  if (candidates.length > 0 && candidates.length < problem.count) notes.push(`Only ${candidates.length} of the ${problem.count} asked for: ${feasible.length} sampled compositions give a ${name} with the margin asked${rejected > 0 ? `, ${rejected} of them failed the exact re-derivation` : ''}.`);
  return {
    candidates,
    counts: { sampled: problem.samples, placed: samples.length, inTarget: inTarget.length, feasible: feasible.length, verified: problem.verify ? tried - rejected : 0, rejected },
    bestInRange,
    advice,
    window,
    experiments: { items: experiments, summary: explainExperiments(experiments, target, problem.uncertainty, space.level.unit), band: proposed.band },
    notes,
  };
}

function checkRange(name: string, range: ValueRange) {
  if (!Number.isFinite(range.min) || !Number.isFinite(range.max) || !(range.max > range.min)) throw new RangeError(`${name}: max must be above min; got ${range.min}–${range.max}`);
}
