import { requireFinite } from '../validation/require-finite';
import { requirePositive } from '../validation/require-positive';
import { BOLTZMANN_CONSTANT, STANDARD_GRAVITY } from './physical-constants';
import { requireTemperature } from './require-temperature';

/**
 * Gravitational Péclet number Pe_g = (4π/3) a⁴ Δρ g/(k_B T) (dimensionless): buoyant weight times
 * radius over thermal energy. Pe_g ≳ 1 means sedimentation beats Brownian motion, a collapse
 * risk for weak gels on the shelf. Negative Δρ (creaming) gives a negative number.
 *
 * Source: e.g. Russel, Saville & Schowalter, *Colloidal Dispersions* (Cambridge, 1989), ch. 12.
 *
 * @param radius particle radius a in m, > 0.
 * @param densityDifference Δρ = ρ_particle − ρ_solvent in kg/m³ (any finite value).
 * @param temperature absolute temperature in K.
 * @param gravity acceleration in m/s² (default standard gravity 9.80665).
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example gravitationalPecletNumber(1e-6, 1000, 298.15) // 9.9791
 */
export function gravitationalPecletNumber(radius: number, densityDifference: number, temperature: number, gravity = STANDARD_GRAVITY): number {
  requirePositive('radius', radius, 'a radius in m');
  requireFinite('densityDifference', densityDifference, 'a density difference in kg/m³');
  requireTemperature('temperature', temperature);
  requirePositive('gravity', gravity, 'an acceleration in m/s²');
  return ((4 * Math.PI) / 3) * radius ** 4 * densityDifference * gravity / (BOLTZMANN_CONSTANT * temperature);
}
