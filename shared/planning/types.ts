import type { AttractionInput, BoundaryId, PredictedState, StateMap } from '../physics';
import type { GoalState, ObservedState } from '../states';

/** A closed interval [min, max]. */
export interface ValueRange {
  min: number;
  max: number;
}

/**
 * The two composition axes a plan searches: the particle volume fraction φ and the dose of the
 * attraction (polymer in g per litre of solvent, or salt in mM), with how each point sits on
 * the state map.
 */
export interface CompositionSpace {
  kind: 'depletion' | 'salt';
  /** The map candidates are classified on: the programme's map (see screeningMap). */
  map: StateMap;
  /** The map's attraction of the composition, or null when the planner cannot place it. */
  place(phi: number, level: number): AttractionInput | null;
  level: {
    /** 'polymer' or 'salt', for sentences. */
    name: string;
    unit: 'g/L' | 'mM';
    /** Smallest and largest dose a recipe accepts (shared/schemas/recipes). */
    floor: number;
    limit: number;
  };
  /** Assumptions worth showing beside the result (e.g. how far the map was extended). */
  notes: string[];
}

/** Material cost of one litre of sample; see materialCostPerLitre. */
export interface CostPerLitre {
  total: number;
  parts: { particles: number; solvent: number; polymer: number; salt: number };
  /** Materials without a price (counted as 0 in the total). */
  unpriced: string[];
}

/** A bench observation offered as evidence, placed by its attraction. */
export interface EvidenceInput {
  id: number;
  /** The recipe code, or a short description for an ad-hoc composition. */
  label: string;
  phi: number;
  attraction: AttractionInput;
  observedState: ObservedState;
  ageDays: number;
}

/** The bench observation nearest a composition, in normalised map units (those of the margin). */
export interface NearestEvidence {
  id: number;
  label: string;
  observedState: ObservedState;
  ageDays: number;
  distance: number;
  /** The observation showed the plan's target state. */
  agrees: boolean;
}

/**
 * How uncertain the attraction scale of the model is: B2*_effective = B2* − shift with the shift
 * taken as normal around `shift` with standard deviation `standardError` (B2* units).
 * `sharpness` is the calibration's logistic slope per unit B2* (null without a calibration).
 */
export interface BoundaryUncertainty {
  shift: number;
  standardError: number;
  sharpness: number | null;
  source: 'calibration' | 'default';
}

export interface RankingWeights {
  margin: number;
  cost: number;
  evidence: number;
}

/** What an exact re-derivation says of a composition (the server: the stored recipe derivation). */
export interface Verified<V> {
  state: PredictedState | null;
  margin: number | null;
  detail: V;
}

export interface PlannedCandidate<V = unknown> {
  phi: number;
  level: number;
  state: PredictedState;
  margin: number;
  nearestBoundary: { id: BoundaryId; label: string };
  /** The composition's y on the map, in the axis's own unit. */
  mapY: number;
  cost: CostPerLitre;
  evidence: NearestEvidence | null;
  /** Weighted score in [0, 1] and its three parts (see rankCandidates). */
  score: number;
  scores: { margin: number; cost: number; evidence: number };
  verified: V | null;
}

export type AdviceConstraint = 'minMargin' | 'phi.min' | 'phi.max' | 'level.min' | 'level.max' | 'materials';

/** One way to make an infeasible request feasible. */
export interface PlanAdvice {
  constraint: AdviceConstraint;
  /** The limit as asked, and the limit that reaches the target (null for 'materials'). */
  from: number | null;
  to: number | null;
  /** The best margin in the target state once relaxed, and where. */
  bestMargin: number | null;
  at: { phi: number; level: number } | null;
  /** A second limit that must move with the first, when neither alone is enough. */
  also?: { constraint: AdviceConstraint; from: number; to: number };
  message: string;
}

export interface ProposedExperiment<V = unknown> {
  phi: number;
  level: number;
  /** State predicted at the fitted shift. */
  state: PredictedState;
  /** Chance of the target state under the model's uncertainty (targetProbability). */
  probability: number;
  /** Signed distance in B2* from the point to where the target state begins or ends (> 0 inside). */
  boundaryOffset: number;
  nearestBoundary: { id: BoundaryId; label: string };
  mapY: number;
  evidence: NearestEvidence | null;
  verified: V | null;
}

/** The searched ranges and the compositions that meet the request, drawn on the map. */
export interface FeasibleWindow {
  /** Outline of the searched ranges, as [φ, map y] points. */
  searched: [number, number][];
  /** Rings (closed, [φ, map y]) around the compositions in the target state with the margin asked. */
  feasible: [number, number][][];
  columns: number;
  rows: number;
}

export interface PlanOutcome<V = unknown> {
  candidates: PlannedCandidate<V>[];
  counts: { sampled: number; placed: number; inTarget: number; feasible: number; verified: number; rejected: number };
  /** The target-state sample with the largest margin inside the ranges (whether or not it meets it). */
  bestInRange: { phi: number; level: number; margin: number } | null;
  advice: PlanAdvice[];
  window: FeasibleWindow;
  experiments: {
    items: ProposedExperiment<V>[];
    summary: string[];
    /** The shift values bounding the 95 % band of the boundary's position. */
    band: { low: number; high: number };
  };
  notes: string[];
}

export interface PlanProblem<V = unknown> {
  /** The composition space over a dose range (called again with a wider range for advice). */
  space: (levels: ValueRange) => CompositionSpace;
  phi: ValueRange;
  level: ValueRange;
  target: GoalState;
  minMargin: number;
  count: number;
  experimentCount: number;
  /** Halton points sampled in the ranges. */
  samples: number;
  weights: RankingWeights;
  cost: (phi: number, level: number) => CostPerLitre;
  evidence: EvidenceInput[];
  uncertainty: BoundaryUncertainty;
  /** Exact re-derivation of a chosen composition; candidates it rejects are dropped. */
  verify?: (phi: number, level: number) => Verified<V> | null;
}
