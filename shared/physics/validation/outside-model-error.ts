import { PhysicsArgumentError } from './physics-argument-error';

/**
 * Input that is valid on its own but, combined with the rest of a recipe, takes the physics
 * outside what its model can describe (e.g. a polymer that no longer fits between the particles).
 * It is a PhysicsArgumentError, so callers that turn those into a 400 on a form field keep
 * working; its message is a plain sentence for the person who typed the value, not the
 * `<argument> must be <range>` pattern, because the remedy involves more than one field.
 *
 * @example new OutsideModelError('depletant.concentrationGL', 'at most 2 g/L here', 5, 'Too much polymer …').message
 * // 'Too much polymer …'
 */
export class OutsideModelError extends PhysicsArgumentError {
  constructor(argument: string, validRange: string, value: unknown, plainMessage: string) {
    super(argument, validRange, value);
    this.name = 'OutsideModelError';
    this.message = plainMessage;
  }
}
