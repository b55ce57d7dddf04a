/**
 * Version of the physics behind every derived result. Store it with each recipe's derived
 * parameters and each map; bump it whenever a formula, a default parameter or a numerical
 * method changes a result.
 */
// gw-physics-2: mode-coupling glass lines, gel threshold from Lu et al. 2008, short-range depletion
// through B2*, robust free-volume and Percus–Yevick numerics.
export const PHYSICS_MODEL_VERSION = 'gw-physics-2';
