/**
 * Version of the physics behind every derived result. Store it with each recipe's derived
 * parameters and each map; bump it whenever a formula, a default parameter or a numerical
 * method changes a result.
 */
export const PHYSICS_MODEL_VERSION = 'gw-physics-1';
