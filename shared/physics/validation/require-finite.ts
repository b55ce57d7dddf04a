import { PhysicsArgumentError } from './physics-argument-error';

/**
 * Check that `value` is a finite number (not NaN, not ±Infinity, not a string).
 *
 * @throws PhysicsArgumentError naming `argument` otherwise.
 * @example requireFinite('depth', 2) // 2
 */
export function requireFinite(argument: string, value: number, validRange = 'a finite number'): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new PhysicsArgumentError(argument, validRange, value);
  }
  return value;
}
