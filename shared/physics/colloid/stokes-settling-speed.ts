import { requireFinite } from '../validation/require-finite';
import { requirePositive } from '../validation/require-positive';
import { STANDARD_GRAVITY } from './physical-constants';

/**
 * Stokes settling speed of an isolated sphere, v = 2a²Δρg/(9η), in m/s (negative: creaming).
 *
 * Source: G. G. Stokes, Trans. Camb. Phil. Soc. 9, 8 (1851).
 *
 * @param radius particle radius a in m, > 0.
 * @param densityDifference Δρ in kg/m³ (finite).
 * @param viscosity solvent viscosity η in Pa·s, > 0.
 * @param gravity acceleration in m/s² (default 9.80665).
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example stokesSettlingSpeed(1e-6, 1000, 1e-3) // 2.17926e-6 m/s
 */
export function stokesSettlingSpeed(radius: number, densityDifference: number, viscosity: number, gravity = STANDARD_GRAVITY): number {
  requirePositive('radius', radius, 'a radius in m');
  requireFinite('densityDifference', densityDifference, 'a density difference in kg/m³');
  requirePositive('viscosity', viscosity, 'a viscosity in Pa·s');
  requirePositive('gravity', gravity, 'an acceleration in m/s²');
  return (2 * radius * radius * densityDifference * gravity) / (9 * viscosity);
}
