// Deep imports: the client's map chunk loads this without the rest of shared/physics.
import { attractionToMapY } from './physics/map/attraction-to-map-y';
import type { AttractionInput, StateMap } from './physics/map/types';
import { PhysicsArgumentError } from './physics/validation/physics-argument-error';

/** What places a recipe (or an observation of one) on a state map: a recipe's derived attraction. */
export interface MapPlaceable {
  polymerReservoir: number | null;
  sizeRatio: number | null;
  reducedB2: number | null;
}

/** Size ratios this close (relative) count as the map's own: stored ratios are shortened (map overlay). */
const SAME_SIZE_RATIO = 1e-5;

/**
 * The attraction by which a point is placed on a map: on a depletion map whose size ratio is the
 * point's own (within 1e-5), directly by its reservoir polymer fraction φ_p^R; anywhere else by
 * its B2* (extended law of corresponding states, Noro & Frenkel 2000); null when it has neither.
 *
 * @example mapAttractionOf(depletionMap(0.1), { polymerReservoir: 0.3, sizeRatio: 0.1000001, reducedB2: -2 }) // { kind: 'depletion', q: 0.1, polymerReservoir: 0.3 }
 */
export function mapAttractionOf(map: StateMap, point: MapPlaceable): AttractionInput | null {
  const { polymerReservoir, sizeRatio, reducedB2 } = point;
  const mapQ = map.model.kind === 'depletion' ? map.model.q : null;
  if (mapQ !== null && polymerReservoir !== null && sizeRatio !== null && Math.abs(sizeRatio - mapQ) <= SAME_SIZE_RATIO * mapQ) {
    return { kind: 'depletion', q: mapQ, polymerReservoir };
  }
  return reducedB2 !== null ? { kind: 'b2', value: reducedB2 } : null;
}

/**
 * A point's y on the map's own axis (attractionToMapY of mapAttractionOf; not flipped for drawing,
 * no attraction shift), or null when it has no place there: no attraction, a value the physics
 * refuses, or one that is not finite.
 */
export function mapYOf(map: StateMap, point: MapPlaceable): number | null {
  const attraction = mapAttractionOf(map, point);
  if (attraction === null) return null;
  try {
    const y = attractionToMapY(map, attraction);
    return Number.isFinite(y) ? y : null;
  } catch (error) {
    if (error instanceof PhysicsArgumentError) return null;
    throw error;
  }
}
