import type { BoundaryUncertainty } from './types';

/**
 * How uncertain the theory's boundaries are taken to be when a programme has no accepted
 * calibration: the attraction scale may be off by σ = 0.4 in B2* (one standard deviation),
 * centred on the theory (shift 0), with a sharp boundary (no logistic slope).
 *
 * Why 0.4: the gas–liquid critical point, where gels begin, sits at B2*_c = −1.65 in Gelwright's
 * mean-field theory, while the true value runs from −1.21 (sticky-sphere limit) to about −2.03
 * (square well of range 1.5; Singh, Kofke & Errington, J. Chem. Phys. 119, 3405 (2003),
 * published) — about ±0.4 around the middle (shared/design/physics.md §2, derived). A judgement
 * from the spread of theories, not a fit to any bench: the screen says so.
 */
export const DEFAULT_BOUNDARY_UNCERTAINTY: Readonly<BoundaryUncertainty> = Object.freeze({
  shift: 0,
  standardError: 0.4,
  sharpness: null,
  source: 'default' as const,
});
