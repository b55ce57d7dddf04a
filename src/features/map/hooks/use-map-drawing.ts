import { useMemo } from 'react';
import { buildStateMap } from '@shared/physics/map/build-state-map';
import { mapYOf } from '@shared/map-placement';
import { inverseStickinessFromReducedB2 } from '@shared/physics/attraction/inverse-stickiness-from-reduced-b2';
import { squareWellDepthFromReducedB2 } from '@shared/physics/attraction/square-well-depth-from-reduced-b2';
import type { ClassifierParameters, MapModel, StateMap } from '@shared/physics/map/types';
import { DEFAULT_SQUARE_WELL_RANGE } from '@shared/physics/map/resolve-map-model';
import { drawingFromStateMap, drawnY } from '../geometry/from-state-map';
import type { MapView } from '../geometry/map-view';
import { projectPoints } from '../geometry/project-points';
import type { MapDrawing, MapPoint } from '../geometry/types';
import type { MapOverlay } from '../api/get-map-points';

export interface MapRequest {
  view: MapView;
  /** Size ratio of the programme's polymer and particles (depletion programmes), or null. */
  sizeRatio: number | null;
  /** The strongest attraction among the programme's points, so the map reaches up to them. */
  strongest?: { reducedB2: number | null; polymerReservoir: number | null };
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
  const yMax = axisTop(model, request.strongest);
  const glassLine = request.view.glassLine;
  const key = JSON.stringify([model, request.parameters ?? null, request.polydispersity ?? null, yMax ?? null, glassLine]);
  return useMemo(() => {
    try {
      const map = buildStateMap(model, { parameters: request.parameters, polydispersity: request.polydispersity, yMax, glassLine });
      return { map, drawing: drawingFromStateMap(map), error: null };
    } catch (error) {
      return { map: null, drawing: null, error: error as Error };
    }
  }, [key]);
}

/** B2* the maps reach by default, and the strongest they may reach (shared/physics build-axis). */
const DEFAULT_TOP_B2 = -10;
const STRONGEST_TOP_B2 = -20;

/**
 * The top of the y axis in its own unit when the programme's points go past the default top
 * (B2* = −10), with 10 % headroom; undefined keeps the default.
 */
export function axisTop(model: MapModel, strongest: MapRequest['strongest']): number | undefined {
  if (!strongest) return undefined;
  if (model.kind === 'depletion') {
    const top = strongest.polymerReservoir;
    return top !== null && top > 0 ? Math.min(20, Number((top * 1.1).toPrecision(3))) : undefined;
  }
  const b2 = strongest.reducedB2;
  if (b2 === null || b2 >= DEFAULT_TOP_B2) return undefined;
  const target = Math.max(STRONGEST_TOP_B2, b2 * 1.1);
  if (model.axis === 'b2') return target;
  if (model.axis === 'inverseTau') return inverseStickinessFromReducedB2(target);
  return squareWellDepthFromReducedB2(target, model.lambda ?? DEFAULT_SQUARE_WELL_RANGE);
}

/**
 * Places the programme's recipes and observations on a map: a point at the map's own size
 * ratio by its polymer fraction, every other one through its B2* (extended corresponding states).
 */
export function placePoints(map: StateMap, overlay: MapOverlay, filter: { minAge: number | null; maxAge: number | null }): { points: MapPoint[]; skipped: number } {
  const ratioOfRecipe = new Map<number, number | null>();
  for (const r of overlay.recipes) ratioOfRecipe.set(r.id, r.sizeRatio);
  const cache = new Map<string, number | null>();
  return projectPoints(
    overlay,
    (row, recipeId) => {
      const q = recipeId !== null ? ratioOfRecipe.get(recipeId) ?? null : null;
      const cacheKey = `${row.polymerReservoir}|${q}|${row.reducedB2}`;
      if (cache.has(cacheKey)) return cache.get(cacheKey)!;
      let y: number | null = null;
      try {
        y = mapYOf(map, { polymerReservoir: row.polymerReservoir, sizeRatio: q, reducedB2: row.reducedB2 });
      } catch {
        y = null;
      }
      const drawn = y === null ? null : drawnY(map, y);
      cache.set(cacheKey, drawn);
      return drawn;
    },
    filter,
  );
}
