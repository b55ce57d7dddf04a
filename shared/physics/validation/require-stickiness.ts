import { requireInRange } from './require-in-range';

/**
 * Check a Baxter stickiness τ: positive, Infinity allowed (hard spheres, no adhesion).
 *
 * @throws PhysicsArgumentError, e.g. `tau must be a Baxter stickiness τ in (0, Infinity]; got 0`.
 * @example requireStickiness('tau', Infinity) // Infinity
 */
export function requireStickiness(argument: string, tau: number): number {
  if (tau === Infinity) return tau;
  return requireInRange(argument, tau, 0, Infinity, { what: 'a Baxter stickiness τ (or Infinity for hard spheres)', highEnd: 'closed' });
}
