import { FREE_VOLUME_MAX_Q } from '../depletion/free-volume-limits';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import type { MapModel } from './types';

/** Default square-well range λ for the U/kT axis. */
export const DEFAULT_SQUARE_WELL_RANGE = 1.5;

/**
 * Check a map model and fill its defaults (λ = 1.5 for a generic model).
 *
 * @throws PhysicsArgumentError naming the field: model.kind, model.theory, model.axis,
 *   model.lambda (λ in (1, 3]) or model.q (0 < q ≤ 5).
 * @example resolveMapModel({ kind: 'generic', theory: 'meanField', axis: 'b2' }).lambda // 1.5
 */
export function resolveMapModel(model: MapModel): MapModel {
  if (model === null || typeof model !== 'object') throw new PhysicsArgumentError('model', "a map model { kind: 'generic' | 'depletion', … }", model);
  if (model.kind === 'generic') {
    if (model.theory !== 'meanField' && model.theory !== 'baxterPY') {
      throw new PhysicsArgumentError('model.theory', "'meanField' or 'baxterPY'", model.theory);
    }
    if (model.axis !== 'b2' && model.axis !== 'inverseTau' && model.axis !== 'squareWellDepth') {
      throw new PhysicsArgumentError('model.axis', "'b2', 'inverseTau' or 'squareWellDepth'", model.axis);
    }
    const lambda = model.lambda ?? DEFAULT_SQUARE_WELL_RANGE;
    requireInRange('model.lambda', lambda, 1, 3, { what: 'a square-well range λ', highEnd: 'closed' });
    return { kind: 'generic', theory: model.theory, axis: model.axis, lambda };
  }
  if (model.kind === 'depletion') {
    requireInRange('model.q', model.q, 0, FREE_VOLUME_MAX_Q, { what: 'a size ratio R_g/a', highEnd: 'closed' });
    return { kind: 'depletion', q: model.q };
  }
  throw new PhysicsArgumentError('model.kind', "'generic' or 'depletion'", (model as { kind?: unknown }).kind);
}
