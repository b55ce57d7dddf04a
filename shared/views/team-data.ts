/**
 * Kept only while work in progress still imports from here: the view types live per resource
 * (person, programme, materials, recipe, observation, shortlist, map-points). Import from those.
 */
export type { PersonRef } from './person';
export type { ProgrammeView } from './programme';
export type { DepletantView, MaterialViews, ParticleView, SaltView, SolventView } from './materials';
export type { RecipeDerived, RecipeDifference, RecipeSnapshot, RecipeView } from './recipe';
export type { AttachmentView, ImportReport, ImportRowProblem, ObservationView } from './observation';
export type { ShortlistEventView, ShortlistItemView, ShortlistView } from './shortlist';
export type { MapPoints } from './map-points';
