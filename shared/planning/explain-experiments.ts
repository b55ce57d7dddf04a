import { STATE_LABELS, type GoalState } from '../states';
import { NEAR_EVIDENCE_DISTANCE } from './nearest-evidence';
import type { BoundaryUncertainty, ProposedExperiment } from './types';

const COUNT_WORDS = ['no', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten', 'eleven', 'twelve'];

/**
 * The next experiments in words: first where the boundary's uncertainty comes from, then one
 * sentence per boundary the proposals sit on — how many, where (φ and dose), their chance of the
 * target state, and how near the bench has already been. For example: "These four straddle the
 * edge of the gel region along the gas–liquid binodal (free-volume theory) at φ ≈ 0.14–0.35 and
 * 5.42–6.42 g/L, where the model gives each a 36–73 % chance of gel; the bench has no samples
 * within 0.05 of them yet."
 */
export function explainExperiments(items: readonly ProposedExperiment[], target: GoalState, uncertainty: BoundaryUncertainty, unit: string): string[] {
  const name = STATE_LABELS[target].toLowerCase();
  const lines: string[] = [
    uncertainty.source === 'calibration'
      ? `The boundary's position comes from the accepted calibration: attraction shift ${format(uncertainty.shift)} ± ${format(uncertainty.standardError)} in B2* (one standard error).`
      : `No accepted calibration: the theory's boundary is taken as uncertain by ±${format(uncertainty.standardError)} in B2* (one standard deviation, the spread between published theories and simulations of where gels begin). Calibrating against the bench narrows it.`,
  ];
  if (items.length === 0) {
    lines.push(`No composition in these ranges lies within the 95 % band of the boundary: each is confidently ${name} or confidently not. Widen the ranges toward the boundary to learn more.`);
    return lines;
  }
  const groups = new Map<string, ProposedExperiment[]>();
  for (const item of items) groups.set(item.nearestBoundary.label, [...(groups.get(item.nearestBoundary.label) ?? []), item]);
  for (const [label, group] of groups) {
    const phis = group.map((g) => g.phi);
    const levels = group.map((g) => g.level);
    const chances = group.map((g) => Math.round(g.probability * 100));
    const nearest = group.reduce<ProposedExperiment['evidence']>((best, g) => (g.evidence && (!best || g.evidence.distance < best.distance) ? g.evidence : best), null);
    const bench = !nearest || nearest.distance > NEAR_EVIDENCE_DISTANCE
      ? `the bench has no samples within ${NEAR_EVIDENCE_DISTANCE} of ${group.length === 1 ? 'it' : 'them'} yet`
      : `the nearest bench sample, ${nearest.label} (observed ${STATE_LABELS[nearest.observedState].toLowerCase()}), is ${format(nearest.distance)} away`;
    const subject = group.length === 1 ? 'This one sits on' : `These ${COUNT_WORDS[group.length] ?? group.length} straddle`;
    lines.push(`${subject} the edge of the ${name} region along the ${lowerFirst(label)} at φ ≈ ${span(phis, 2)} and ${span(levels, 3)} ${unit}, where the model gives ${group.length === 1 ? 'it' : 'each'} a ${spanPercent(chances)} chance of ${name}; ${bench}.`);
  }
  return lines;
}

/** "Gas–liquid binodal" → "gas–liquid binodal", leaving names such as "Baxter" alone. */
function lowerFirst(label: string): string {
  return /^[A-Z][a-z]/.test(label) && !/^(Baxter|Percus|Carnahan|Asakura)/.test(label) ? label[0].toLowerCase() + label.slice(1) : label;
}

function format(value: number): string {
  return Number(value.toPrecision(2)).toString();
}

function span(values: number[], digits: number): string {
  const low = Math.min(...values);
  const high = Math.max(...values);
  const show = (v: number) => Number(v.toPrecision(digits)).toString();
  return show(low) === show(high) ? show(low) : `${show(low)}–${show(high)}`;
}

function spanPercent(values: number[]): string {
  const low = Math.min(...values);
  const high = Math.max(...values);
  return low === high ? `${low} %` : `${low}–${high} %`;
}
