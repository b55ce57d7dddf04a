import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { requireInRange } from './require-in-range';

/**
 * Check a particle volume fraction: finite and strictly between 0 and FCC close packing
 * φ_cp = π/√18 (or a smaller `upper` limit a formula needs, e.g. 1 for a fluid equation).
 *
 * @throws PhysicsArgumentError, e.g. `phi must be a volume fraction in (0, 0.7404805); got 0`.
 * @example requireVolumeFraction('phi', 0.2) // 0.2
 */
export function requireVolumeFraction(argument: string, phi: number, upper: number = FCC_CLOSE_PACKING): number {
  return requireInRange(argument, phi, 0, upper, { what: 'a volume fraction' });
}
