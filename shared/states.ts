/** States the classifier predicts (physics.md §5). */
export const PREDICTED_STATES = ['fluid', 'gel', 'glass', 'crystal', 'separated'] as const;
export type PredictedState = (typeof PREDICTED_STATES)[number];

/** States a bench scientist may record: the predicted ones plus what only the bench sees. */
export const OBSERVED_STATES = ['fluid', 'gel', 'glass', 'crystal', 'separated', 'collapsed', 'unclear'] as const;
export type ObservedState = (typeof OBSERVED_STATES)[number];

/** A programme aims for one of the states a recipe can be designed into. */
export const GOAL_STATES = ['fluid', 'gel', 'glass', 'crystal'] as const;
export type GoalState = (typeof GOAL_STATES)[number];

export const STATE_LABELS: Record<ObservedState, string> = {
  fluid: 'Fluid',
  gel: 'Gel',
  glass: 'Glass',
  crystal: 'Crystal',
  separated: 'Phase-separated',
  collapsed: 'Collapsed gel',
  unclear: 'Unclear',
};

export const STATE_DESCRIPTIONS: Record<ObservedState, string> = {
  fluid: 'Particles move freely; the sample pours and does not hold a shape.',
  gel: 'A space-spanning network of stuck particles; holds its weight, yields under stress.',
  glass: 'Too crowded to rearrange; arrested without a network, solid-like.',
  crystal: 'Particles order into a lattice (iridescence in monodisperse samples).',
  separated: 'Splits into a dilute and a dense phase that do not arrest.',
  collapsed: 'A gel that compacted under gravity, leaving clear liquid on top.',
  unclear: 'The observation could not tell.',
};

/**
 * Gelwright's one choice for a collapsed sample: it agrees with a prediction of gel. The sample
 * did form a gel — the state map's call was right — and then compacted under its own weight,
 * which is a question of shelf life (judged from the ageing records), not of the state map. The
 * calibration counts collapsed samples on the gel side for the same reason.
 */
export const COLLAPSED_AGREES_WITH_GEL = true;

/** Observed states that agree with a prediction of another name: [observed, predicted]. */
export const AGREEING_OTHER_STATES: ReadonlyArray<readonly [ObservedState, PredictedState]> = COLLAPSED_AGREES_WITH_GEL ? [['collapsed', 'gel']] : [];

/**
 * Whether an observed state agrees with a prediction — the one definition every screen, export,
 * filter and fit uses: the same state agrees, and so does each pair of AGREEING_OTHER_STATES
 * (a collapsed sample of a predicted gel); anything else disagrees; "unclear" or no prediction
 * says nothing (null). The bench log's SQL filter is built from the same list.
 * @example observationAgrees('collapsed', 'gel') // true
 * @example observationAgrees('collapsed', 'fluid') // false
 */
export function observationAgrees(observed: ObservedState, predicted: PredictedState | null): boolean | null {
  if (observed === 'unclear' || predicted === null) return null;
  return observed === predicted || AGREEING_OTHER_STATES.some(([o, p]) => o === observed && p === predicted);
}

export const OBSERVATION_METHODS = ['visual', 'rheology', 'microscopy', 'scattering'] as const;
export type ObservationMethod = (typeof OBSERVATION_METHODS)[number];

export const METHOD_LABELS: Record<ObservationMethod, string> = {
  visual: 'Visual inspection',
  rheology: 'Rheology',
  microscopy: 'Microscopy',
  scattering: 'Scattering',
};

/** How a programme's particles are made to attract (decides which map it uses). */
export const ATTRACTION_SOURCES = ['depletion', 'salt', 'direct'] as const;
export type AttractionSource = (typeof ATTRACTION_SOURCES)[number];

export const STABILISATIONS = ['charge', 'steric', 'electrosteric', 'none'] as const;
export type Stabilisation = (typeof STABILISATIONS)[number];

export const SHORTLIST_STATUSES = ['draft', 'submitted', 'approved', 'returned'] as const;
export type ShortlistStatus = (typeof SHORTLIST_STATUSES)[number];

/** The moves a shortlist may make; anything else is a 409. */
export const SHORTLIST_TRANSITIONS: Record<ShortlistStatus, readonly ShortlistStatus[]> = {
  draft: ['submitted'],
  submitted: ['approved', 'returned'],
  returned: ['draft'],
  approved: [],
};
