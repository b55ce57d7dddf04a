import { requireInRange } from '../validation/require-in-range';
import { attractionToReducedB2 } from './attraction-to-reduced-b2';
import type { MapFrame } from './map-frame';
import type { AttractionInput, StateMap } from './types';

// Imported bindings read once (under some loaders each read is an accessor call; this runs per point).
const toReducedB2 = attractionToReducedB2;
const checkRange = requireInRange;

/**
 * B2* of an attraction and its y on the map (no attraction shift: where the point is drawn),
 * written into `out` (reused by the classifier). A depletion input at the map's own q is placed
 * directly at y = φ_p^R (its B2* from the map's table); anything else goes through B2*. Internal.
 */
export function attractionOnMap(map: StateMap, drawn: MapFrame, attraction: AttractionInput, out: { b2: number; y: number } = { b2: 0, y: 0 }): { b2: number; y: number } {
  if (attraction !== null && typeof attraction === 'object') {
    // Fast paths for the two descriptions a map is usually fed; checks stay exact.
    if (attraction.kind === 'b2' && typeof attraction.value === 'number' && Number.isFinite(attraction.value)) {
      out.b2 = attraction.value;
      out.y = drawn.yFromB2(attraction.value);
      return out;
    }
    if (map.model.kind === 'depletion' && attraction.kind === 'depletion' && attraction.q === map.model.q) {
      const y = checkRange('polymerReservoir', attraction.polymerReservoir, 0, Infinity, { what: 'a reservoir polymer fraction', lowEnd: 'closed' });
      out.b2 = drawn.b2FromY(y);
      out.y = y;
      return out;
    }
  }
  const b2 = toReducedB2(attraction);
  out.b2 = b2;
  out.y = drawn.yFromB2(b2);
  return out;
}
