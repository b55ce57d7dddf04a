import { cellModelSolid } from '../hard-spheres/cell-model-solid';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { carnahanStarlingBranch } from '../hard-spheres/hard-sphere-branches';
import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import { freeVolumeTerms } from './free-volume-fraction';

/**
 * Colloid phase in free-volume theory (semi-grand potential per colloid volume
 * ω = φ·βf_HS(φ) − (φ_p^R/q³)α(φ)), as a coexistence branch:
 * p̃ = p̃_HS + (φ_p^R/q³)(α − φα′), βμ = βμ_HS − (φ_p^R/q³)α′, dp̃/dφ = p̃′_HS − (φ_p^R/q³)φα″.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992). `solid` selects the cell-model
 * crystal, otherwise the Carnahan–Starling fluid. Internal, unchecked.
 */
export function freeVolumeBranch(kind: 'fluid' | 'solid', q: number, polymerReservoir: number, low: number, high: number): PhaseBranch {
  const osmotic = polymerReservoir / (q * q * q);
  const fluid = carnahanStarlingBranch();
  const hardSphere = kind === 'fluid'
    ? fluid
    : {
        pressure: (phi: number) => phi * cellModelSolid(phi).compressibility,
        chemicalPotential: (phi: number) => cellModelSolid(phi).chemicalPotential,
        pressureDerivative: (phi: number) => cellModelSolid(phi).pressureDerivative,
      };
  return {
    low,
    high: kind === 'solid' ? Math.min(high, FCC_CLOSE_PACKING * (1 - 1e-12)) : high,
    pressure: (phi) => {
      const terms = freeVolumeTerms(phi, q);
      return hardSphere.pressure(phi) + osmotic * (terms.alpha - phi * terms.slope);
    },
    chemicalPotential: (phi) => hardSphere.chemicalPotential(phi) - osmotic * freeVolumeTerms(phi, q).slope,
    pressureDerivative: (phi) => hardSphere.pressureDerivative(phi) - osmotic * phi * freeVolumeTerms(phi, q).curvature,
  };
}
