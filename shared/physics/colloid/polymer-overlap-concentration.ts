import { requirePositive } from '../validation/require-positive';
import { AVOGADRO_CONSTANT } from './physical-constants';

/**
 * Polymer overlap concentration c* = 3M/(4πN_A R_g³): the mass concentration at which coils of
 * radius R_g fill space, so that φ_p = c/c*. Returned in g/L (kg/m³).
 *
 * Source: de Gennes, *Scaling Concepts in Polymer Physics* (Cornell, 1979), ch. 3; with R_g as the
 * coil radius as in Lekkerkerker & Tuinier, *Colloids and the Depletion Interaction* (2011).
 *
 * @param molarMass M in g/mol, > 0.
 * @param radiusOfGyration R_g in nm, > 0.
 * @throws PhysicsArgumentError for non-positive, NaN or infinite arguments.
 * @example polymerOverlapConcentration(20000, 6.9173) // 23.954 g/L
 */
export function polymerOverlapConcentration(molarMass: number, radiusOfGyration: number): number {
  requirePositive('molarMass', molarMass, 'a molar mass in g/mol');
  requirePositive('radiusOfGyration', radiusOfGyration, 'a radius of gyration in nm');
  const radiusMetres = radiusOfGyration * 1e-9;
  const gramsPerCubicMetre = (3 * molarMass) / (4 * Math.PI * AVOGADRO_CONSTANT * radiusMetres ** 3);
  return gramsPerCubicMetre / 1000;
}
