import { requireInRange } from '../validation/require-in-range';

/** Largest size ratio the free-volume functions accept. */
export const FREE_VOLUME_MAX_Q = 5;
/** Largest reservoir polymer fraction the free-volume functions accept (far beyond ideal-polymer validity, ~1). */
export const FREE_VOLUME_MAX_POLYMER = 20;

/** Check a size ratio for free-volume theory: 0 < q ≤ 5. */
export function requireSizeRatio(q: number): number {
  return requireInRange('q', q, 0, FREE_VOLUME_MAX_Q, { what: 'a size ratio R_g/a', highEnd: 'closed' });
}

/** Check a reservoir polymer fraction for free-volume theory: 0 ≤ φ_p^R ≤ 20. */
export function requireReservoirPolymer(polymerReservoir: number): number {
  return requireInRange('polymerReservoir', polymerReservoir, 0, FREE_VOLUME_MAX_POLYMER, {
    what: 'a reservoir polymer fraction',
    lowEnd: 'closed',
    highEnd: 'closed',
  });
}
