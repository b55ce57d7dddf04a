import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';
import { AVOGADRO_CONSTANT, BOLTZMANN_CONSTANT, ELEMENTARY_CHARGE, VACUUM_PERMITTIVITY, WATER_RELATIVE_PERMITTIVITY } from './physical-constants';
import { requireTemperature } from './require-temperature';

/**
 * Debye screening length κ⁻¹ = √(ε_r ε₀ k_B T / (2 N_A e² I)) with the ionic strength I in
 * mol/m³ (here given in mol/L and converted), in m. For a 1:1 salt in water at 25 °C this is
 * 0.304 nm/√(I/M).
 *
 * Source: Debye–Hückel theory; e.g. Israelachvili, *Intermolecular and Surface Forces*, 3rd ed.
 * (Academic Press, 2011), §14.5.
 *
 * @param ionicStrength ionic strength I in mol/L, 0 < I ≤ 10.
 * @param temperature absolute temperature in K (default 298.15).
 * @param relativePermittivity solvent ε_r > 0 (default 78.4, water at 25 °C).
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example debyeLength(0.1) // 9.6137e-10 m (0.961 nm)
 */
export function debyeLength(ionicStrength: number, temperature = 298.15, relativePermittivity = WATER_RELATIVE_PERMITTIVITY): number {
  requireInRange('ionicStrength', ionicStrength, 0, 10, { what: 'an ionic strength in mol/L', highEnd: 'closed' });
  requireTemperature('temperature', temperature);
  requirePositive('relativePermittivity', relativePermittivity, 'a relative permittivity');
  const ionicStrengthSI = ionicStrength * 1000;
  return Math.sqrt(
    (relativePermittivity * VACUUM_PERMITTIVITY * BOLTZMANN_CONSTANT * temperature) /
      (2 * AVOGADRO_CONSTANT * ELEMENTARY_CHARGE * ELEMENTARY_CHARGE * ionicStrengthSI),
  );
}
