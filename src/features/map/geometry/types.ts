import type { ObservedState, PredictedState } from '@shared/states';

export type XY = [number, number];

/** One drawn boundary, in map coordinates (x = φ, y = the chosen attraction axis). */
export interface MapLine {
  id: string;
  label: string;
  points: XY[];
  /** Metastable or approximate branches are drawn dashed. */
  dashed: boolean;
  approximate: boolean;
  tone: 'coexistence' | 'spinodal' | 'percolation' | 'glass' | 'crystal' | 'gel' | 'calibrated';
}

export interface MapMarker {
  id: string;
  label: string;
  x: number;
  y: number;
  /** A published simulation value shown for reference, not a prediction. */
  reference: boolean;
}

/** Everything the figure draws apart from the team's points; made by the map builder adapter. */
export interface MapDrawing {
  xDomain: XY;
  yDomain: XY;
  xLabel: string;
  yLabel: string;
  modelLabel: string;
  lines: MapLine[];
  markers: MapMarker[];
  notes: string[];
  /** The shading grid: a state code per cell, row 0 at the bottom (weakest attraction). */
  regionGrid: RegionGrid;
  /** The value shown for a drawn y (the drawing flips axes where larger values are drawn lower). */
  displayY: (y: number) => number;
}

export type RegionState = PredictedState | 'crystal-suppressed';

export interface RegionGrid {
  columns: number;
  rows: number;
  codes: RegionState[];
  cells: number[];
}

/** A recipe or an observation placed on the map. */
export interface MapPoint {
  key: string;
  kind: 'recipe' | 'observation';
  id: number;
  x: number;
  y: number;
  /** Observed state for observations, predicted state for recipes. */
  state: ObservedState;
  predicted: PredictedState | null;
  agrees: boolean | null;
  code: string | null;
  name: string | null;
  ageDays: number | null;
  recipeId: number | null;
  margin: number | null;
}

export interface Viewport {
  x: XY;
  y: XY;
}
