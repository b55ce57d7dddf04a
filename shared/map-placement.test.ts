import { describe, expect, it } from 'vitest';
import { mapAttractionOf, mapYOf } from './map-placement';
import { attractionToMapY } from './physics/map/attraction-to-map-y';
import { depletionMap, meanFieldB2Map } from './physics/test-support/map-builders';

// Placement rules of the map overlay and the planner's evidence; the expected values follow from
// the rule itself (a point at the map's own q sits at y = φ_p^R; B2* maps through the map's axis).
describe('mapAttractionOf / mapYOf', () => {
  it('places a point at the depletion map’s own size ratio (within 1e-5) directly by its φ_p^R', () => {
    const map = depletionMap(0.1);
    const point = { polymerReservoir: 0.3, sizeRatio: 0.1000001, reducedB2: -2 };
    expect(mapAttractionOf(map, point)).toEqual({ kind: 'depletion', q: 0.1, polymerReservoir: 0.3 });
    expect(mapYOf(map, point)).toBe(0.3);
  });

  it('places a point of another size ratio, or on a generic map, through its B2*', () => {
    const depletion = depletionMap(0.1);
    const elsewhere = { polymerReservoir: 0.3, sizeRatio: 0.2, reducedB2: -2 };
    expect(mapAttractionOf(depletion, elsewhere)).toEqual({ kind: 'b2', value: -2 });
    expect(mapYOf(depletion, elsewhere)).toBe(attractionToMapY(depletion, { kind: 'b2', value: -2 }));
    expect(mapYOf(meanFieldB2Map(), elsewhere)).toBe(-2);
  });

  it('gives no place to a point without an attraction', () => {
    expect(mapAttractionOf(meanFieldB2Map(), { polymerReservoir: null, sizeRatio: null, reducedB2: null })).toBeNull();
    expect(mapYOf(depletionMap(0.1), { polymerReservoir: 0.3, sizeRatio: null, reducedB2: null })).toBeNull();
  });
});
