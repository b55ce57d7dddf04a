import type { GoalState, ShortlistStatus } from '../states';
import type { PersonRef } from './person';
import type { RecipeDifference, RecipeView } from './recipe';

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
