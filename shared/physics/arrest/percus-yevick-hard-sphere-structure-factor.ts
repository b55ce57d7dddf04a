import { requireInRange } from '../validation/require-in-range';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { structureFactorUnchecked } from './baxter-sticky-structure-factor';

/**
 * Static structure factor of hard spheres in the Percus–Yevick approximation (Wertheim's
 * analytic solution), through Baxter's factorisation with λ = 0:
 * S(k) = 1/|Q̂(k)|², Q(r) = a(r² − 1)/2 + b(r − 1), a = (1 + 2φ)/(1 − φ)², b = −3φ/(2(1 − φ)²).
 * S(0) = (1 − φ)⁴/(1 + 2φ)², the PY compressibility. k in units of 1/σ.
 *
 * Source: M. S. Wertheim, Phys. Rev. Lett. 10, 321 (1963); E. Thiele, J. Chem. Phys. 39, 474
 * (1963); factorised form: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968).
 *
 * @param phi volume fraction, 0 < φ < 1.
 * @param k wave number kσ ≥ 0.
 * @throws PhysicsArgumentError naming phi or k.
 * @example percusYevickHardSphereStructureFactor(0.5, 0) // 1/64 = 0.015625
 */
export function percusYevickHardSphereStructureFactor(phi: number, k: number): number {
  requireVolumeFraction('phi', phi, 1);
  requireInRange('k', k, 0, Infinity, { what: 'a wave number kσ', lowEnd: 'closed' });
  return structureFactorUnchecked(phi, 0, k);
}
