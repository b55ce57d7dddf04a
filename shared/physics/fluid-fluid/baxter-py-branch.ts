import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import { baxterChemicalPotentialUnchecked } from './baxter-py-chemical-potential';
import { baxterLambdaUnchecked } from './baxter-py-lambda';
import { baxterPressureUnchecked } from './baxter-py-pressure';

/**
 * Baxter adhesive-sphere fluid (Percus–Yevick, compressibility route) as a coexistence branch on
 * [low, high], which must avoid the no-solution band. Internal, unchecked; a query inside the
 * band returns NaN, which the bracketing solvers treat as "no root".
 */
class BaxterFluidBranch implements PhaseBranch {
  constructor(readonly tau: number, readonly low: number, readonly high: number) {}
  pressure(phi: number): number {
    return baxterPressureUnchecked(phi, this.tau) ?? NaN;
  }
  chemicalPotential(phi: number): number {
    return baxterChemicalPotentialUnchecked(phi, this.tau) ?? NaN;
  }
  pressureDerivative(phi: number): number {
    const lambda = baxterLambdaUnchecked(phi, this.tau);
    if (lambda === null) return NaN;
    return ((1 + 2 * phi - lambda * phi * (1 - phi)) ** 2) / (1 - phi) ** 4;
  }
}

export function baxterFluidBranch(tau: number, low: number, high: number): PhaseBranch {
  return new BaxterFluidBranch(tau, low, high);
}
