import { describe, expect, it } from 'vitest';
import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { squareWellDepthFromReducedB2 } from '../attraction/square-well-depth-from-reduced-b2';
import { squareWellReducedB2 } from '../attraction/square-well-reduced-b2';
import { attractionToMapY } from './attraction-to-map-y';
import { attractionToReducedB2 } from './attraction-to-reduced-b2';
import { cachedMap, depletionMap, meanFieldB2Map } from '../test-support/map-builders';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';

describe('attraction conversions', () => {
  it('attractionToReducedB2 gives B2* for every description', () => {
    expect(attractionToReducedB2({ kind: 'b2', value: -2.5 })).toBe(-2.5);
    expect(attractionToReducedB2({ kind: 'tau', value: 0.1 })).toBeCloseTo(-1.5, 14);
    expect(attractionToReducedB2({ kind: 'squareWell', depth: 2, lambda: 1.1 })).toBeCloseTo(squareWellReducedB2(2, 1.1), 14);
    expect(attractionToReducedB2({ kind: 'depletion', q: 0.1, polymerReservoir: 0.25 })).toBeCloseTo(-1.2559058938454251, 9);
  });

  it('attractionToMapY places B2* on the B2*, 1/τ and U/kT axes', () => {
    expect(attractionToMapY(meanFieldB2Map(), { kind: 'tau', value: 0.1 })).toBeCloseTo(-1.5, 14);
    const inverse = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'inverseTau' });
    expect(attractionToMapY(inverse, { kind: 'b2', value: -2 })).toBeCloseTo(12, 13);
    expect(attractionToMapY(inverse, { kind: 'tau', value: 0.25 })).toBeCloseTo(4, 13);
    const well = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'squareWellDepth', lambda: 1.1 });
    expect(attractionToMapY(well, { kind: 'b2', value: -3 })).toBeCloseTo(squareWellDepthFromReducedB2(-3, 1.1), 13);
    // A square well of another range lands where a λ = 1.1 well has the same B2*.
    expect(attractionToMapY(well, { kind: 'squareWell', depth: 1, lambda: 1.5 })).toBeCloseTo(squareWellDepthFromReducedB2(squareWellReducedB2(1, 1.5), 1.1), 12);
  });

  it('attractionToMapY places depletion at its own q directly and other attractions at equal B2*', () => {
    const map = depletionMap(0.3);
    expect(attractionToMapY(map, { kind: 'depletion', q: 0.3, polymerReservoir: 0.42 })).toBe(0.42);
    const y = attractionToMapY(map, { kind: 'b2', value: -2 });
    expectRelative(asakuraOosawaReducedB2(0.3, y), -2, 1e-6);
    const other = attractionToMapY(map, { kind: 'depletion', q: 0.5, polymerReservoir: 0.4 });
    expectRelative(asakuraOosawaReducedB2(0.3, other), asakuraOosawaReducedB2(0.5, 0.4), 1e-6);
    // Beyond the top of the map the exact quadrature is used.
    const far = attractionToMapY(map, { kind: 'b2', value: -40 });
    expect(far).toBeGreaterThan(map.y.strongest);
    expectRelative(asakuraOosawaReducedB2(0.3, far), -40, 1e-9);
  });

  it('attractionToMapY grows with attraction on every axis (up is stickier)', () => {
    const maps = [meanFieldB2Map(), cachedMap({ kind: 'generic', theory: 'meanField', axis: 'inverseTau' }), depletionMap(0.3)];
    for (const map of maps) {
      const up = (value: number) => (attractionToMapY(map, { kind: 'b2', value }) - map.y.weakest) / (map.y.strongest - map.y.weakest);
      expect(up(-3)).toBeGreaterThan(up(-1));
      expect(up(-1)).toBeGreaterThan(up(0.5));
    }
  });

  it('the conversions reject bad attractions, naming the field', () => {
    expectArgumentError(() => attractionToReducedB2({ kind: 'squareWell', depth: 1, lambda: 0.9 }), 'lambda');
    expectArgumentError(() => attractionToReducedB2({ kind: 'depletion', q: 0, polymerReservoir: 0.1 }), 'q');
    expectArgumentError(() => attractionToReducedB2(null as never), 'attraction');
    expectArgumentError(() => attractionToMapY(depletionMap(0.3), { kind: 'depletion', q: 0.3, polymerReservoir: -1 }), 'polymerReservoir');
  });
});
