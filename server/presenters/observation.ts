import { observationAgrees } from '../../shared/states';
import type { AttachmentView, ObservationView } from '../../shared/views/observation';
import type { Attachment, Observation, Recipe, User } from '../models';

type LoadedObservation = Observation & { recipe?: Recipe | null; observer?: User | null; attachments?: (Attachment & { uploader?: User | null })[] };

const IMAGE_TYPES = new Set(['image/png', 'image/jpeg']);

export function presentAttachment(a: Attachment & { uploader?: User | null }): AttachmentView {
  return {
    id: a.id,
    observationId: a.observationId,
    originalName: a.originalName,
    mimeType: a.mimeType,
    sizeBytes: a.sizeBytes,
    sha256: a.sha256,
    uploadedBy: a.uploader ? { id: a.uploader.id, name: a.uploader.name } : null,
    createdAt: a.createdAt.toISOString(),
    isImage: IMAGE_TYPES.has(a.mimeType),
  };
}

/** The prediction an observation is compared with: its recipe's current one, or the ad-hoc one. */
export function predictionFor(o: LoadedObservation) {
  return o.recipe ? o.recipe.predictedState : o.adhocPredictedState;
}

export function presentObservation(o: LoadedObservation): ObservationView {
  const predicted = predictionFor(o);
  return {
    id: o.id,
    programmeId: o.programmeId,
    recipeId: o.recipeId,
    recipeCode: o.recipe?.code ?? null,
    adhoc: o.recipeId === null ? { phi: o.adhocPhi!, reducedB2: o.adhocReducedB2!, description: o.adhocDescription } : null,
    mixedAt: o.mixedAt.toISOString(),
    ageDays: o.ageDays,
    observedState: o.observedState,
    method: o.method,
    storageModulusPa: o.storageModulusPa,
    yieldStressPa: o.yieldStressPa,
    settledHeightPct: o.settledHeightPct,
    sampleHeightMm: o.sampleHeightMm ?? null,
    notes: o.notes,
    predictedState: predicted,
    agrees: observationAgrees(o.observedState, predicted),
    archived: o.archivedAt != null,
    observer: o.observer ? { id: o.observer.id, name: o.observer.name } : null,
    attachments: (o.attachments ?? []).filter((a) => a.archivedAt == null).map(presentAttachment),
    createdAt: o.createdAt.toISOString(),
  };
}
