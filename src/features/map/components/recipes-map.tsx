import { useMemo } from 'react';
import type { MapModel } from '@shared/physics/map/types';
import { cachedStateMap } from '@shared/state-map-cache';
import type { RecipeDerived } from '@shared/views/recipe';
import { derivedDrawnY, drawingFromStateMap } from '../geometry/from-state-map';
import { DEFAULT_LAYERS, type Layer } from '../geometry/map-view';
import type { MapPoint } from '../geometry/types';
import { axisTop } from '../hooks/use-map-drawing';
import { StaticStateMap } from './state-map';
import { middleSizeRatio } from '../geometry/middle-size-ratio';

const LAYERS = new Set<Layer>(DEFAULT_LAYERS);

/** The map a group of recipes shares: the free-volume map at their median q, else the generic B2* map. */
function sharedModel(recipes: { derived: RecipeDerived }[]): MapModel {
  const ratios = recipes.map((r) => r.derived.sizeRatio).filter((q): q is number => q !== null && q > 0);
  const q = ratios.length === recipes.length ? middleSizeRatio(ratios) : null;
  if (q !== null) return { kind: 'depletion', q: Number(q.toPrecision(3)) };
  return { kind: 'generic', theory: 'meanField', axis: 'b2' };
}

/**
 * Several recipes (a shortlist) on one state map, each labelled by its code in the hover card.
 * The map reaches up to the strongest of them.
 */
export function RecipesMap({ recipes, height = 420, title }: { recipes: { code: string; name: string; derived: RecipeDerived }[]; height?: number; title: string }) {
  const built = useMemo(() => {
    if (recipes.length === 0) return null;
    const model = sharedModel(recipes);
    const b2s = recipes.map((r) => r.derived.reducedB2).filter((v): v is number => v !== null);
    const polymers = recipes.map((r) => r.derived.polymerReservoir).filter((v): v is number => v !== null);
    const yMax = axisTop(model, { reducedB2: b2s.length ? Math.min(...b2s) : null, polymerReservoir: polymers.length ? Math.max(...polymers) : null });
    const map = cachedStateMap(model, { yMax });
    const points: MapPoint[] = [];
    for (const [index, r] of recipes.entries()) {
      const d = r.derived;
      const y = derivedDrawnY(map, d);
      // A recipe without a place on this map is listed, not drawn.
      if (y === null) continue;
      points.push({ key: r.code, kind: 'recipe', id: index, x: d.phi, y, state: d.predictedState ?? 'unclear', predicted: d.predictedState, agrees: null, code: r.code, name: r.name, ageDays: null, recipeId: null, margin: d.margin });
    }
    return { drawing: drawingFromStateMap(map), points };
  }, [recipes]);
  if (!built) return null;
  return (
    <StaticStateMap
      drawing={built.drawing}
      points={built.points}
      layers={LAYERS}
      height={height}
      ariaLabel={`State map of ${title}: ${built.drawing.modelLabel}; ${built.points.length} recipes`}
    />
  );
}
