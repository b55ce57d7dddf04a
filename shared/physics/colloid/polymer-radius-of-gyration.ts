import { requirePositive } from '../validation/require-positive';
import { requireInRange } from '../validation/require-in-range';

/**
 * Radius of gyration of a polymer from a scaling law R_g = k·M^ν (M in g/mol, R_g in the unit
 * of k). For PEG in water k = 0.0215 nm, ν = 0.583 (Devanand & Selser, Macromolecules 24, 5943
 * (1991), measured at 30 °C for M ≈ 10⁵–10⁶; the fit is quoted from memory).
 *
 * @param molarMass M in g/mol, > 0.
 * @param prefactor k (> 0), e.g. in nm.
 * @param exponent ν, 0 < ν ≤ 1 (0.5 θ-solvent, ≈0.588 good solvent).
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example polymerRadiusOfGyration(20000, 0.0215, 0.583) // 6.9173 (nm)
 */
export function polymerRadiusOfGyration(molarMass: number, prefactor: number, exponent: number): number {
  requirePositive('molarMass', molarMass, 'a molar mass in g/mol');
  requirePositive('prefactor', prefactor, 'a scaling prefactor k');
  requireInRange('exponent', exponent, 0, 1, { what: 'a scaling exponent ν', highEnd: 'closed' });
  return prefactor * molarMass ** exponent;
}
