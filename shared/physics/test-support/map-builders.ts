import { buildStateMap } from '../map/build-state-map';
import type { MapModel, StateMap, StateMapOptions } from '../map/types';

/** Maps built once per test file and reused (each takes 10–60 ms). */
const cache = new Map<string, StateMap>();

export function cachedMap(model: MapModel, options: StateMapOptions = {}): StateMap {
  const key = JSON.stringify([model, options]);
  let map = cache.get(key);
  if (!map) {
    map = buildStateMap(model, options);
    cache.set(key, map);
  }
  return map;
}

export const meanFieldB2Map = () => cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });
export const baxterB2Map = () => cachedMap({ kind: 'generic', theory: 'baxterPY', axis: 'b2' });
export const depletionMap = (q: number) => cachedMap({ kind: 'depletion', q });

/** Every number anywhere inside a value. */
export function allNumbers(value: unknown, into: number[] = []): number[] {
  if (typeof value === 'number') into.push(value);
  else if (Array.isArray(value)) value.forEach((item) => allNumbers(item, into));
  else if (value && typeof value === 'object') Object.values(value).forEach((item) => allNumbers(item, into));
  return into;
}
