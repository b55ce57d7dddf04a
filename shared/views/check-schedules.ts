import type { ObservedState } from '../states';

/** A recipe's check schedule; `agesDays` is empty when none is set. */
export interface CheckScheduleView {
  recipeId: number;
  agesDays: number[];
  updatedAt: string | null;
  updatedBy: { id: number; name: string } | null;
}

/** One sample (a recipe and its mixing date) whose next scheduled check has come. */
export interface DueCheckView {
  recipeId: number;
  recipeCode: string;
  recipeName: string;
  /** The mixing date as stored; a check recorded against it joins the same sample. */
  mixedAt: string;
  lastCheck: { observationId: number; ageDays: number; observedState: ObservedState };
  /** The sample's fill height (mm), the latest recorded among its checks; null when never recorded. */
  sampleHeightMm: number | null;
  /** The scheduled age that has come (days after mixing). */
  dueAgeDays: number;
  /** Whole days since mixing, as of `asOf`: the age a check recorded now carries. */
  ageTodayDays: number;
}

export interface DueChecksView {
  items: DueCheckView[];
  /** Every due sample of the programme (items holds at most `limit` of them). */
  total: number;
  asOf: string;
}
