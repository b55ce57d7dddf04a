import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import {
  cellChemicalPotential,
  cellPressure,
  cellPressureDerivative,
  csChemicalPotential,
  csPressure,
  csPressureDerivative,
} from '../hard-spheres/hard-sphere-branches';
import { brentRoot } from '../numerics/brent-root';
import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import { freeVolumeTermsInto, type FreeVolumeTerms } from './free-volume-fraction';

const terms: FreeVolumeTerms = { alpha: 0, slope: 0, curvature: 0 };

/**
 * Colloid phase in free-volume theory (semi-grand potential per colloid volume
 * ω = φ·βf_HS(φ) − (φ_p^R/q³)α(φ)), as a coexistence branch:
 * p̃ = p̃_HS + (φ_p^R/q³)(α − φα′), βμ = βμ_HS − (φ_p^R/q³)α′, dp̃/dφ = p̃′_HS − (φ_p^R/q³)φα″.
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992). Internal, unchecked.
 */
class FreeVolumeBranch implements PhaseBranch {
  readonly #q: number;
  readonly #osmotic: number;
  readonly #solid: boolean;
  constructor(solid: boolean, q: number, polymerReservoir: number, readonly low: number, readonly high: number) {
    this.#q = q;
    this.#osmotic = polymerReservoir / (q * q * q);
    this.#solid = solid;
  }
  pressure(phi: number): number {
    freeVolumeTermsInto(phi, this.#q, terms);
    return (this.#solid ? cellPressure(phi) : csPressure(phi)) + this.#osmotic * (terms.alpha - phi * terms.slope);
  }
  chemicalPotential(phi: number): number {
    freeVolumeTermsInto(phi, this.#q, terms);
    return (this.#solid ? cellChemicalPotential(phi) : csChemicalPotential(phi)) - this.#osmotic * terms.slope;
  }
  pressureDerivative(phi: number): number {
    freeVolumeTermsInto(phi, this.#q, terms);
    return (this.#solid ? cellPressureDerivative(phi) : csPressureDerivative(phi)) - this.#osmotic * phi * terms.curvature;
  }
}

/** A free-volume fluid (Carnahan–Starling) or crystal (cell model) branch on [low, high]. Internal. */
export function freeVolumeBranch(kind: 'fluid' | 'solid', q: number, polymerReservoir: number, low: number, high: number): PhaseBranch {
  const top = kind === 'solid' ? Math.min(high, FCC_CLOSE_PACKING * (1 - 1e-12)) : high;
  return new FreeVolumeBranch(kind === 'solid', q, polymerReservoir, low, top);
}

/** Lowest φ used for the crystal branch (the crystal always coexists above melting, 0.5424). */
export const FREE_VOLUME_SOLID_LOW = 0.5;

/**
 * The crystal branch from max(0.5, the φ where its own dp̃/dφ turns positive) to close packing:
 * at small q the polymer term makes the crystal mechanically unstable at lower φ. Internal.
 */
export function freeVolumeSolidBranch(q: number, polymerReservoir: number): PhaseBranch {
  const trial = freeVolumeBranch('solid', q, polymerReservoir, FREE_VOLUME_SOLID_LOW, 1);
  if (trial.pressureDerivative(FREE_VOLUME_SOLID_LOW) > 0) return trial;
  const onset = brentRoot((phi) => trial.pressureDerivative(phi), FREE_VOLUME_SOLID_LOW, FCC_CLOSE_PACKING * (1 - 1e-9), { absoluteTolerance: 1e-14 });
  return freeVolumeBranch('solid', q, polymerReservoir, (onset ?? FREE_VOLUME_SOLID_LOW) * (1 + 1e-9), 1);
}
