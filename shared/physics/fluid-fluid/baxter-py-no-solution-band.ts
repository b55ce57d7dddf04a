import { requireInRange } from '../validation/require-in-range';

/**
 * The band of volume fractions in which Baxter's quadratic has no real root at stickiness τ
 * (below the critical τ_c): the roots of N(φ) = (τ + φ(1 − τ))² − φ/3 − φ²/6 = 0 in (0, 1).
 * Inside it the Percus–Yevick theory of adhesive spheres has no solution; it lies inside the
 * binodal, and the map uses its low edge as the dilute limit of stability.
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968) (the quadratic); the band edges are
 * derived here.
 *
 * @param tau stickiness τ > 0.
 * @returns `{ low, high }`, or `null` for τ ≥ τ_c (λ is real everywhere).
 * @throws PhysicsArgumentError for τ ≤ 0, NaN or ±Infinity.
 * @example baxterPYNoSolutionBand(0.09) // { low: 0.063519854..., high: 0.192792195... }
 */
export function baxterPYNoSolutionBand(tau: number): { low: number; high: number } | null {
  requireInRange('tau', tau, 0, Infinity, { what: 'a Baxter stickiness τ' });
  return baxterBandUnchecked(tau);
}

/** Band edges without checks (internal). */
export function baxterBandUnchecked(tau: number): { low: number; high: number } | null {
  const quadratic = (1 - tau) ** 2 - 1 / 6;
  const linear = 2 * tau * (1 - tau) - 1 / 3;
  const constant = tau * tau;
  // The discriminant simplifies to 2τ² − 4τ/3 + 1/9, positive for τ < τ_c = (2 − √2)/6.
  const discriminant = 2 * tau * tau - (4 * tau) / 3 + 1 / 9;
  if (discriminant <= 0 || tau >= (2 - Math.SQRT2) / 6) return null;
  const root = Math.sqrt(discriminant);
  // Stable pair of roots: q = −(b + sign(b)√D)/2, roots q/a and c/q.
  const q = -0.5 * (linear + Math.sign(linear) * root);
  const first = q / quadratic;
  const second = constant / q;
  return { low: Math.min(first, second), high: Math.max(first, second) };
}
