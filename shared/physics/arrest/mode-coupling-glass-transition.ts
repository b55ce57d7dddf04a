import { baxterLambdaUnchecked } from '../fluid-fluid/baxter-py-lambda';
import { requireInRange } from '../validation/require-in-range';
import { requireStickiness } from '../validation/require-stickiness';
import { GLASS_SEARCH_TOP, locateGlassTransition } from './locate-glass-transition';
import { DEFAULT_MODE_COUPLING_GRID, modeCouplingGrid, type ModeCouplingGrid } from './mode-coupling-grid';
import { iterateNonergodicity } from './mode-coupling-nonergodicity';
import { LONG_WAVELENGTH_LIMIT } from './mode-coupling-probe';
import { modeCouplingVertex } from './mode-coupling-vertex';
import { stickinessFromReducedB2 } from '../attraction/stickiness-from-reduced-b2';
import { attractionToReducedB2 } from '../map/attraction-to-reduced-b2';
import type { AttractionInput } from '../map/types';
import { structureFactorUnchecked } from './baxter-sticky-structure-factor';
import { SHORT_RANGE_LIMIT } from './short-range-limit';

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
  /** The adhesive-sphere stickiness the attraction was mapped to (Infinity: hard spheres). */
  readonly tau: number;
  /**
   * How the attraction was placed: 'sticky' (Baxter τ of equal B2*), or 'hardSphere' when it is
   * too long-ranged (range > SHORT_RANGE_LIMIT) or not attractive (B2* ≥ 1).
   */
  readonly mapping: 'sticky' | 'hardSphere';
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
 * Any other short-range attraction (square well, Asakura–Oosawa depletion, a B2*) is mapped to
 * the adhesive spheres of equal B2*, τ = 1/(4(1 − B2*)) (extended law of corresponding states,
 * Noro & Frenkel 2000); the grid's cut-off k_max stands in for the finite range. An attraction
 * longer than SHORT_RANGE_LIMIT (square-well λ − 1 or depletion q above 0.25) is given the
 * hard-sphere transition: the adhesive-sphere glasses are short-range effects.
 *
 * @param attraction stickiness τ > 0 or Infinity, or an AttractionInput.
 * @param options grid (points 20–2000, cutoff 10–400) and tolerance.
 * @throws PhysicsArgumentError naming tau, the attraction's field, options.tolerance, points or cutoff.
 * @example modeCouplingGlassTransition(Infinity).phi // 0.51591 (± 1e-4)
 * @example modeCouplingGlassTransition({ kind: 'depletion', q: 1, polymerReservoir: 0.3 }).mapping // 'hardSphere'
 */
export function modeCouplingGlassTransition(attraction: number | AttractionInput, options: GlassTransitionOptions = {}): GlassTransition {
  const { tau, mapping } = stickinessOfAttraction(attraction);
  const tolerance = requireInRange('options.tolerance', options.tolerance ?? 1e-4, 1e-7, 0.01, { what: 'a tolerance in φ', lowEnd: 'closed', highEnd: 'closed' });
  const grid = modeCouplingGrid(options.points ?? DEFAULT_MODE_COUPLING_GRID.points, options.cutoff ?? DEFAULT_MODE_COUPLING_GRID.cutoff);
  const base = { tau, mapping, points: grid.points, cutoff: grid.cutoff, tolerance };
  const located = locateGlassTransition(tau, grid, 0.5, 2e-3);
  if (located.phi >= GLASS_SEARCH_TOP) return { ...base, phi: null };
  return { ...base, phi: refineTransition(tau, grid, located.phi, tolerance) };
}

/** The adhesive-sphere stickiness an attraction is placed at (see modeCouplingGlassTransition). */
function stickinessOfAttraction(attraction: number | AttractionInput): { tau: number; mapping: GlassTransition['mapping'] } {
  if (typeof attraction === 'number') return { tau: requireStickiness('tau', attraction), mapping: attraction === Infinity ? 'hardSphere' : 'sticky' };
  const b2 = attractionToReducedB2(attraction);
  const range = attraction.kind === 'depletion' ? attraction.q : attraction.kind === 'squareWell' ? attraction.lambda - 1 : 0;
  if (range > SHORT_RANGE_LIMIT || b2 >= 1) return { tau: Infinity, mapping: 'hardSphere' };
  return { tau: stickinessFromReducedB2(b2), mapping: 'sticky' };
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
