import type { PredictedState } from '../../states';

/** The predicted states of a recipe on the map (physics.md §5): the one list in shared/states.ts. */
export type { PredictedState };

/**
 * Which map to draw.
 * - generic: any short-range attraction, placed through its B2* (extended law of corresponding
 *   states). `theory` picks the fluid–fluid theory (mean-field CS + B2*, or Baxter/Percus–Yevick
 *   adhesive spheres); `axis` the y axis: B2*, 1/τ, or the depth U/kT of a square well of range
 *   `lambda` (default 1.5).
 * - depletion: colloid + ideal polymer in free-volume theory at size ratio q; y is the reservoir
 *   polymer fraction φ_p^R.
 */
export type MapModel =
  | { kind: 'generic'; theory: 'meanField' | 'baxterPY'; axis: 'b2' | 'inverseTau' | 'squareWellDepth'; lambda?: number }
  | { kind: 'depletion'; q: number };

/** Any of the supported descriptions of the attraction of a recipe or observation. */
export type AttractionInput =
  | { kind: 'b2'; value: number }
  | { kind: 'tau'; value: number }
  | { kind: 'squareWell'; depth: number; lambda: number }
  | { kind: 'depletion'; q: number; polymerReservoir: number };

/** Thresholds of the classification rule; see DEFAULT_CLASSIFIER_PARAMETERS for each meaning. */
export interface ClassifierParameters {
  /** Shift of the attraction scale in B2* units: B2*_effective = B2*_computed − attractionShift. */
  attractionShift: number;
  /** Inside the binodal (outside the spinodal) a point with B2*_effective ≤ this is a gel. */
  gelB2Threshold: number;
  /** Observed hard-sphere glass transition: the computed (MCT) glass line is rescaled onto it. */
  glassPhi: number;
  /** Size polydispersity (%) above which crystallisation is taken as suppressed. */
  polydispersityCrystalThreshold: number;
}

/**
 * How the mode-coupling glass line is placed in φ: 'rescaled' (default) multiplies every φ of the
 * computed line by glassPhi/φ_c(hard spheres), so hard spheres sit at the observed 0.58;
 * 'computed' draws MCT's own numbers (hard spheres at 0.5159).
 */
export type GlassLineMapping = 'rescaled' | 'computed';

/** Where a map's glass line came from, for notes and legends. */
export interface GlassLineSource {
  mapping: GlassLineMapping;
  /** 'mct': the adhesive-sphere MCT line through B2*; 'hardSphere': attraction too long-ranged for it. */
  kind: 'mct' | 'hardSphere';
  /** MCT's hard-sphere φ_c on the grid, and the factor applied to every φ of the line. */
  computedHardSpherePhi: number;
  scale: number;
  points: number;
  cutoff: number;
  /** Range of the attraction in σ that decided `kind` (null when unknown: placed by B2*). */
  range: number | null;
}

/** Boundary identifiers; one id may be drawn as several pieces (e.g. stable and metastable). */
export type BoundaryId =
  | 'binodal'
  | 'spinodal'
  | 'freezing'
  | 'melting'
  | 'percolation'
  | 'repulsive-glass'
  | 'attractive-glass'
  | 'gel';

/** A point in map coordinates: [φ, y in the y axis's own unit]. */
export type MapVertex = [number, number];

export interface MapBoundary {
  id: BoundaryId;
  label: string;
  points: MapVertex[];
  /** Drawn dashed: the branch lies where another phase is more stable (or, for percolation, inside a two-phase region). */
  metastable: boolean;
  /** Drawn as approximate (no reliable published numbers, e.g. the attractive glass). */
  approximate: boolean;
}

export interface MapMarker {
  id: 'critical-point' | 'simulation-critical-point' | 'triple-point';
  label: string;
  x: number;
  y: number;
}

export interface MapAxis {
  /** Short symbol for the axis title, e.g. 'B2*'. */
  label: string;
  /** Long name, e.g. 'reduced second virial coefficient'. */
  quantity: string;
  /** Unit ('' when dimensionless). */
  unit: string;
  /** [min, max], ascending. */
  domain: [number, number];
  /** True when larger values are drawn lower (B2*: more negative is more attractive, drawn up). */
  inverted: boolean;
  /** y value at the bottom of the map (weakest attraction) and at the top (strongest). */
  weakest: number;
  strongest: number;
}

/** Region shading: a coarse grid of state codes over the map (row 0 = weakest attraction). */
export interface StateRegions {
  /** Code → name; 'crystal-suppressed' marks the greyed crystal region (classified as fluid). */
  codes: Array<PredictedState | 'crystal-suppressed'>;
  labels: Record<PredictedState | 'crystal-suppressed', string>;
  columns: number;
  rows: number;
  /** Cell centres span x: [0, φ_cp] and y: weakest → strongest, uniformly. */
  cells: number[];
}

/** A curve of the theory, in normalised coordinates (see buildStateMap docs), for lookups. */
export interface LevelCurve {
  /** Normalised attraction u (0 = weakest, 1 = strongest), ascending. */
  u: number[];
  phi: number[];
}

/** A closed-top region (binodal or spinodal): left and right branches from the bottom up. */
export interface DomeCurve {
  bottom: number;
  left: LevelCurve;
  right: LevelCurve;
}

/** Everything the fast classifier needs; plain numbers so the map stays JSON-serialisable. */
export interface ClassifierTables {
  /** Theory frame (no attraction shift): dome and coexistence curves against u₀. */
  binodal: DomeCurve | null;
  spinodal: DomeCurve | null;
  freezing: LevelCurve;
  melting: LevelCurve;
  /** Depletion maps only: B2* at each level (u₀ ascending), for y ↔ B2* conversions. */
  reducedB2?: { u: number[]; b2: number[] };
  /** φ of the glass line against u₀ (theory frame, mapping applied). */
  glass: LevelCurve;
  /** u₀ of the glass line's nose: at stronger attraction the glass is attractive (null: never). */
  attractiveGlassFrom: number | null;
  /** Drawn curves (with the map's shift), in map units, per boundary id, for distances and signs. */
  curves: Array<{ id: BoundaryId; label: string; shape: 'dome' | 'phiOfY' | 'yOfPhi'; points: MapVertex[] }>;
  /** For each drawn curve, a 0/1 flag per segment: 1 where the predicted state changes across it. */
  active: number[][];
}

export interface StateMap {
  modelVersion: string;
  model: MapModel;
  modelName: string;
  parameters: ClassifierParameters;
  glassLine: GlassLineSource;
  /** Size polydispersity (%) the map was built for, or null. */
  polydispersity: number | null;
  crystalSuppressed: boolean;
  levels: number;
  x: MapAxis;
  y: MapAxis;
  boundaries: MapBoundary[];
  markers: MapMarker[];
  regions: StateRegions;
  notes: string[];
  tables: ClassifierTables;
}

export interface StateMapOptions {
  /** Attraction levels computed from bottom to top (default 200, 20–2000). */
  levels?: number;
  /** Classifier parameters (any subset; the rest from DEFAULT_CLASSIFIER_PARAMETERS). */
  parameters?: Partial<ClassifierParameters>;
  /** Size polydispersity in %; above the threshold the crystal region is greyed. */
  polydispersity?: number;
  /** Top of the y axis in its own unit (strongest attraction); default from B2* = −10. */
  yMax?: number;
  /** Placement of the mode-coupling glass line (default 'rescaled'). */
  glassLine?: GlassLineMapping;
  /** Region grid (default 128 columns × 96 rows). */
  gridColumns?: number;
  gridRows?: number;
}

export interface ClassifiedPoint {
  readonly state: PredictedState;
  readonly nearestBoundary: { readonly id: BoundaryId; readonly label: string };
  /** Distance to the nearest state-changing boundary, in normalised map units (see classifyPoint). */
  readonly margin: number;
  readonly marginDescription: string;
  readonly reason: string;
}
