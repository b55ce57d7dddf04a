/**
 * FCC (and HCP) close packing of equal spheres, φ_cp = π/√18 = 0.74048049 — the largest volume
 * fraction equal spheres can reach (Kepler's conjecture, proved by Hales, Ann. Math. 162, 1065
 * (2005)). Upper end of every map's x axis and the divergence of the cell-model solid.
 */
export const FCC_CLOSE_PACKING = Math.PI / Math.sqrt(18);

/**
 * Random close packing of monodisperse hard spheres, ≈ 0.64 (common practice; e.g. Scott &
 * Kilgour, J. Phys. D 2, 863 (1969)). Used only as a reference value, not as a boundary.
 */
export const RANDOM_CLOSE_PACKING = 0.64;
