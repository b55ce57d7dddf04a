import type { ModeCouplingGrid } from './mode-coupling-grid';
import { probeArrest, type ArrestProbe } from './mode-coupling-probe';

/** Highest φ searched: above it the Percus–Yevick input is meaningless (φ_cp = 0.7405). */
export const GLASS_SEARCH_TOP = 0.74;
/** Lowest φ searched. */
export const GLASS_SEARCH_BOTTOM = 0.02;

/** Distances above the guess at which the square-root law is sampled. */
const OFFSETS = [0.024, 0.013, 0.006];
/** With the curvature of g known from a neighbouring level, two probes suffice. */
const OFFSETS_WITH_CURVATURE = [0.024, 0.012];

export interface LocatedTransition {
  /** φ_c (GLASS_SEARCH_TOP when no arrest was found below it, `floor` when arrested down to it). */
  readonly phi: number;
  /** Iterations spent (all probes). */
  readonly iterations: number;
  /** True when a probe met a state without a usable structure factor (no PY solution, S(0) > 1). */
  readonly blocked: boolean;
  /** Curvature d²g/dφ²/2 of the square-root law measured here (three probes), else the hint. */
  readonly curvature: number | undefined;
}

/**
 * The idealised MCT glass transition φ_c at stickiness τ near `guess`, searched no lower than
 * `floor`:
 * 1. probe three states above the guess (guess + 0.024, + 0.013, + 0.006) — two (+ 0.024, + 0.012)
 *    when `curvatureHint` carries the curvature of g from a neighbouring level; each arrested one
 *    gives g = (1 − E)² (see probeArrest), which vanishes at φ_c like a(φ − φ_c) + b(φ − φ_c)²;
 * 2. all arrested: the quadratic through the points (with the known curvature) is solved for
 *    g = 0; if that lies well below the guess the search restarts from there;
 * 3. a probe not arrested (ergodic, or no Percus–Yevick solution) brackets φ_c: bisection until
 *    two arrested probes lie within 0.012 of the bracket (or it is 2·tolerance wide), then the
 *    extrapolation of the arrested probes, kept inside the bracket.
 * Internal (the line and the single-level search use it).
 */
export function locateGlassTransition(tau: number, grid: ModeCouplingGrid, guess: number, tolerance: number, floor = GLASS_SEARCH_BOTTOM, curvatureHint?: number): LocatedTransition {
  let curvature = curvatureHint;
  let iterations = 0;
  let blocked = false;
  // Arrested iterates at higher φ start the probes below them (f grows with φ at fixed τ).
  let above: { phi: number; f: Float64Array } | null = null;
  const probe = (phi: number): ArrestProbe | null => {
    const result = probeArrest(phi, tau, grid, above !== null && above.phi > phi ? above.f : undefined);
    if (result) iterations += result.iterations;
    else blocked = true;
    if (result?.arrested && (above === null || phi < above.phi)) above = { phi, f: result.f };
    return result;
  };
  const arrestedAt = (phi: number) => {
    const result = probe(phi);
    return result !== null && result.arrested ? result : null;
  };
  let center = Math.max(guess, floor);
  for (let round = 0; round < 6; round++) {
    const points: Array<[number, number]> = [];
    let ergodicBelow = -Infinity;
    for (const offset of curvature === undefined ? OFFSETS : OFFSETS_WITH_CURVATURE) {
      const phi = Math.min(center + offset, GLASS_SEARCH_TOP);
      const result = arrestedAt(phi);
      if (!result) {
        ergodicBelow = phi;
        break;
      }
      points.push([phi, result.g]);
    }
    if (points.length === 0) {
      // Even guess + 0.024 is not arrested: the transition lies higher.
      if (center + OFFSETS[0] >= GLASS_SEARCH_TOP) return { phi: GLASS_SEARCH_TOP, iterations, blocked, curvature };
      center += 0.05;
      continue;
    }
    if (ergodicBelow > -Infinity) {
      // Bracketed: bisect until two arrested points sit within 0.02 of the bracket, then let the
      // square-root law place φ_c inside it.
      let low = ergodicBelow;
      let high = points[points.length - 1][0];
      while (high - low > 2 * tolerance && (points.length < 2 || high - low > 0.012)) {
        const middle = 0.5 * (low + high);
        const result = arrestedAt(middle);
        if (result) {
          high = middle;
          points.push([middle, result.g]);
        } else {
          low = middle;
        }
      }
      const phi = points.length >= 2 ? Math.min(Math.max(squareRootLawRoot(points), low), high) : 0.5 * (low + high);
      return { phi, iterations, blocked, curvature };
    }
    if (points.length >= 3) curvature = quadraticCurvature(points);
    const root = squareRootLawRoot(points, curvature);
    const lowest = points[points.length - 1][0];
    if (root >= center - 0.01 || center <= floor) {
      const estimate = Math.max(Math.min(root, lowest), floor);
      if (estimate <= floor && arrestedAt(floor)) return { phi: floor, iterations, blocked, curvature };
      return { phi: estimate, iterations, blocked, curvature };
    }
    center = Math.max(root - 0.003, floor);
  }
  return { phi: center, iterations, blocked, curvature };
}

/** The second divided difference of the last three points (the parabola's leading coefficient). */
function quadraticCurvature(points: Array<[number, number]>): number {
  const [x0, y0] = points[points.length - 1];
  const [x1, y1] = points[points.length - 2];
  const [x2, y2] = points[points.length - 3];
  return ((y2 - y1) / (x2 - x1) - (y1 - y0) / (x1 - x0)) / (x2 - x0);
}

/**
 * Where g(φ) = 0 on the parabola through three (φ, g) points (or two and a known curvature) (two points: the line), choosing
 * the root below the points; the line's root if the parabola has none there.
 */
export function squareRootLawRoot(points: Array<[number, number]>, knownCurvature?: number): number {
  const [x0, y0] = points[points.length - 1];
  const [x1, y1] = points[points.length - 2] ?? [x0 + 0.01, y0 + 0.02];
  const slope = (y1 - y0) / (x1 - x0);
  const linear = slope > 0 ? x0 - y0 / slope : x0 - 0.05;
  if (points.length < 3 && knownCurvature === undefined) return linear;
  // Newton's divided differences: g = y0 + s01 (x − x0) + c (x − x0)(x − x1).
  const curvature = points.length >= 3 ? quadraticCurvature(points) : knownCurvature!;
  // Solve c t² + (s01 + c (x0 − x1)) t + y0 = 0 for t = x − x0 < 0.
  const b = slope + curvature * (x0 - x1);
  const discriminant = b * b - 4 * curvature * y0;
  if (curvature === 0 || discriminant < 0) return linear;
  const root = (2 * y0) / (-b - Math.sign(b) * Math.sqrt(discriminant));
  const other = y0 / (curvature * root);
  const below = [root, other].filter((t) => t <= 0).sort((p, q) => q - p)[0];
  return below === undefined ? linear : x0 + below;
}
