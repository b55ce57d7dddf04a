import { locateGlassTransition, GLASS_SEARCH_TOP } from './locate-glass-transition';
import { DEFAULT_MODE_COUPLING_GRID, modeCouplingGrid } from './mode-coupling-grid';

/** The MCT glass line of adhesive spheres at a ladder of stickiness levels. */
export interface ModeCouplingGlassLine {
  /** Stickiness of each level, from Infinity (hard spheres) to the stickiest. */
  readonly tau: number[];
  /** φ_c at each level as computed; NaN where it could not be evaluated (held). */
  readonly computedPhi: number[];
  /** φ_g drawn: computed up to the nose, then never rising again (see below). */
  readonly phi: number[];
  /** Index of the nose (largest φ_c): levels past it are the attractive glass. */
  readonly nose: number;
  /** φ_c of hard spheres on this grid (level 0). */
  readonly hardSpherePhi: number;
  readonly points: number;
  readonly cutoff: number;
  /** Iterations of the fixed point spent on the line. */
  readonly iterations: number;
}

/** The weakest finite and the strongest stickiness of the ladder. */
export const GLASS_LINE_TAU_RANGE = Object.freeze({ weakest: 10, stickiest: 0.005 });
export const GLASS_LINE_LEVELS = 40;

const lines = new Map<string, ModeCouplingGlassLine>();

/**
 * The idealised MCT glass line of Percus–Yevick adhesive spheres at 40 stickiness levels:
 * hard spheres, then τ geometric from 10 to 0.005 (B2* from 0.975 to −49). Each level's φ_c is
 * located by the square-root-law search (locateGlassTransition, ±~1e-3) started from the trend
 * of the levels before it. The line is re-entrant: φ_c rises above the hard-sphere value with
 * weak stickiness (bonds open space in the cages), peaks (the nose), then falls (bonds cage the
 * particles: the attractive glass) — Bergenholtz & Fuchs, Phys. Rev. E 59, 5706 (1999); Dawson
 * et al., Phys. Rev. E 63, 011401 (2000); seen by Pham et al., Science 296, 104 (2002).
 * Past the nose, from the first level whose search meets states without a usable structure
 * factor (inside Percus–Yevick's no-solution band, or near-critical with S(0) > 1 where MCT
 * arrests on long-wavelength fluctuations) the line holds its last computed value for every
 * stickier level, and it never rises again past the nose: square-well MCT's attractive glass
 * moves to lower φ with stronger attraction (Dawson et al. 2000), so holding errs toward gel.
 * Computed once per grid and kept.
 *
 * @param options grid points (default 100) and cut-off k_max σ (default 40): the sticky part of
 *   the line depends on the cut-off; state it with the line.
 */
export function modeCouplingGlassLine(options: { points?: number; cutoff?: number } = {}): ModeCouplingGlassLine {
  const grid = modeCouplingGrid(options.points ?? DEFAULT_MODE_COUPLING_GRID.points, options.cutoff ?? DEFAULT_MODE_COUPLING_GRID.cutoff);
  const key = `${grid.points}/${grid.cutoff}`;
  const cached = lines.get(key);
  if (cached) return cached;
  const { weakest, stickiest } = GLASS_LINE_TAU_RANGE;
  const tau = [Infinity, ...Array.from({ length: GLASS_LINE_LEVELS - 1 }, (_, i) => weakest * (stickiest / weakest) ** (i / (GLASS_LINE_LEVELS - 2)))];
  const computedPhi: number[] = [];
  let iterations = 0;
  let nose = 0;
  let held: number | null = null;
  let curvature: number | undefined;
  for (let i = 0; i < tau.length; i++) {
    if (held !== null) {
      computedPhi.push(NaN);
      continue;
    }
    const previous = computedPhi[i - 1] ?? 0.5;
    const trend = i >= 2 ? Math.max(-0.03, Math.min(0.03, computedPhi[i - 1] - computedPhi[i - 2])) : 0;
    // Neighbouring levels share the curvature of the square-root law: every other level reuses
    // the one measured just below it (two probes instead of three) and the next measures afresh.
    const located = locateGlassTransition(tau[i], grid, previous + trend - 0.003, 1e-3, undefined, curvature);
    curvature = curvature === undefined ? located.curvature : undefined;
    iterations += located.iterations;
    if (computedPhi[nose] > located.phi && located.blocked) {
      // Past the nose and no longer evaluable: hold the last clean value from here on.
      held = computedPhi[i - 1];
      computedPhi.push(NaN);
      continue;
    }
    computedPhi.push(Math.min(located.phi, GLASS_SEARCH_TOP));
    if (computedPhi[i] > computedPhi[nose]) nose = i;
  }
  const phi = computedPhi.map((value, i) => (Number.isNaN(value) ? held! : value));
  for (let i = nose + 1; i < phi.length; i++) phi[i] = Math.min(phi[i], phi[i - 1]);
  const line: ModeCouplingGlassLine = { tau, computedPhi, phi, nose, hardSpherePhi: computedPhi[0], points: grid.points, cutoff: grid.cutoff, iterations };
  lines.set(key, line);
  return line;
}

/** Forget computed lines (benchmarks time a cold computation). */
export function clearModeCouplingGlassLines(): void {
  lines.clear();
}
