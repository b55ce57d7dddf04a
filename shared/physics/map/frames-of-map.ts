import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { createMapFrame, type MapFrame } from './map-frame';
import type { SegmentIndex } from './segment-index';
import type { StateMap } from './types';

const cache = new WeakMap<StateMap, MapContext>();

/** The conversions of a map and, once built, its nearest-boundary index. Internal. */
export interface MapContext {
  theory: MapFrame;
  drawn: MapFrame;
  index?: SegmentIndex;
}

/**
 * The theory-frame and drawn-frame coordinate conversions of a built map (cached per map
 * object). Internal.
 *
 * @throws PhysicsArgumentError if `map` is not a StateMap from buildStateMap.
 */
export function framesOfMap(map: StateMap): MapContext {
  if (map === null || typeof map !== 'object' || !map.tables || !map.y || !map.model) {
    throw new PhysicsArgumentError('map', 'a StateMap returned by buildStateMap', map);
  }
  const cached = cache.get(map);
  if (cached) return cached;
  const table = map.tables.reducedB2;
  const frames: MapContext = {
    theory: createMapFrame(map.model, map.y, 0, table),
    drawn: createMapFrame(map.model, map.y, map.parameters.attractionShift, table),
  };
  cache.set(map, frames);
  return frames;
}
