import type { ProgrammeShelfLife } from '../shelf-life/programme-shelf-life';

/** GET /api/programmes/:id/shelf-life: the programme's shelf-life analysis (shared/shelf-life/programme-shelf-life.ts). */
export interface ProgrammeShelfLifeView extends ProgrammeShelfLife {
  programmeId: number;
  /** The physics of delayed collapse, as context beside the model (COLLAPSE_PHYSICS_CONTEXT). */
  context: string;
}
