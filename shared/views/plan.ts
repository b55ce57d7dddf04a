import type { ShelfLifeVerdict } from '../shelf-life/shelf-life-requirement';
import type { ClassifierParameters, MapModel } from '../physics';
import type { BoundaryUncertainty, CostPerLitre, FeasibleWindow, NearestEvidence, PlanAdvice } from '../planning/types';
import type { PlanRequest } from '../schemas/plans';
import type { GoalState, PredictedState } from '../states';
import type { PersonRef } from './person';
import type { RecipeDerived } from './recipe';

/** A recipe made from a plan: a chosen candidate or a proposed experiment. */
export interface PlanRecipeRef {
  recipeId: number;
  code: string;
  name: string;
  kind: 'candidate' | 'experiment';
  index: number;
}

/** A price the plan used, and where it came from. */
export interface PlanPrice {
  pricePerKg: number | null;
  source: 'library' | 'plan' | 'none';
}

export interface PlanCandidateView {
  index: number;
  phi: number;
  /** Polymer g per litre of solvent, or salt mM. */
  level: number;
  predictedState: PredictedState;
  margin: number;
  nearestBoundary: { id: string; label: string };
  mapY: number;
  costPerLitre: CostPerLitre;
  evidence: NearestEvidence | null;
  score: number;
  scores: { margin: number; cost: number; evidence: number };
  /** The exact derivation a recipe of this composition stores. */
  derived: RecipeDerived;
  recipe: { id: number; code: string } | null;
  /** The programme's shelf-life model on this composition (absent in plans made before it existed; null when the model was refused). */
  shelfLife?: ShelfLifeVerdict | null;
}

export interface PlanExperimentView {
  index: number;
  phi: number;
  level: number;
  predictedState: PredictedState;
  probability: number;
  boundaryOffset: number;
  nearestBoundary: { id: string; label: string };
  mapY: number;
  evidence: NearestEvidence | null;
  derived: RecipeDerived;
  recipe: { id: number; code: string } | null;
}

/** Everything a planner run stored: what was asked, with which model, and what came out. */
export interface PlanView {
  id: number;
  programmeId: number;
  title: string;
  targetState: GoalState;
  source: 'depletion' | 'salt';
  inputs: PlanRequest;
  materials: { particle: string; solvent: string; depletant: string | null; salt: string | null };
  prices: { particles: PlanPrice; solvent: PlanPrice; polymer: PlanPrice | null; salt: PlanPrice | null };
  levelUnit: 'g/L' | 'mM';
  modelVersion: string;
  calibration: { id: number; acceptedAt: string } | null;
  uncertainty: BoundaryUncertainty;
  /** The map the plan classified on, so a screen can draw the same one. */
  map: { model: MapModel; parameters: ClassifierParameters; polydispersity: number | null; yLabel: string };
  outcome: {
    feasible: boolean;
    candidates: PlanCandidateView[];
    counts: { sampled: number; placed: number; inTarget: number; feasible: number; verified: number; rejected: number };
    bestInRange: { phi: number; level: number; margin: number } | null;
    advice: PlanAdvice[];
    window: FeasibleWindow;
    experiments: { items: PlanExperimentView[]; summary: string[]; band: { low: number; high: number }; method: string };
    method: string;
    costFormula: string;
    notes: string[];
    /** The shelf-life column and request: the minimum asked (or null), whether the model was fitted, and its words. */
    shelfLife?: { minimumDays: number | null; status: 'fitted' | 'refused'; note: string; /** The longest the bench has watched a sample, in days. */ lastTimeDays: number };
    elapsedMs: number;
  };
  recipes: PlanRecipeRef[];
  createdBy: PersonRef | null;
  createdAt: string;
}

/** A plan in a list. */
export interface PlanSummaryView {
  id: number;
  programmeId: number;
  title: string;
  targetState: GoalState;
  source: 'depletion' | 'salt';
  feasible: boolean;
  candidateCount: number;
  recipeCount: number;
  calibrationId: number | null;
  createdBy: PersonRef | null;
  createdAt: string;
}
