import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { reducedB2FromStickiness } from '../attraction/reduced-b2-from-stickiness';
import { squareWellReducedB2 } from '../attraction/square-well-reduced-b2';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireFinite } from '../validation/require-finite';
import type { AttractionInput } from './types';

/**
 * Reduced second virial coefficient of any supported attraction description: B2* itself;
 * Baxter τ (B2* = 1 − 1/(4τ)); a square well (1 − (λ³ − 1)(e^U − 1)); or Asakura–Oosawa
 * depletion at (q, φ_p^R) by quadrature. B2* is the common currency of every map (extended law
 * of corresponding states, Noro & Frenkel, J. Chem. Phys. 113, 2941 (2000)).
 *
 * @param attraction `{ kind: 'b2', value }` (finite), `{ kind: 'tau', value }` (τ > 0),
 *   `{ kind: 'squareWell', depth, lambda }` (0 ≤ U ≤ 700, λ > 1) or
 *   `{ kind: 'depletion', q, polymerReservoir }` (q > 0, φ_p^R ≥ 0).
 * @throws PhysicsArgumentError naming the bad field (e.g. `tau must be a Baxter stickiness τ in (0, Infinity); got 0`).
 * @example attractionToReducedB2({ kind: 'tau', value: 0.1 }) // -1.5
 */
export function attractionToReducedB2(attraction: AttractionInput): number {
  if (attraction === null || typeof attraction !== 'object') {
    throw new PhysicsArgumentError('attraction', "an attraction { kind: 'b2' | 'tau' | 'squareWell' | 'depletion', … }", attraction);
  }
  switch (attraction.kind) {
    case 'b2':
      return requireFinite('b2', attraction.value, 'a finite reduced second virial coefficient');
    case 'tau':
      return reducedB2FromStickiness(attraction.value);
    case 'squareWell':
      return squareWellReducedB2(attraction.depth, attraction.lambda);
    case 'depletion':
      return asakuraOosawaReducedB2(attraction.q, attraction.polymerReservoir);
    default:
      throw new PhysicsArgumentError('attraction.kind', "'b2', 'tau', 'squareWell' or 'depletion'", (attraction as { kind?: unknown }).kind);
  }
}
