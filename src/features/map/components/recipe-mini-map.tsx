import { useMemo } from 'react';
import type { StateMap as PhysicsMap } from '@shared/physics/map/types';
import type { ObservedState, PredictedState } from '@shared/states';
import type { RecipeDerived } from '@shared/views/recipe';
import { cachedStateMap } from '@shared/state-map-cache';
import { derivedDrawnY, drawingFromStateMap } from '../geometry/from-state-map';
import { axisTop } from '../hooks/use-map-drawing';
import { DEFAULT_LAYERS, type Layer } from '../geometry/map-view';
import type { MapPoint } from '../geometry/types';
import { LineSources } from './line-sources';
import { StaticStateMap } from './state-map';

const LAYERS = new Set<Layer>(DEFAULT_LAYERS.filter((l) => l !== 'labels'));

/**
 * A recipe's own small map: the map it is predicted on, the recipe as an outlined shape and,
 * optionally, its bench observations as filled ones at the same place.
 */
export function RecipeMiniMap({ map: predictionMap, derived, code, observations = [], height = 300 }: { map: PhysicsMap; derived: RecipeDerived; code: string; observations?: { id: number; state: ObservedState; ageDays: number; agrees: boolean | null }[]; height?: number }) {
  // The same model as the prediction, drawn tall enough to show the recipe itself.
  const map = useMemo(() => {
    const yMax = axisTop(predictionMap.model, { reducedB2: derived.reducedB2, polymerReservoir: derived.polymerReservoir });
    const strongest = predictionMap.y.strongest;
    const beyond = yMax !== undefined && (predictionMap.y.inverted ? yMax < strongest : yMax > strongest);
    if (!beyond) return predictionMap;
    return cachedStateMap(predictionMap.model, { parameters: predictionMap.parameters, polydispersity: predictionMap.polydispersity ?? undefined, yMax });
  }, [predictionMap, derived.reducedB2, derived.polymerReservoir]);
  const drawing = useMemo(() => drawingFromStateMap(map), [map]);
  const y = useMemo(() => derivedDrawnY(map, derived), [map, derived]);
  const points: MapPoint[] = useMemo(() => {
    if (y === null) return [];
    const predicted = derived.predictedState as PredictedState | null;
    const recipe: MapPoint = { key: 'recipe', kind: 'recipe', id: 0, x: derived.phi, y, state: predicted ?? 'unclear', predicted, agrees: null, code, name: null, ageDays: null, recipeId: null, margin: derived.margin };
    return [...observations.map((o): MapPoint => ({ key: `o${o.id}`, kind: 'observation', id: o.id, x: derived.phi, y, state: o.state, predicted, agrees: o.agrees, code, name: null, ageDays: o.ageDays, recipeId: null, margin: null })), recipe];
  }, [y, derived, observations, code]);
  const highest = drawing.yDomain[1];
  return (
    <div>
      <StaticStateMap
        drawing={drawing}
        points={points}
        layers={LAYERS}
        height={height}
        ariaLabel={`State map of recipe ${code}: ${drawing.modelLabel}; predicted ${derived.predictedState ?? 'unknown'}`}
      />
      {y !== null && y > highest && <p className="mt-1 text-xs text-ink-soft">The recipe's attraction is stronger than the top of this map; it is not drawn.</p>}
      <div className="mt-2">
        <LineSources notes={map.notes} title="Where this map's lines come from" />
      </div>
    </div>
  );
}
