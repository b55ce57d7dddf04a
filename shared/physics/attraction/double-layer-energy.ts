import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';
import { VACUUM_PERMITTIVITY } from '../colloid/physical-constants';

/**
 * Electrical double-layer repulsion between two equal spheres at constant surface potential,
 * Derjaguin approximation, in J: U = 2π ε_r ε₀ a ψ₀² ln(1 + e^{−κh}). Valid for κa ≫ 1.
 *
 * Source: R. Hogg, T. W. Healy & D. W. Fuerstenau, Trans. Faraday Soc. 62, 1638 (1966) (the
 * equal-sphere case; quoted from memory).
 *
 * @param separation surface separation h in m, ≥ 0.
 * @param radius sphere radius a in m, > 0.
 * @param surfacePotential ψ₀ in V (finite, either sign).
 * @param inverseDebyeLength κ in 1/m, > 0.
 * @param relativePermittivity ε_r > 0.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example doubleLayerEnergy(1e-9, 100e-9, 0.025, 1e9, 78.4) // 8.5395e-20 J
 */
export function doubleLayerEnergy(separation: number, radius: number, surfacePotential: number, inverseDebyeLength: number, relativePermittivity: number): number {
  requireInRange('separation', separation, 0, Infinity, { what: 'a surface separation in m', lowEnd: 'closed' });
  requirePositive('radius', radius, 'a radius in m');
  requireInRange('surfacePotential', surfacePotential, -Infinity, Infinity, { what: 'a surface potential in V' });
  requirePositive('inverseDebyeLength', inverseDebyeLength, 'an inverse Debye length in 1/m');
  requirePositive('relativePermittivity', relativePermittivity, 'a relative permittivity');
  return doubleLayerEnergyUnchecked(separation, radius, surfacePotential, inverseDebyeLength, relativePermittivity);
}

/** The same without checks (internal, for quadrature). */
export function doubleLayerEnergyUnchecked(separation: number, radius: number, surfacePotential: number, inverseDebyeLength: number, relativePermittivity: number): number {
  return 2 * Math.PI * relativePermittivity * VACUUM_PERMITTIVITY * radius * surfacePotential * surfacePotential * Math.log1p(Math.exp(-inverseDebyeLength * separation));
}
