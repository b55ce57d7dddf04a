import { FCC_CLOSE_PACKING, type StateMap } from '../physics';

/**
 * Normalised map coordinates of a point, the units of classifyPoint's margin: x = φ/φ_cp and
 * u = (y − y_weakest)/(y_strongest − y_weakest), so the drawn map is the unit square.
 * @example mapPosition(map, 0.3701, map.y.weakest) // { x: 0.4998…, u: 0 }
 */
export function mapPosition(map: StateMap, phi: number, y: number): { x: number; u: number } {
  return { x: phi / FCC_CLOSE_PACKING, u: (y - map.y.weakest) / (map.y.strongest - map.y.weakest) };
}
