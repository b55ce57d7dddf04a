import type { AttractionSource, GoalState, ObservationMethod, ObservedState, PredictedState, ShortlistStatus, Stabilisation } from '../states';
import type { RecipeAttraction } from '../schemas/recipes';

export interface PersonRef {
  id: number;
  name: string;
}

export interface ProgrammeView {
  id: number;
  name: string;
  goalState: GoalState;
  attractionSource: AttractionSource;
  codePrefix: string;
  notes: string | null;
  archived: boolean;
  recipeCount: number;
  observationCount: number;
  createdAt: string;
  updatedAt: string;
}

interface MaterialBase {
  id: number;
  name: string;
  pricePerKg: number | null;
  notes: string | null;
  archived: boolean;
  updatedAt: string;
}
export interface ParticleView extends MaterialBase {
  coreMaterial: string;
  radiusNm: number;
  polydispersityPct: number;
  densityGcm3: number;
  stabilisation: Stabilisation;
  surfacePotentialMv: number | null;
  hamakerZj: number | null;
}
export interface DepletantView extends MaterialBase {
  molarMassKgMol: number;
  rgNm: number | null;
  rgPrefactorNm: number | null;
  rgExponent: number | null;
}
export interface SolventView extends MaterialBase {
  viscosityMPas: number;
  densityGcm3: number;
  temperatureC: number;
  relativePermittivity: number | null;
}
export interface SaltView extends MaterialBase {
  valence: number;
  molarMassGMol: number | null;
}
export interface MaterialViews {
  particles: ParticleView;
  depletants: DepletantView;
  solvents: SolventView;
  salts: SaltView;
}

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

export interface RecipeView {
  id: number;
  code: string;
  programmeId: number;
  name: string;
  particleId: number;
  solventId: number;
  fraction: { kind: 'mass' | 'volume'; value: number };
  temperatureC: number;
  attraction: RecipeAttraction;
  notes: string | null;
  archived: boolean;
  origin: string | null;
  derived: RecipeDerived;
  createdBy: PersonRef | null;
  createdAt: string;
  updatedAt: string;
  observationCount?: number;
}

export interface AttachmentView {
  id: number;
  observationId: number;
  originalName: string;
  mimeType: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: PersonRef | null;
  createdAt: string;
  isImage: boolean;
}

export interface ObservationView {
  id: number;
  programmeId: number;
  recipeId: number | null;
  recipeCode: string | null;
  adhoc: { phi: number; reducedB2: number; description: string | null } | null;
  mixedAt: string;
  ageDays: number;
  observedState: ObservedState;
  method: ObservationMethod;
  storageModulusPa: number | null;
  yieldStressPa: number | null;
  settledHeightPct: number | null;
  notes: string | null;
  predictedState: PredictedState | null;
  agrees: boolean | null;
  archived: boolean;
  observer: PersonRef | null;
  attachments: AttachmentView[];
  createdAt: string;
}

export interface ImportRowProblem {
  row: number;
  column: string;
  message: string;
}
export interface ImportReport {
  ok: boolean;
  rows: number;
  imported: number;
  problems: ImportRowProblem[];
  /** Set when an Idempotency-Key was seen before and the earlier result is returned. */
  replayed?: boolean;
  batchId?: string;
}

/**
 * A recipe version as its shortlist was submitted: composition, derived parameters (prediction,
 * model version and calibration among them). The shortlist shows this, not later edits.
 */
export interface RecipeSnapshot {
  version: number;
  code: string;
  name: string;
  particleId: number;
  solventId: number;
  fraction: { kind: 'mass' | 'volume'; value: number };
  temperatureC: number;
  attraction: RecipeAttraction;
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

export interface ShortlistItemView {
  recipeId: number;
  position: number;
  reason: string;
  /** The version on the shortlist: the submitted one once submitted, the live recipe in a draft. */
  recipe: Pick<RecipeView, 'id' | 'code' | 'name' | 'derived' | 'archived'> & { version: number };
  /** True once the shortlist was submitted: `recipe` is then the version sent for review. */
  frozen: boolean;
  /** Set when the recipe was edited after submission: its current version and what differs. */
  changed: { currentVersion: number; differences: RecipeDifference[] } | null;
}
export interface ShortlistEventView {
  from: ShortlistStatus | null;
  to: ShortlistStatus;
  actor: PersonRef | null;
  comment: string | null;
  at: string;
}
export interface ShortlistView {
  id: number;
  programmeId: number;
  title: string;
  purpose: string | null;
  targetState: GoalState;
  status: ShortlistStatus;
  archived: boolean;
  author: PersonRef | null;
  reviewer: PersonRef | null;
  decisionComment: string | null;
  submittedAt: string | null;
  decidedAt: string | null;
  items: ShortlistItemView[];
  history: ShortlistEventView[];
  createdAt: string;
  updatedAt: string;
}

/**
 * Map overlay for a programme, columnar so 10,000 points stay small. Recipes carry their
 * coordinates in every attraction description the map can show (null where not defined).
 * An observation of a recipe is sent as its first four columns only (id, recipe, observed state,
 * age): it sits where its recipe sits and shares its prediction and code. Only an ad-hoc
 * observation (recipeId null) carries every column. `decodeMapObservations` rebuilds the full
 * records.
 */
export interface MapPoints {
  programmeId: number;
  recipes: {
    columns: readonly ['id', 'code', 'name', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'sizeRatio', 'predictedState', 'margin'];
    rows: (string | number | null)[][];
  };
  observations: {
    columns: readonly ['id', 'recipeId', 'observedState', 'ageDays', 'phi', 'reducedB2', 'inverseTau', 'contactEnergyKT', 'polymerReservoir', 'predictedState'];
    rows: (string | number | null)[][];
  };
}
