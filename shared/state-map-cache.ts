import { buildStateMap, type ClassifierParameters, type GlassLineMapping, type MapModel, type StateMap, type StateMapOptions } from './physics';

const CACHE_SIZE = 64;
const maps = new Map<string, StateMap>();

/**
 * A state map built once per model and options, kept least-recently-used: recipes of one
 * programme share a few maps, so saving, re-predicting and live previews stay fast
 * (a map takes 10–100 ms to build; a lookup microseconds).
 */
export function cachedStateMap(model: MapModel, options: { parameters?: Partial<ClassifierParameters>; polydispersity?: number; yMax?: number; glassLine?: GlassLineMapping } = {}): StateMap {
  const clean: StateMapOptions = {};
  if (options.parameters) clean.parameters = options.parameters;
  if (options.polydispersity !== undefined) clean.polydispersity = options.polydispersity;
  if (options.yMax !== undefined) clean.yMax = options.yMax;
  if (options.glassLine !== undefined && options.glassLine !== 'rescaled') clean.glassLine = options.glassLine;
  const key = JSON.stringify([model, clean]);
  const hit = maps.get(key);
  if (hit) {
    maps.delete(key);
    maps.set(key, hit);
    return hit;
  }
  const map = buildStateMap(model, clean);
  maps.set(key, map);
  if (maps.size > CACHE_SIZE) maps.delete(maps.keys().next().value!);
  return map;
}
