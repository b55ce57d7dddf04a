import { requirePositive } from '../validation/require-positive';
import { BOLTZMANN_CONSTANT } from './physical-constants';
import { requireTemperature } from './require-temperature';

/**
 * Stokes–Einstein diffusion coefficient of a sphere, D = k_B T/(6πηa), in m²/s.
 *
 * Source: A. Einstein, Ann. Phys. 17, 549 (1905); Stokes drag 6πηa.
 *
 * @param temperature absolute temperature T in K, 0 < T < 10⁴.
 * @param viscosity solvent viscosity η in Pa·s, > 0.
 * @param radius particle radius a in m, > 0.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example stokesEinsteinDiffusion(298.15, 0.89002e-3, 100e-9) // 2.45368e-12
 */
export function stokesEinsteinDiffusion(temperature: number, viscosity: number, radius: number): number {
  requireTemperature('temperature', temperature);
  requirePositive('viscosity', viscosity, 'a viscosity in Pa·s');
  requirePositive('radius', radius, 'a radius in m');
  return (BOLTZMANN_CONSTANT * temperature) / (6 * Math.PI * viscosity * radius);
}
