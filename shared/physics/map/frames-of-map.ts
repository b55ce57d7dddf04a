import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { createMapFrame, type MapFrame } from './map-frame';
import type { StateMap } from './types';

const cache = new WeakMap<StateMap, { theory: MapFrame; drawn: MapFrame }>();

/**
 * The theory-frame and drawn-frame coordinate conversions of a built map (cached per map
 * object). Internal.
 *
 * @throws PhysicsArgumentError if `map` is not a StateMap from buildStateMap.
 */
export function framesOfMap(map: StateMap): { theory: MapFrame; drawn: MapFrame } {
  if (map === null || typeof map !== 'object' || !map.tables || !map.y || !map.model) {
    throw new PhysicsArgumentError('map', 'a StateMap returned by buildStateMap', map);
  }
  const cached = cache.get(map);
  if (cached) return cached;
  const table = map.tables.reducedB2;
  const frames = {
    theory: createMapFrame(map.model, map.y, 0, table),
    drawn: createMapFrame(map.model, map.y, map.parameters.attractionShift, table),
  };
  cache.set(map, frames);
  return frames;
}
