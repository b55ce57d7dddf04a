/**
 * The inverse Baxter stickiness with the same reduced second virial coefficient,
 * 1/τ = 4(1 − B2*) (the reciprocal of stickinessFromReducedB2): the y axis of the adhesive-sphere
 * map. Unchecked, for the map's axis and overlay: B2* ≥ 1 gives 1/τ ≤ 0 (off the bottom of the map).
 *
 * Source: M. G. Noro & D. Frenkel, J. Chem. Phys. 113, 2941 (2000); R. J. Baxter, J. Chem.
 * Phys. 49, 2770 (1968).
 *
 * @param b2 reduced second virial coefficient (dimensionless).
 * @example inverseStickinessFromReducedB2(-1.5) // 10
 */
export function inverseStickinessFromReducedB2(b2: number): number {
  return 4 * (1 - b2);
}
