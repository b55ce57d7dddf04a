import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import { baxterChemicalPotentialUnchecked } from './baxter-py-chemical-potential';
import { baxterLambdaUnchecked } from './baxter-py-lambda';
import { baxterPressureUnchecked } from './baxter-py-pressure';

/**
 * Baxter adhesive-sphere fluid (Percus–Yevick, compressibility route) as a coexistence branch
 * on [low, high], which must avoid the no-solution band. Internal, unchecked; a query inside the
 * band returns NaN, which the bracketing solvers treat as "no root".
 */
export function baxterFluidBranch(tau: number, low: number, high: number): PhaseBranch {
  return {
    low,
    high,
    pressure: (phi) => baxterPressureUnchecked(phi, tau) ?? NaN,
    chemicalPotential: (phi) => baxterChemicalPotentialUnchecked(phi, tau) ?? NaN,
    pressureDerivative: (phi) => {
      const lambda = baxterLambdaUnchecked(phi, tau);
      if (lambda === null) return NaN;
      return ((1 + 2 * phi - lambda * phi * (1 - phi)) ** 2) / (1 - phi) ** 4;
    },
  };
}
