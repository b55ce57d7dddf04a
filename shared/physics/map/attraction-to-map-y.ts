import { attractionOnMap } from './attraction-on-map';
import { framesOfMap } from './frames-of-map';
import type { AttractionInput, StateMap } from './types';

/**
 * The y coordinate (in the map's own unit) at which an attraction is drawn on a map: through its
 * B2* (extended law of corresponding states) — B2* itself, 1/τ = 4(1 − B2*), the square-well depth
 * at the map's λ with that B2*, or, on a depletion map, the reservoir polymer fraction at the
 * map's q with the same Asakura–Oosawa B2* (an input at the map's own q is placed directly).
 * The map's attraction shift is not applied (it moves the boundaries, not the points).
 * Values beyond the axis are returned as they are (off the map), never clamped.
 *
 * @throws PhysicsArgumentError for a bad map or attraction (see attractionToReducedB2).
 * @example attractionToMapY(buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'inverseTau' }), { kind: 'b2', value: -2 }) // 12
 */
export function attractionToMapY(map: StateMap, attraction: AttractionInput): number {
  const { drawn } = framesOfMap(map);
  return attractionOnMap(map, drawn, attraction).y;
}
