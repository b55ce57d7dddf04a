import type { RecipeAttraction } from '../schemas/recipes';
import type { PredictedState } from '../states';
import type { PersonRef } from './person';

/** Everything the server derived from a recipe with shared/physics, stored with the model version. */
export interface RecipeDerived {
  modelVersion: string;
  phi: number;
  sizeRatio: number | null;
  polymerReservoir: number | null;
  polymerSystem: number | null;
  overlapConcentrationGL: number | null;
  contactEnergyKT: number | null;
  rangeSigma: number | null;
  reducedB2: number | null;
  stickiness: number | null;
  debyeLengthNm: number | null;
  closestApproachNm: number | null;
  predictedState: PredictedState | null;
  nearestBoundary: { id: string; label: string } | null;
  margin: number | null;
  marginDescription: string | null;
  reason: string | null;
  /** The map the prediction was made on (depletion at this size ratio, or generic short-range). */
  map: { kind: 'generic' | 'depletion'; q?: number; theory?: string };
  timescales: {
    diffusionM2s: number | null;
    brownianTimeS: number | null;
    gravitationalPeclet: number | null;
    settlingSpeedMs: number | null;
  };
  warnings: string[];
  calibration: { id: number; acceptedAt: string } | null;
}

/** What a recipe is made of, as the form names it: the part a recipe and its snapshots share. */
export interface RecipeComposition {
  name: string;
  particleId: number;
  solventId: number;
  fraction: { kind: 'mass' | 'volume'; value: number };
  temperatureC: number;
  attraction: RecipeAttraction;
}

export interface RecipeView extends RecipeComposition {
  id: number;
  code: string;
  programmeId: number;
  notes: string | null;
  archived: boolean;
  origin: string | null;
  derived: RecipeDerived;
  createdBy: PersonRef | null;
  createdAt: string;
  updatedAt: string;
  observationCount?: number;
}

/**
 * A recipe version as its shortlist was submitted: composition, derived parameters (prediction,
 * model version and calibration among them). The shortlist shows this, not later edits.
 */
export interface RecipeSnapshot extends RecipeComposition {
  version: number;
  code: string;
  derived: RecipeDerived;
  takenAt: string;
}

/** One field that differs between the submitted version of a recipe and its current one. */
export interface RecipeDifference {
  field: string;
  label: string;
  before: string | number | null;
  after: string | number | null;
}
