import { contours } from 'd3-contour';
import { PREDICTED_STATES, type PredictedState } from '@shared/states';
import type { RegionGrid, RegionState, Viewport, XY } from './types';

export interface StateRegion {
  state: RegionState;
  /** Polygons (rings) in map coordinates, ready for a d3 line or an SVG path. */
  rings: XY[][];
  /** Where to put the region's name: the centre of its largest ring. */
  labelAt: XY | null;
}

/**
 * Shades the map by state: the classifier is sampled on a grid over the view, and for each
 * state d3-contour traces the outline of the cells in that state (threshold 0.5 of a 0/1 field).
 */
export function stateRegions(classify: (x: number, y: number) => PredictedState | null, view: Viewport, columns = 140, rows = 100): StateRegion[] {
  const states: (PredictedState | null)[] = new Array(columns * rows);
  const xAt = (i: number) => view.x[0] + ((i + 0.5) / columns) * (view.x[1] - view.x[0]);
  // Grid row 0 is the top of the picture, where y is largest.
  const yAt = (j: number) => view.y[1] - ((j + 0.5) / rows) * (view.y[1] - view.y[0]);
  for (let j = 0; j < rows; j++) for (let i = 0; i < columns; i++) states[j * columns + i] = classify(xAt(i), yAt(j));
  const generator = contours().size([columns, rows]).thresholds([0.5]).smooth(true);
  const toMap = ([gx, gy]: number[]): XY => [view.x[0] + (gx / columns) * (view.x[1] - view.x[0]), view.y[1] - (gy / rows) * (view.y[1] - view.y[0])];
  const regions: StateRegion[] = [];
  for (const state of PREDICTED_STATES) {
    const field = states.map((s) => (s === state ? 1 : 0));
    if (!field.some((v) => v === 1)) continue;
    const [shape] = generator(field);
    const rings = shape.coordinates.flatMap((polygon) => polygon.map((ring) => ring.map(toMap)));
    regions.push({ state, rings, labelAt: largestRingCentre(shape.coordinates.map((polygon) => polygon[0].map(toMap))) });
  }
  return regions;
}

function ringArea(ring: XY[]) {
  let area = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) area += (ring[j][0] - ring[i][0]) * (ring[j][1] + ring[i][1]);
  return Math.abs(area / 2);
}

function largestRingCentre(outers: XY[][]): XY | null {
  let best: XY[] | null = null;
  for (const ring of outers) if (!best || ringArea(ring) > ringArea(best)) best = ring;
  if (!best || best.length === 0) return null;
  const sum = best.reduce((acc, [x, y]) => [acc[0] + x, acc[1] + y] as XY, [0, 0] as XY);
  return [sum[0] / best.length, sum[1] / best.length];
}

/**
 * Shades the map from the physics map's own state grid: for each state present, d3-contour
 * traces the outline of its cells. Cell centres span the full domain uniformly; grid row 0 is
 * the bottom of the map (weakest attraction).
 */
export function gridRegions(grid: RegionGrid, full: Viewport): StateRegion[] {
  const { columns, rows } = grid;
  // d3-contour's row 0 is the top of its picture, so flip the grid's rows.
  const flipped = (code: number) => {
    const field = new Array<number>(columns * rows);
    for (let j = 0; j < rows; j++) for (let i = 0; i < columns; i++) field[(rows - 1 - j) * columns + i] = grid.cells[j * columns + i] === code ? 1 : 0;
    return field;
  };
  const generator = contours().size([columns, rows]).thresholds([0.5]).smooth(false);
  // Cell centres span the domain (centre i at i/(n−1) of it); contour cell i spans [i, i+1].
  const toMap = ([gx, gy]: number[]): XY => [full.x[0] + ((gx - 0.5) / (columns - 1)) * (full.x[1] - full.x[0]), full.y[1] - ((gy - 0.5) / (rows - 1)) * (full.y[1] - full.y[0])];
  const regions: StateRegion[] = [];
  grid.codes.forEach((state, code) => {
    if (!grid.cells.includes(code)) return;
    const [shape] = generator(flipped(code));
    const rings = shape.coordinates.flatMap((polygon) => polygon.map((ring) => ring.map(toMap)));
    regions.push({ state, rings, labelAt: largestRingCentre(shape.coordinates.map((polygon) => polygon[0].map(toMap))) });
  });
  return regions;
}
