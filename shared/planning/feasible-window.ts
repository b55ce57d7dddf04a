import { contours } from 'd3-contour';
import { attractionToMapY, classifyPoint } from '../physics';
import type { GoalState } from '../states';
import type { CompositionSpace, FeasibleWindow, ValueRange } from './types';

/** Nodes of the window's grid along φ and along the dose. */
export const WINDOW_COLUMNS = 40;
export const WINDOW_ROWS = 30;
/** Points along each edge of the searched outline. */
const EDGE_POINTS = 16;

/**
 * The compositions of the searched ranges that meet a plan, as rings on the map: a regular grid
 * of WINDOW_COLUMNS × WINDOW_ROWS compositions (φ × dose) is classified, each node marked 1 when
 * it is in the target state with at least the margin asked, and the 0.5 level of that mask traced
 * by marching squares (d3-contour, with linear interpolation between nodes); each vertex is then
 * taken from (φ, dose) to the map's (φ, y). Also returns the outline of the searched ranges.
 * The rings follow the grid, so they are as fine as a fortieth of the φ range: a picture of the
 * window, not a test of any one composition (the candidates are classified one by one).
 */
export function feasibleWindow(space: CompositionSpace, phi: ValueRange, level: ValueRange, target: GoalState, minMargin: number): FeasibleWindow {
  const phiAt = (i: number) => phi.min + ((phi.max - phi.min) * i) / (WINDOW_COLUMNS - 1);
  const levelAt = (j: number) => level.min + ((level.max - level.min) * j) / (WINDOW_ROWS - 1);
  const mapY = (p: number, c: number): number | null => {
    const attraction = space.place(p, c);
    if (!attraction) return null;
    const y = attractionToMapY(space.map, attraction);
    return Number.isFinite(y) ? y : null;
  };
  const mask = new Array<number>(WINDOW_COLUMNS * WINDOW_ROWS).fill(0);
  for (let j = 0; j < WINDOW_ROWS; j++) {
    for (let i = 0; i < WINDOW_COLUMNS; i++) {
      const attraction = space.place(phiAt(i), levelAt(j));
      if (!attraction) continue;
      const c = classifyPoint(space.map, { phi: phiAt(i), attraction });
      if (c.state === target && c.margin >= minMargin) mask[j * WINDOW_COLUMNS + i] = 1;
    }
  }
  // d3-contour puts node (i, j) at (i + 0.5, j + 0.5) and clips the rings to [0, n] × [0, m].
  const toNode = (g: number, n: number) => Math.min(n - 1, Math.max(0, g - 0.5));
  const feasible: [number, number][][] = [];
  for (const polygon of contours().size([WINDOW_COLUMNS, WINDOW_ROWS]).thresholds([0.5])(mask)[0].coordinates) {
    for (const ring of polygon) {
      const drawn: [number, number][] = [];
      for (const [gx, gy] of ring) {
        const p = phiAt(toNode(gx, WINDOW_COLUMNS));
        const y = mapY(p, levelAt(toNode(gy, WINDOW_ROWS)));
        if (y !== null) drawn.push([p, y]);
      }
      if (drawn.length >= 3) feasible.push(drawn);
    }
  }
  const searched: [number, number][] = [];
  const edge = (from: [number, number], to: [number, number]) => {
    for (let k = 0; k < EDGE_POINTS; k++) {
      const t = k / EDGE_POINTS;
      const p = from[0] + (to[0] - from[0]) * t;
      const y = mapY(p, from[1] + (to[1] - from[1]) * t);
      if (y !== null) searched.push([p, y]);
    }
  };
  edge([phi.min, level.min], [phi.max, level.min]);
  edge([phi.max, level.min], [phi.max, level.max]);
  edge([phi.max, level.max], [phi.min, level.max]);
  edge([phi.min, level.max], [phi.min, level.min]);
  return { searched, feasible, columns: WINDOW_COLUMNS, rows: WINDOW_ROWS };
}
