import { adaptiveGaussKronrod } from '../numerics/adaptive-gauss-kronrod';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import { MAX_WELL_DEPTH } from './square-well-reduced-b2';

export interface ReducedB2Options {
  /** Points inside (1, xMax) where βu has a kink or jump; the quadrature splits there. */
  breakpoints?: number[];
  /** Relative tolerance of the adaptive quadrature (default 1e-11). */
  relativeTolerance?: number;
}

/**
 * Reduced second virial coefficient of hard spheres plus any pair energy beyond contact, by
 * quadrature of the Mayer function:
 * B2* = 1 − 3 ∫₁^xMax (e^{−βu(x)} − 1) x² dx, x = r/σ (dimensionless).
 *
 * Source: the virial route (e.g. Hansen & McDonald, *Theory of Simple Liquids*, 4th ed., §3.9),
 * reduced by B2_HS = 2πσ³/3; the square-well closed form 1 − (λ³ − 1)(e^U − 1) is its test.
 * Numerics: adaptive 7/15 Gauss–Kronrod, relative tolerance 1e-11 (absolute 1e-14) unless set.
 *
 * @param betaU pair energy in kT at x = r/σ ≥ 1; zero beyond xMax. It may return +Infinity (an
 *   extra hard core) but not NaN, and attraction deeper than 700 kT cannot be represented.
 * @param xMax end of the interaction, 1 < xMax < ∞.
 * @throws PhysicsArgumentError if xMax ≤ 1 or not finite, if betaU is not a function, returns
 *   NaN or −Infinity, or is deeper than −700 kT.
 * @example reducedB2FromPotential(() => -1, 1.5) // -3.08077... = 1 − 2.375(e − 1)
 */
export function reducedB2FromPotential(betaU: (x: number) => number, xMax: number, options: ReducedB2Options = {}): number {
  if (typeof betaU !== 'function') throw new PhysicsArgumentError('betaU', 'a function of x = r/σ returning the pair energy in kT', betaU);
  requireInRange('xMax', xMax, 1, Infinity, { what: 'the end of the interaction in units of σ' });
  const mayerTimesShell = (x: number): number => {
    const energy = betaU(x);
    if (Number.isNaN(energy) || energy === -Infinity || (typeof energy !== 'number')) {
      throw new PhysicsArgumentError('betaU', 'a function returning finite energies in kT (or +Infinity for overlap)', energy);
    }
    if (energy < -MAX_WELL_DEPTH) {
      throw new PhysicsArgumentError('betaU', `a pair energy no deeper than -${MAX_WELL_DEPTH} kT (B2* would overflow)`, energy);
    }
    return Math.expm1(-energy) * x * x;
  };
  const cuts = [1, ...(options.breakpoints ?? []).filter((x) => x > 1 && x < xMax).sort((a, b) => a - b), xMax];
  let integral = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    integral += adaptiveGaussKronrod(mayerTimesShell, cuts[i], cuts[i + 1], {
      relativeTolerance: options.relativeTolerance ?? 1e-11,
      absoluteTolerance: 1e-14,
    }).value;
  }
  return 1 - 3 * integral;
}
