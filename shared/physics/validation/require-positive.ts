import { requireInRange } from './require-in-range';

/**
 * Check that `value` is a finite number greater than zero.
 *
 * @throws PhysicsArgumentError, e.g. `q must be a size ratio in (0, Infinity); got 0`.
 * @example requirePositive('radiusNm', 100, 'a radius in nm') // 100
 */
export function requirePositive(argument: string, value: number, what?: string): number {
  return requireInRange(argument, value, 0, Infinity, { what });
}
