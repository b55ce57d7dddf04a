import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';
import { attractionToReducedB2 } from './attraction-to-reduced-b2';
import type { MapFrame } from './map-frame';
import type { AttractionInput, StateMap } from './types';

/**
 * B2* of an attraction and its y on the map (no attraction shift: where the point is drawn).
 * A depletion input at the map's own q is placed directly at y = φ_p^R (its B2* from the map's
 * table); anything else goes through B2*. Internal.
 */
export function attractionOnMap(map: StateMap, drawn: MapFrame, attraction: AttractionInput): { b2: number; y: number } {
  if (map.model.kind === 'depletion' && attraction && attraction.kind === 'depletion' && attraction.q === map.model.q) {
    requirePositive('q', attraction.q, 'a size ratio R_g/a');
    const y = requireInRange('polymerReservoir', attraction.polymerReservoir, 0, Infinity, { what: 'a reservoir polymer fraction', lowEnd: 'closed' });
    return { b2: drawn.b2FromY(y), y };
  }
  const b2 = attractionToReducedB2(attraction);
  return { b2, y: drawn.yFromB2(b2) };
}
