import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';

/** A midpoint wave-number grid kᵢ = (i + ½)Δk, i = 0 … M − 1, Δk = k_max/M (σ = 1). */
export interface ModeCouplingGrid {
  /** Number of grid points M. */
  readonly points: number;
  /** Cut-off k_max σ. */
  readonly cutoff: number;
  /** Spacing Δk = k_max/M. */
  readonly step: number;
  readonly k: Float64Array;
}

/**
 * Gelwright's default grid: M = 100 points up to k_max σ = 40 (Δk = 0.4), the cut-off of the
 * usual hard-sphere calculations (Franosch et al., Phys. Rev. E 55, 7153 (1997)). The hard-sphere
 * transition on it is φ_c = 0.51591 (see the tests for its convergence with M).
 */
export const DEFAULT_MODE_COUPLING_GRID = Object.freeze({ points: 100, cutoff: 40 });

/**
 * The midpoint grid of the mode-coupling integrals: kᵢ = (i + ½)·k_max/M.
 *
 * @param points M, an integer in [20, 2000].
 * @param cutoff k_max σ in [10, 400].
 * @throws PhysicsArgumentError naming points or cutoff.
 * @example modeCouplingGrid(100, 40).k[0] // 0.2
 */
export function modeCouplingGrid(points: number = DEFAULT_MODE_COUPLING_GRID.points, cutoff: number = DEFAULT_MODE_COUPLING_GRID.cutoff): ModeCouplingGrid {
  requireInRange('points', points, 20, 2000, { what: 'a number of grid points', lowEnd: 'closed', highEnd: 'closed' });
  if (!Number.isInteger(points)) throw new PhysicsArgumentError('points', 'an integer in [20, 2000]', points);
  requireInRange('cutoff', cutoff, 10, 400, { what: 'a wave-number cut-off k_max σ', lowEnd: 'closed', highEnd: 'closed' });
  const step = cutoff / points;
  const k = new Float64Array(points);
  for (let i = 0; i < points; i++) k[i] = (i + 0.5) * step;
  return { points, cutoff, step, k };
}
