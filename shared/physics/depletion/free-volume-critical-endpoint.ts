import { brentRoot } from '../numerics/brent-root';
import { freeVolumeCriticalPointUnchecked } from './free-volume-critical-point';

let cached: number | null = null;

/**
 * Critical endpoint of free-volume theory: the size ratio q above which the colloidal gas–liquid
 * critical point is stable against the crystal (below it the gas–liquid binodal is metastable,
 * inside fluid–crystal coexistence). Solved by Brent's method on q (tolerance 1e-12) for the
 * crystal-minus-fluid pressure at the critical chemical potential.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992), who report about 0.32; with the
 * cell-model constant 2.1306 and the scaled-particle α(φ) used here the value is 0.32754.
 *
 * @returns q_cep; takes no arguments and never throws.
 * @example freeVolumeCriticalEndpoint() // 0.3275445...
 */
export function freeVolumeCriticalEndpoint(): number {
  if (cached !== null) return cached;
  const root = brentRoot((q) => freeVolumeCriticalPointUnchecked(q).stabilityMargin, 0.3, 0.34, { absoluteTolerance: 1e-12 });
  if (root === null) throw new Error('freeVolumeCriticalEndpoint: no sign change (internal error)');
  cached = root;
  return root;
}
