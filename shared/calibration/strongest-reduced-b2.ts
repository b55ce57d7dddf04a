import { attractionToReducedB2, type StateMap } from '../physics';
import { DEFAULT_SQUARE_WELL_RANGE } from '../physics/map/resolve-map-model';

/**
 * B2* at the top of a map's theory tables (its strongest attraction): above it the domes keep
 * their top width, so a search for where a sample enters them need go no further. From the
 * depletion map's own B2* table, or from the generic axis (B2* itself; 1/τ through
 * B2* = 1 − 1/(4τ) (Baxter 1968); a square-well depth through its B2*).
 * @example strongestReducedB2(buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' })) // -10
 */
export function strongestReducedB2(map: StateMap): number {
  const table = map.tables.reducedB2;
  if (map.model.kind === 'depletion' && table && table.b2.length > 0) return Math.min(...table.b2);
  const model = map.model;
  const top = map.y.strongest;
  if (model.kind === 'generic' && model.axis === 'inverseTau') return 1 - top / 4;
  if (model.kind === 'generic' && model.axis === 'squareWellDepth') return attractionToReducedB2({ kind: 'squareWell', depth: top, lambda: model.lambda ?? DEFAULT_SQUARE_WELL_RANGE });
  return top;
}
