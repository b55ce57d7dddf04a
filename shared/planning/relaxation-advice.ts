import { STATE_LABELS } from '../states';
import { sampleCompositions, type SampledComposition } from './sample-compositions';
import type { AdviceConstraint, PlanAdvice, PlanProblem, ValueRange } from './types';

/** The wider space searched for advice: φ from 0.005 to 0.70 (below close packing, 0.74). */
export const ADVICE_PHI: Readonly<ValueRange> = Object.freeze({ min: 0.005, max: 0.7 });
/** Halton points in the wider space. */
export const ADVICE_SAMPLES = 3072;

type AdviceProblem = Pick<PlanProblem, 'space' | 'phi' | 'level' | 'target' | 'minMargin'>;

/**
 * What to relax when no composition in the ranges meets the request, and by how much.
 *
 * 1. If the target state occurs in the ranges but with too little margin: lower the smallest
 *    margin to the best one found there (rounded down to two significant figures).
 * 2. The wider space φ 0.005–0.70 × dose 0 – max(3 × the asked top, the top + 20) (within the
 *    recipe form's limits) is sampled (ADVICE_SAMPLES Halton points). Among its compositions that
 *    meet the request: the one needing the smallest move of the dose alone (φ inside the asked
 *    range), and of φ alone (dose inside); if neither alone works, the one needing the smallest
 *    combined move (each move as a fraction of the asked range). New limits go a tenth of the
 *    asked range beyond that composition, so the relaxed plan has room to choose, and are rounded
 *    outward (φ to 0.01, doses to two significant figures); each
 *    piece of advice gives the best margin reachable once relaxed.
 * 3. If nothing in the wider space meets it: the best margin of the target state anywhere there,
 *    or — when the theory never gives the target state — a change of materials.
 *
 * @param limit the largest dose a recipe accepts (the space's level.limit).
 * Sampled, so a limit may be a little more generous than strictly needed; it is never too tight
 * for the composition it was found from.
 */
export function relaxationAdvice(problem: AdviceProblem, limit: number, bestInRange: { phi: number; level: number; margin: number } | null): PlanAdvice[] {
  const { phi, level, target, minMargin } = problem;
  const advice: PlanAdvice[] = [];
  const targetName = STATE_LABELS[target].toLowerCase();
  const wideLevel: ValueRange = { min: 0, max: Math.max(level.max, Math.min(limit, Math.max(3 * level.max, level.max + 20))) };
  const space = problem.space(wideLevel);
  const { name, unit } = space.level;
  const dose = (value: number) => `${threeSignificant(value)} ${unit}`;
  if (bestInRange) {
    const to = roundDown(bestInRange.margin);
    advice.push({
      constraint: 'minMargin', from: minMargin, to, bestMargin: bestInRange.margin, at: { phi: bestInRange.phi, level: bestInRange.level },
      message: `No ${targetName} with margin ≥ ${threeSignificant(minMargin)} in these ranges; the best ${targetName} here has margin ${threeSignificant(bestInRange.margin)} (φ ${bestInRange.phi.toFixed(3)}, ${dose(bestInRange.level)}). Lower the smallest margin to ${threeSignificant(to)}.`,
    });
  }
  const { samples } = sampleCompositions(space, ADVICE_PHI, wideLevel, ADVICE_SAMPLES);
  const inTarget = samples.filter((s) => s.state === target);
  const meets = inTarget.filter((s) => s.margin >= minMargin);
  const outside = (value: number, range: ValueRange) => (value < range.min ? value - range.min : value > range.max ? value - range.max : 0);
  const bestWithin = (phiRange: ValueRange, levelRange: ValueRange) => best(meets.filter((s) => outside(s.phi, phiRange) === 0 && outside(s.level, levelRange) === 0));

  const doseOnly = nearestBy(meets.filter((s) => outside(s.phi, phi) === 0), (s) => Math.abs(outside(s.level, level)));
  const phiOnly = nearestBy(meets.filter((s) => outside(s.level, level) === 0), (s) => Math.abs(outside(s.phi, phi)));
  // Headroom beyond the first composition that meets the request: a tenth of the asked range, so
  // the relaxed plan has room to choose from rather than one point on the edge.
  const doseRoom = 0.1 * Math.max(level.max - level.min, level.max, 1e-9);
  const phiRoom = 0.1 * (phi.max - phi.min);
  if (doseOnly) {
    const up = doseOnly.level > level.max;
    const to = up ? roundUp(Math.min(wideLevel.max, doseOnly.level + doseRoom)) : Math.max(0, roundDown(doseOnly.level - doseRoom));
    const relaxed = up ? { min: level.min, max: to } : { min: to, max: level.max };
    const top = bestWithin(phi, relaxed)!;
    advice.push({
      constraint: up ? 'level.max' : 'level.min', from: up ? level.max : level.min, to, bestMargin: top.margin, at: { phi: top.phi, level: top.level },
      message: `No ${targetName} with margin ≥ ${threeSignificant(minMargin)} ${up ? `below ${dose(level.max)}` : `above ${dose(level.min)}`} of ${name}; at ${dose(to)} the best margin is ${threeSignificant(top.margin)}. ${up ? 'Raise' : 'Lower'} the ${name} ${up ? 'limit' : 'floor'} to ${dose(to)}.`,
    });
  }
  if (phiOnly) {
    const up = phiOnly.phi > phi.max;
    const to = up ? Math.min(ADVICE_PHI.max, Math.ceil((phiOnly.phi + phiRoom) * 100) / 100) : Math.max(ADVICE_PHI.min, Math.floor((phiOnly.phi - phiRoom) * 100) / 100);
    const relaxed = up ? { min: phi.min, max: to } : { min: to, max: phi.max };
    const top = bestWithin(relaxed, level)!;
    advice.push({
      constraint: up ? 'phi.max' : 'phi.min', from: up ? phi.max : phi.min, to, bestMargin: top.margin, at: { phi: top.phi, level: top.level },
      message: `No ${targetName} with margin ≥ ${threeSignificant(minMargin)} at φ ${up ? `up to ${phi.max}` : `from ${phi.min}`}; ${up ? 'widen φ up' : 'widen φ down'} to ${to.toFixed(2)}, where the best margin is ${threeSignificant(top.margin)}.`,
    });
  }
  if (!doseOnly && !phiOnly) {
    const spanPhi = phi.max - phi.min || 1;
    const spanLevel = level.max - level.min || 1;
    const both = nearestBy(meets, (s) => Math.abs(outside(s.phi, phi)) / spanPhi + Math.abs(outside(s.level, level)) / spanLevel);
    if (both) {
      const phiUp = both.phi > phi.max;
      const levelUp = both.level > level.max;
      const phiTo = phiUp ? Math.min(ADVICE_PHI.max, Math.ceil((both.phi + phiRoom) * 100) / 100) : Math.max(ADVICE_PHI.min, Math.floor((both.phi - phiRoom) * 100) / 100);
      const levelTo = levelUp ? roundUp(Math.min(wideLevel.max, both.level + doseRoom)) : Math.max(0, roundDown(both.level - doseRoom));
      const relaxedPhi = phiUp ? { min: phi.min, max: phiTo } : { min: phiTo, max: phi.max };
      const relaxedLevel = levelUp ? { min: level.min, max: levelTo } : { min: levelTo, max: level.max };
      const top = bestWithin(relaxedPhi, relaxedLevel)!;
      const phiConstraint: AdviceConstraint = phiUp ? 'phi.max' : 'phi.min';
      advice.push({
        constraint: phiConstraint, from: phiUp ? phi.max : phi.min, to: phiTo, bestMargin: top.margin, at: { phi: top.phi, level: top.level },
        also: { constraint: levelUp ? 'level.max' : 'level.min', from: levelUp ? level.max : level.min, to: levelTo },
        message: `Neither φ nor the ${name} alone reaches a ${targetName} with margin ≥ ${threeSignificant(minMargin)}: widen φ to ${phiTo.toFixed(2)} and the ${name} to ${dose(levelTo)}, where the best margin is ${threeSignificant(top.margin)}.`,
      });
    }
  }
  if (meets.length === 0) {
    const anywhere = best(inTarget);
    const where = `φ ${ADVICE_PHI.min}–${ADVICE_PHI.max} and ${dose(0)}–${dose(wideLevel.max)}`;
    if (anywhere && !(bestInRange && bestInRange.margin >= anywhere.margin)) {
      const to = roundDown(anywhere.margin);
      advice.push({
        constraint: 'minMargin', from: minMargin, to, bestMargin: anywhere.margin, at: { phi: anywhere.phi, level: anywhere.level },
        message: `Nowhere in ${where} does the theory give a ${targetName} with margin ≥ ${threeSignificant(minMargin)}; the best is ${threeSignificant(anywhere.margin)} at φ ${anywhere.phi.toFixed(3)} and ${dose(anywhere.level)}. Lower the smallest margin to ${threeSignificant(to)}, or choose other materials.`,
      });
    } else if (!anywhere) {
      const hint = space.kind === 'depletion' ? 'a larger polymer (a bigger size ratio q = R_g/a gives more attraction per gram) or another particle' : 'a salt of higher valence, or particles with a lower surface potential';
      advice.push({
        constraint: 'materials', from: null, to: null, bestMargin: null, at: null,
        message: `The theory predicts no ${targetName} for these materials anywhere in ${where}. Choose other materials: ${hint}.`,
      });
    }
  }
  return advice;
}

function best(samples: SampledComposition[]): SampledComposition | null {
  let top: SampledComposition | null = null;
  for (const s of samples) if (!top || s.margin > top.margin) top = s;
  return top;
}

function nearestBy(samples: SampledComposition[], distance: (s: SampledComposition) => number): SampledComposition | null {
  let top: SampledComposition | null = null;
  let topDistance = Infinity;
  for (const s of samples) {
    const d = distance(s);
    if (d < topDistance || (d === topDistance && top && s.margin > top.margin)) {
      top = s;
      topDistance = d;
    }
  }
  return top;
}

/** Two significant figures, rounded away from zero / toward zero. */
function roundUp(value: number): number {
  if (value <= 0) return 0;
  const step = 10 ** (Math.floor(Math.log10(value)) - 1);
  return Number((Math.ceil(value / step - 1e-9) * step).toPrecision(2));
}
function roundDown(value: number): number {
  if (value <= 0) return 0;
  const step = 10 ** (Math.floor(Math.log10(value)) - 1);
  return Number((Math.floor(value / step + 1e-9) * step).toPrecision(2));
}

/** A value with three significant figures and no trailing zeros, for advice text. */
function threeSignificant(value: number): string {
  return Number(value.toPrecision(3)).toString();
}
