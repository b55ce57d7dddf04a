import { baxterLambdaUnchecked } from '../fluid-fluid/baxter-py-lambda';
import type { ModeCouplingGrid } from './mode-coupling-grid';
import { structureFactorUnchecked } from './baxter-sticky-structure-factor';
import { DECAYED, nonergodicityIteration } from './nonergodicity-step';
import { modeCouplingVertex } from './mode-coupling-vertex';

/**
 * One state probed for arrest: whether it is arrested and, if so, g = (1 − E)², where E is the
 * largest eigenvalue of the iteration's stability matrix, read off the geometric convergence of
 * the iterates (E = ratio of successive largest changes). Near an A2 (fold) transition
 * 1 − E ∝ √(φ − φ_c), so g is linear in φ − φ_c and extrapolates to the transition
 * (W. Götze, in Liquids, Freezing and Glass Transition (1991): the square-root law). Internal.
 */
export interface ArrestProbe {
  readonly arrested: boolean;
  readonly g: number;
  readonly iterations: number;
  /** The last iterate (an upper bound of the largest solution). */
  readonly f: Float64Array;
}

/** The ratio has settled when it moves by less than this between two iterations. */
const RATE_SETTLED = 2e-5;
/** Arrest is certain once the geometric tail of the remaining steps is this small a part of max f. */
const TAIL_SHARE = 0.05;
/**
 * States with S(0) above this (more compressible than an ideal gas: near the critical point or
 * the spinodal) are not probed: there idealised MCT arrests on long-wavelength fluctuations, an
 * artefact of feeding a critical S(k) to a theory of caging; the fluid–fluid lines decide those
 * states (gel inside the spinodal).
 */
export const LONG_WAVELENGTH_LIMIT = 1;
const MAX_ITERATIONS = 20_000;

/**
 * Iterate f ← m[f]/(1 + m[f]) from f = 1 (or from `start`, which must lie above the largest
 * solution: the iterate of an arrested state at the same τ and higher φ does, as f grows with φ)
 * until the state is decided: ergodic when every f_q
 * falls below 1e-4; arrested once the convergence ratio r has settled below 1 and the geometric
 * tail change·r/(1 − r) cannot bring max f near zero. `null` where Percus–Yevick has no solution
 * or S(0) exceeds LONG_WAVELENGTH_LIMIT.
 */
export function probeArrest(phi: number, tau: number, grid: ModeCouplingGrid, start?: Float64Array): ArrestProbe | null {
  const lambda = tau === Infinity ? 0 : baxterLambdaUnchecked(phi, tau);
  if (lambda === null || structureFactorUnchecked(phi, lambda, 0) > LONG_WAVELENGTH_LIMIT) return null;
  const vertex = modeCouplingVertex(phi, lambda, grid);
  const run = nonergodicityIteration(vertex, start);
  const f = run.f;
  let previousChange = NaN;
  let previousRate = NaN;
  for (let iteration = 1; iteration <= MAX_ITERATIONS; iteration++) {
    const { change, largest } = run.step();
    if (largest < DECAYED) return { arrested: false, g: NaN, iterations: iteration, f };
    const rate = change / previousChange;
    if (change === 0) return { arrested: true, g: 1, iterations: iteration, f };
    if (iteration > 8 && rate < 1 && Math.abs(rate - previousRate) < RATE_SETTLED && (change * rate) / (1 - rate) < TAIL_SHARE * largest) {
      return { arrested: true, g: (1 - rate) * (1 - rate), iterations: iteration, f };
    }
    previousChange = change;
    previousRate = rate;
  }
  return { arrested: true, g: 0, iterations: MAX_ITERATIONS, f };
}
