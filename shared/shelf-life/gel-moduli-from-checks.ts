import type { ObservedState } from '../states';
import type { ModulusAtAge } from './stiffening-with-age';

/**
 * The storage moduli a stiffening fit reads from a recipe's bench checks: those of checks that saw
 * a gel, at an age above 0 (log age), with G′ measured. A collapsed or fluid sample's modulus is
 * not the gel's.
 * @example gelModuliFromChecks([{ ageDays: 7, observedState: 'gel', storageModulusPa: 120 },
 *   { ageDays: 0, observedState: 'gel', storageModulusPa: 80 }, { ageDays: 14, observedState: 'collapsed', storageModulusPa: 5 }])
 *   // [{ ageDays: 7, storageModulusPa: 120 }]
 */
export function gelModuliFromChecks(checks: ReadonlyArray<{ ageDays: number; observedState: ObservedState; storageModulusPa: number | null }>): ModulusAtAge[] {
  return checks
    .filter((c) => c.observedState === 'gel' && c.storageModulusPa !== null && c.ageDays > 0)
    .map((c) => ({ ageDays: c.ageDays, storageModulusPa: c.storageModulusPa! }));
}
