import type { ObservationMethod, ObservedState, PredictedState } from '../states';
import type { PersonRef } from './person';

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
  /** Fill height of the sample in its vial or tube (mm), when recorded. */
  sampleHeightMm: number | null;
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
