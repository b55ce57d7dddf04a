import { BOLTZMANN_CONSTANT } from '../colloid/physical-constants';
import { requireTemperature } from '../colloid/require-temperature';
import { requireFinite } from '../validation/require-finite';
import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';
import { doubleLayerEnergyUnchecked } from './double-layer-energy';
import { hamakerEnergyUnchecked } from './hamaker-sphere-energy';
import { reducedB2FromPotential } from './reduced-b2-from-potential';
import { MAX_WELL_DEPTH } from './square-well-reduced-b2';

/** Two equal charged spheres in an electrolyte (SI units). */
export interface DlvoSystem {
  /** Particle radius a, m. */
  radius: number;
  /** Hamaker constant A_H, J. */
  hamaker: number;
  /** Surface potential ψ₀, V. */
  surfacePotential: number;
  /** Inverse Debye length κ, 1/m. */
  inverseDebyeLength: number;
  relativePermittivity: number;
  /** Temperature, K. */
  temperature: number;
}

function checkSystem(system: DlvoSystem): void {
  requirePositive('radius', system.radius, 'a radius in m');
  requirePositive('hamaker', system.hamaker, 'a Hamaker constant in J');
  requireFinite('surfacePotential', system.surfacePotential, 'a surface potential in V');
  requirePositive('inverseDebyeLength', system.inverseDebyeLength, 'an inverse Debye length in 1/m');
  requirePositive('relativePermittivity', system.relativePermittivity, 'a relative permittivity');
  requireTemperature('temperature', system.temperature);
}

/**
 * DLVO pair energy of two equal spheres at surface separation h, in kT: Hamaker's full van der
 * Waals form plus the constant-potential double layer in the Derjaguin approximation,
 * βU(h) = [U_vdW(h) + U_dl(h)]/(k_B T).
 *
 * Source: H. C. Hamaker, Physica 4, 1058 (1937); R. Hogg, T. W. Healy & D. W. Fuerstenau, Trans.
 * Faraday Soc. 62, 1638 (1966) (from memory); physics.md §2.
 *
 * @param separation h in m, > 0 (van der Waals diverges at contact).
 * @param system radius, Hamaker constant, surface potential, κ, ε_r, temperature (all checked).
 * @throws PhysicsArgumentError for any argument out of range, NaN or ±Infinity.
 * @example dlvoPairEnergy(1e-9, { radius: 100e-9, hamaker: 1e-20, surfacePotential: 0, inverseDebyeLength: 1e9, relativePermittivity: 78.4, temperature: 298.15 }) // -18.5266 (kT)
 */
export function dlvoPairEnergy(separation: number, system: DlvoSystem): number {
  requirePositive('separation', separation, 'a surface separation in m');
  checkSystem(system);
  return dlvoEnergyUnchecked(separation, system);
}

function dlvoEnergyUnchecked(separation: number, s: DlvoSystem): number {
  const joules = hamakerEnergyUnchecked(separation, s.radius, s.hamaker)
    + doubleLayerEnergyUnchecked(separation, s.radius, s.surfacePotential, s.inverseDebyeLength, s.relativePermittivity);
  return joules / (BOLTZMANN_CONSTANT * s.temperature);
}

export interface DlvoSummary {
  /** B2* with a hard core at h_min (σ = 2a), or null when the attraction at contact is beyond 700 kT. */
  b2: number | null;
  /** βU at the closest approach h_min (negative: attraction), kT. */
  contactEnergy: number;
  /** Width of the region where βU ≤ −1, from contact (σ) to its outer edge, in units of σ; null if the attraction never reaches 1 kT. */
  range: number | null;
  /** Highest βU beyond h_min if positive (a repulsive barrier), kT; null without a barrier. */
  barrier: number | null;
  /** Where the quadrature stops (|βU| < 1e-9 beyond it), in units of σ. */
  xMax: number;
}

/**
 * B2*, contact energy, range and barrier of the DLVO pair energy with a hard core at surface
 * separation h_min (physics.md §2: van der Waals diverges at contact, so the closest approach is
 * set by a stabilising layer or a minimum of ~0.2–0.5 nm). B2* is reduced with σ = 2a:
 * B2* = 1 − 3∫₁^{xMax}(e^{−βU} − 1)x²dx with βU = +∞ for r < σ + h_min (adaptive Gauss–Kronrod,
 * relative tolerance 1e-10). Range and barrier are read from βU on 400 log-spaced separations
 * then refined by bisection (range edge to 1e-6 relative).
 *
 * @param system the DLVO system (checked).
 * @param closestApproach h_min in m, 0 < h_min < a.
 * @throws PhysicsArgumentError for arguments out of range.
 * @example dlvoReducedB2({ radius: 100e-9, hamaker: 1e-20, surfacePotential: -0.025, inverseDebyeLength: 1 / 0.96137e-9, relativePermittivity: 78.4, temperature: 298.15 }, 0.4e-9).contactEnergy // -14.9767
 */
export function dlvoReducedB2(system: DlvoSystem, closestApproach: number): DlvoSummary {
  checkSystem(system);
  requireInRange('closestApproach', closestApproach, 0, system.radius, { what: 'a closest surface separation in m' });
  const sigma = 2 * system.radius;
  const energy = (h: number) => dlvoEnergyUnchecked(h, system);
  const contactEnergy = energy(closestApproach);
  // Where the interaction has died out: |βU| < 1e-9, searched on doubling separations.
  let hMax = Math.max(closestApproach * 2, 1 / system.inverseDebyeLength);
  while (Math.abs(energy(hMax)) > 1e-9 && hMax < 20 * sigma) hMax *= 2;
  const samples = 400;
  let barrier = -Infinity;
  let outerAttractive = -1;
  const grid: number[] = [];
  for (let i = 0; i <= samples; i++) {
    const h = closestApproach * (hMax / closestApproach) ** (i / samples);
    grid.push(h);
    const value = energy(h);
    if (value > barrier) barrier = value;
    if (value <= -1) outerAttractive = i;
  }
  let range: number | null = null;
  if (outerAttractive >= 0) {
    let inside = grid[outerAttractive];
    let outside = grid[Math.min(outerAttractive + 1, samples)];
    for (let k = 0; k < 60 && outside - inside > 1e-6 * inside; k++) {
      const middle = 0.5 * (inside + outside);
      if (energy(middle) <= -1) inside = middle; else outside = middle;
    }
    range = inside / sigma;
  }
  const coreEnd = 1 + closestApproach / sigma;
  const xMax = 1 + hMax / sigma;
  let b2: number | null = null;
  if (contactEnergy >= -MAX_WELL_DEPTH) {
    b2 = reducedB2FromPotential((x) => (x < coreEnd ? Infinity : energy((x - 1) * sigma)), xMax, { breakpoints: [coreEnd], relativeTolerance: 1e-10 });
  }
  return { b2, contactEnergy, range, barrier: barrier > 0 ? barrier : null, xMax };
}
