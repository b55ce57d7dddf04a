import type { MapFrame } from './map-frame';
import { decideCause, type StateCause } from './state-rule';
import type { ClassifierParameters, ClassifierTables } from './types';

/**
 * State at a point given in drawn map coordinates (φ, y): converts y to the effective B2* and the
 * theory-frame level, then applies the rule; returns its cause. Internal (region grid, active segments).
 */
export function stateAtDrawnPoint(
  tables: ClassifierTables,
  theory: MapFrame,
  drawn: MapFrame,
  parameters: ClassifierParameters,
  crystalSuppressed: boolean,
  phi: number,
  y: number,
): StateCause {
  const effectiveB2 = drawn.b2FromY(y) - drawn.shift;
  const u0 = drawn.shift === 0 ? theory.uFromY(y) : theory.uFromY(theory.yFromB2(effectiveB2));
  return decideCause(tables, parameters, crystalSuppressed, phi, u0, effectiveB2);
}
