import { baxterLambdaUnchecked } from '../fluid-fluid/baxter-py-lambda';
import { requireInRange } from '../validation/require-in-range';
import { requireStickiness } from '../validation/require-stickiness';
import { GLASS_SEARCH_TOP, locateGlassTransition } from './locate-glass-transition';
import { DEFAULT_MODE_COUPLING_GRID, modeCouplingGrid, type ModeCouplingGrid } from './mode-coupling-grid';
import { iterateNonergodicity } from './mode-coupling-nonergodicity';
import { LONG_WAVELENGTH_LIMIT } from './mode-coupling-probe';
import { modeCouplingVertex } from './mode-coupling-vertex';
import { structureFactorUnchecked } from './baxter-sticky-structure-factor';

export interface GlassTransitionOptions {
  /** Grid points M (default 100). */
  points?: number;
  /** Cut-off k_max σ (default 40). */
  cutoff?: number;
  /** Half-width of the final bracket in φ (default 1e-4, 1e-7 … 0.01). */
  tolerance?: number;
}

export interface GlassTransition {
  /** φ_c of idealised MCT on this grid, or null when no arrest was found below φ = 0.74. */
  readonly phi: number | null;
  readonly tau: number;
  readonly points: number;
  readonly cutoff: number;
  readonly tolerance: number;
}

/**
 * The idealised mode-coupling glass transition φ_c of Percus–Yevick adhesive hard spheres at
 * stickiness τ (τ = Infinity: hard spheres): the lowest φ above which the non-ergodicity
 * parameter f_q is non-zero (see modeCouplingNonergodicity). Found near the square-root-law
 * estimate (locateGlassTransition), then bracketed and bisected with full iterations to the
 * tolerance. States whose S(0) exceeds 1 (near-critical) are not counted as arrested.
 *
 * Sources: T. Franosch, M. Fuchs, W. Götze, M. R. Mayr & A. P. Singh, Phys. Rev. E 55, 7153
 * (1997) (hard spheres, φ_c = 0.515912 on M = 100, k_max σ = 40); J. Bergenholtz & M. Fuchs,
 * Phys. Rev. E 59, 5706 (1999) (sticky spheres, re-entrant line).
 *
 * @param tau stickiness τ > 0 or Infinity.
 * @param options grid (points 20–2000, cutoff 10–400) and tolerance.
 * @throws PhysicsArgumentError naming tau, options.tolerance, points or cutoff.
 * @example modeCouplingGlassTransition(Infinity).phi // 0.51591 (± 1e-4)
 */
export function modeCouplingGlassTransition(tau: number, options: GlassTransitionOptions = {}): GlassTransition {
  requireStickiness('tau', tau);
  const tolerance = requireInRange('options.tolerance', options.tolerance ?? 1e-4, 1e-7, 0.01, { what: 'a tolerance in φ', lowEnd: 'closed', highEnd: 'closed' });
  const grid = modeCouplingGrid(options.points ?? DEFAULT_MODE_COUPLING_GRID.points, options.cutoff ?? DEFAULT_MODE_COUPLING_GRID.cutoff);
  const base = { tau, points: grid.points, cutoff: grid.cutoff, tolerance };
  const located = locateGlassTransition(tau, grid, 0.5, 2e-3);
  if (located.phi >= GLASS_SEARCH_TOP) return { ...base, phi: null };
  return { ...base, phi: refineTransition(tau, grid, located.phi, tolerance) };
}

/** Bracket φ_c around an estimate with exact arrest decisions, then bisect. Internal. */
export function refineTransition(tau: number, grid: ModeCouplingGrid, estimate: number, tolerance: number): number {
  const arrested = (phi: number) => {
    const lambda = tau === Infinity ? 0 : baxterLambdaUnchecked(phi, tau);
    if (lambda === null || structureFactorUnchecked(phi, lambda, 0) > LONG_WAVELENGTH_LIMIT) return false;
    return iterateNonergodicity(modeCouplingVertex(phi, lambda, grid)).arrested;
  };
  let width = 0.004;
  let low = Math.max(estimate - width, 0.001);
  let high = Math.min(estimate + width, GLASS_SEARCH_TOP);
  while (!arrested(high) && high < GLASS_SEARCH_TOP) high = Math.min(high + (width *= 2), GLASS_SEARCH_TOP);
  while (arrested(low) && low > 0.001) {
    high = low;
    low = Math.max(low - (width *= 2), 0.001);
  }
  while (high - low > 2 * tolerance) {
    const middle = 0.5 * (low + high);
    if (arrested(middle)) high = middle; else low = middle;
  }
  return 0.5 * (low + high);
}
