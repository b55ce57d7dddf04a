import { useMemo } from 'react';
import { buildStateMap } from '@shared/physics/map/build-state-map';
import { attractionToMapY } from '@shared/physics/map/attraction-to-map-y';
import type { ClassifierParameters, MapModel, StateMap } from '@shared/physics/map/types';
import type { MapPoints } from '@shared/views/team-data';
import { drawingFromStateMap, drawnY } from '../geometry/from-state-map';
import type { MapView } from '../geometry/map-view';
import { projectPoints } from '../geometry/project-points';
import type { MapDrawing, MapPoint } from '../geometry/types';

export interface MapRequest {
  view: MapView;
  /** Size ratio of the programme's polymer and particles (depletion programmes), or null. */
  sizeRatio: number | null;
  parameters?: Partial<ClassifierParameters>;
  polydispersity?: number;
}

/** The physics model behind a view: the polymer axis is free-volume theory; the others are generic. */
export function modelFor(view: MapView, sizeRatio: number | null): MapModel {
  if (view.axis === 'polymerReservoir' && sizeRatio !== null) return { kind: 'depletion', q: Number(sizeRatio.toPrecision(3)) };
  const axis = view.axis === 'polymerReservoir' ? 'b2' : view.axis;
  return { kind: 'generic', theory: view.theory, axis, ...(axis === 'squareWellDepth' ? { lambda: view.lambda } : {}) };
}

/** Builds (and memoises) the state map of the view, and the drawing of it. */
export function useStateMapDrawing(request: MapRequest): { map: StateMap; drawing: MapDrawing; error: null } | { map: null; drawing: null; error: Error } {
  const model = modelFor(request.view, request.sizeRatio);
  const key = JSON.stringify([model, request.parameters ?? null, request.polydispersity ?? null]);
  return useMemo(() => {
    try {
      const map = buildStateMap(model, { parameters: request.parameters, polydispersity: request.polydispersity });
      return { map, drawing: drawingFromStateMap(map), error: null };
    } catch (error) {
      return { map: null, drawing: null, error: error as Error };
    }
  }, [key]);
}

/**
 * Places the programme's recipes and observations on a map: a point at the map's own size
 * ratio by its polymer fraction, every other one through its B2* (extended corresponding states).
 */
export function placePoints(map: StateMap, data: MapPoints, filter: { minAge: number | null; maxAge: number | null }): { points: MapPoint[]; skipped: number } {
  const ratioOfRecipe = new Map<number, number | null>();
  const ratioColumn = data.recipes.columns.indexOf('sizeRatio');
  for (const row of data.recipes.rows) ratioOfRecipe.set(row[0] as number, row[ratioColumn] as number | null);
  const cache = new Map<string, number | null>();
  return projectPoints(
    data,
    (row, recipeId) => {
      const q = recipeId !== null ? ratioOfRecipe.get(recipeId) ?? null : null;
      const cacheKey = `${row.polymerReservoir}|${q}|${row.reducedB2}`;
      if (cache.has(cacheKey)) return cache.get(cacheKey)!;
      let y: number | null = null;
      try {
        if (map.model.kind === 'depletion' && row.polymerReservoir !== null && q !== null) y = attractionToMapY(map, { kind: 'depletion', q, polymerReservoir: row.polymerReservoir });
        else if (row.reducedB2 !== null) y = attractionToMapY(map, { kind: 'b2', value: row.reducedB2 });
      } catch {
        y = null;
      }
      const drawn = y === null || !Number.isFinite(y) ? null : drawnY(map, y);
      cache.set(cacheKey, drawn);
      return drawn;
    },
    filter,
  );
}
