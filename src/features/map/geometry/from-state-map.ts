import { mapYOf } from '@shared/map-placement';
import type { MapBoundary, StateMap } from '@shared/physics/map/types';
import type { RecipeDerived } from '@shared/views/recipe';
import type { MapDrawing, MapLine, XY } from './types';

const TONE_OF: Record<MapBoundary['id'], MapLine['tone']> = {
  binodal: 'coexistence',
  spinodal: 'spinodal',
  freezing: 'crystal',
  melting: 'crystal',
  percolation: 'percolation',
  'repulsive-glass': 'glass',
  'attractive-glass': 'glass',
  gel: 'gel',
};

/**
 * Turns a physics state map into what the figure draws. Axes on which larger values are drawn
 * lower (B2*) are flipped (ŷ = −y) so that every drawing has attraction growing upward on an
 * ascending axis; `displayY` turns ŷ back into the value people read.
 */
export function drawingFromStateMap(map: StateMap): MapDrawing {
  const sign = map.y.inverted ? -1 : 1;
  const flip = ([x, y]: XY): XY => [x, sign * y];
  const yDomain: XY = [Math.min(sign * map.y.weakest, sign * map.y.strongest), Math.max(sign * map.y.weakest, sign * map.y.strongest)];
  const unit = map.y.unit ? ` (${map.y.unit})` : '';
  return {
    xDomain: [map.x.domain[0], map.x.domain[1]],
    yDomain,
    xLabel: `Volume fraction ${map.x.label}`,
    // The symbol and a short name; the long description stays in the notes under the map.
    yLabel: `${map.y.label}${unit} — ${map.y.quantity.split(' (')[0]}${map.y.inverted ? ' (stickier upward)' : ''}`,
    modelLabel: map.modelName,
    lines: map.boundaries.map((b, index) => ({
      id: `${b.id}-${index}`,
      label: b.label,
      points: b.points.map(flip),
      dashed: b.metastable,
      approximate: b.approximate,
      tone: TONE_OF[b.id],
    })),
    markers: map.markers.map((m) => ({ id: m.id, label: m.label, x: m.x, y: sign * m.y, reference: m.id === 'simulation-critical-point' })),
    notes: map.notes,
    regionGrid: map.regions,
    displayY: (y) => sign * y,
  };
}

/** The drawn ŷ of a value on the map's own y axis (B2* is flipped). */
export function drawnY(map: StateMap, y: number) {
  return map.y.inverted ? -y : y;
}

/**
 * The drawn ŷ of a derived recipe on a map: by its polymer fraction on a depletion map (at its
 * own q, placed through B2* when q differs), else by its B2*; null when it has no place there.
 */
export function derivedDrawnY(map: StateMap, derived: Pick<RecipeDerived, 'polymerReservoir' | 'sizeRatio' | 'reducedB2'>): number | null {
  try {
    const y = mapYOf(map, derived);
    return y === null ? null : drawnY(map, y);
  } catch {
    return null;
  }
}
