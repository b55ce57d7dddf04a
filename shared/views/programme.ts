import type { AttractionSource, GoalState } from '../states';

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
