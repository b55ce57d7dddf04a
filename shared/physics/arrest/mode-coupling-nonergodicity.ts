import { baxterLambdaUnchecked } from '../fluid-fluid/baxter-py-lambda';
import { requireStickiness } from '../validation/require-stickiness';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { DEFAULT_MODE_COUPLING_GRID, modeCouplingGrid, type ModeCouplingGrid } from './mode-coupling-grid';
import { DECAYED, nonergodicityIteration } from './nonergodicity-step';
import { modeCouplingVertex, type ModeCouplingVertex } from './mode-coupling-vertex';

/** Result of the non-ergodicity iteration at one state. */
export interface NonergodicityResult {
  /** True when the iteration settled on f > 0 (a glass in idealised MCT). */
  readonly arrested: boolean;
  /** Wave numbers kσ of the grid. */
  readonly k: number[];
  /** The non-ergodicity parameter f_q (zeros when ergodic). */
  readonly f: number[];
  /** S(k) on the grid. */
  readonly structureFactor: number[];
  readonly iterations: number;
}

export interface NonergodicityOptions {
  /** Grid points M (default 100). */
  points?: number;
  /** Cut-off k_max σ (default 40). */
  cutoff?: number;
}

/** Iteration stops: settled when no f_q moves by more than this in one step. */
const SETTLED = 1e-9;
const MAX_ITERATIONS = 20_000;

/**
 * Non-ergodicity parameter of idealised mode-coupling theory for Percus–Yevick adhesive hard
 * spheres (τ = Infinity: hard spheres): the largest solution of f_q/(1 − f_q) = m_q[f], found by
 * iterating f ← m[f]/(1 + m[f]) from f = 1 (the iterates fall monotonically onto the largest
 * fixed point). Arrested (a glass) when it settles on f > 0, ergodic when f decays to 0.
 * Grid: midpoints up to k_max (default M = 100, k_max σ = 40); for sticky spheres the result
 * depends on k_max (the contact δ-function keeps c(k) from decaying): state it with any figure.
 *
 * Source: W. Götze (1991); T. Franosch, M. Fuchs, W. Götze, M. R. Mayr & A. P. Singh, Phys. Rev.
 * E 55, 7153 (1997); sticky spheres: J. Bergenholtz & M. Fuchs, Phys. Rev. E 59, 5706 (1999).
 *
 * @param phi volume fraction, 0 < φ < 1.
 * @param tau stickiness τ > 0 or Infinity (hard spheres).
 * @returns f_q on the grid and whether the state is arrested, or `null` where Percus–Yevick has
 *   no solution (no-solution band below τ_c).
 * @throws PhysicsArgumentError naming phi, tau, options.points or options.cutoff.
 * @example modeCouplingNonergodicity(0.53, Infinity).arrested // true (hard spheres, φ_c = 0.5159)
 */
export function modeCouplingNonergodicity(phi: number, tau: number, options: NonergodicityOptions = {}): NonergodicityResult | null {
  requireVolumeFraction('phi', phi, 1);
  requireStickiness('tau', tau);
  const grid = gridOf(options);
  const lambda = tau === Infinity ? 0 : baxterLambdaUnchecked(phi, tau);
  if (lambda === null) return null;
  const vertex = modeCouplingVertex(phi, lambda, grid);
  const solved = iterateNonergodicity(vertex);
  return {
    arrested: solved.arrested,
    k: Array.from(grid.k),
    f: Array.from(solved.f),
    structureFactor: Array.from(vertex.structure),
    iterations: solved.iterations,
  };
}

function gridOf(options: NonergodicityOptions): ModeCouplingGrid {
  return modeCouplingGrid(
    options.points ?? DEFAULT_MODE_COUPLING_GRID.points,
    options.cutoff ?? DEFAULT_MODE_COUPLING_GRID.cutoff,
  );
}

/**
 * The fixed-point iteration on a prepared vertex, from f = 1 until no f_q moves by more than
 * `settled` in one step (arrested) or every f_q fell below 1e-4 (ergodic). `convergenceRate` is
 * the ratio of the last two largest changes (→ the stability matrix's largest eigenvalue).
 * Internal (the transition search reuses it).
 */
export function iterateNonergodicity(vertex: ModeCouplingVertex, settled: number = SETTLED): { arrested: boolean; f: Float64Array; iterations: number; convergenceRate: number } {
  const iteration = nonergodicityIteration(vertex);
  const f = iteration.f;
  let previousChange = NaN;
  let rate = NaN;
  for (let count = 1; count <= MAX_ITERATIONS; count++) {
    const { change, largest } = iteration.step();
    if (largest < DECAYED) return { arrested: false, f: f.fill(0), iterations: count, convergenceRate: NaN };
    rate = change / previousChange;
    previousChange = change;
    if (change < settled) return { arrested: true, f, iterations: count, convergenceRate: rate };
  }
  // Not settled within the cap: only states within ~1e-8 of the transition get here; the
  // iterates still sit on the plateau, so the state is counted as arrested.
  return { arrested: true, f, iterations: MAX_ITERATIONS, convergenceRate: rate };
}
