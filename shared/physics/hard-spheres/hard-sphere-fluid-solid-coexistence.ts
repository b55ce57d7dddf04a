import { twoBranchCoexistence } from '../numerics/two-phase-coexistence';
import { carnahanStarlingBranch, cellModelSolidBranch } from './hard-sphere-branches';

export interface HardSphereCoexistence {
  /** Volume fraction of the fluid at freezing. */
  freezing: number;
  /** Volume fraction of the crystal at melting. */
  melting: number;
  /** Coexistence pressure βPσ³ (not the reduced p̃ = βPv₀; βPσ³ = 6p̃/π). */
  pressure: number;
}

let cached: HardSphereCoexistence | null = null;

/**
 * Hard-sphere freezing and melting: equal pressure and chemical potential between the
 * Carnahan–Starling fluid and the cell-model solid (free-volume theory's hard-sphere limit).
 *
 * Source: H. N. W. Lekkerkerker et al., Europhys. Lett. 20, 559 (1992) (cell model, constant
 * 2.1306); N. F. Carnahan & K. E. Starling, J. Chem. Phys. 51, 635 (1969). Solved by bracketing
 * in βμ (Brent) and a Newton polish; |Δp̃|, |Δβμ| < 1e-12.
 *
 * Result with these choices: freezing φ_f = 0.49238, melting φ_m = 0.54236, βPσ³ = 11.614
 * (p̃ = 6.0811). Simulation gives 0.494/0.545 (Hoover & Ree, J. Chem. Phys. 49, 3609 (1968)).
 *
 * @returns `{ freezing, melting, pressure }`; takes no arguments and never throws.
 * @example hardSphereFluidSolidCoexistence().freezing // 0.4923821970665...
 */
export function hardSphereFluidSolidCoexistence(): HardSphereCoexistence {
  if (cached) return { ...cached };
  const point = twoBranchCoexistence(carnahanStarlingBranch(1e-3), cellModelSolidBranch(0.3));
  if (point === null) throw new Error('hardSphereFluidSolidCoexistence: no coexistence found (internal error)');
  cached = { freezing: point.first, melting: point.second, pressure: (6 / Math.PI) * point.pressure };
  return { ...cached };
}
