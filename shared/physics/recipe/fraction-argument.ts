import type { PhysicsRecipeInput } from './recipe-types';

/**
 * The argument a bad φ is reported against: the recipe's fraction as given, noting when φ was
 * converted from a mass fraction.
 * @example fractionArgument({ fraction: { kind: 'mass', value: 0.3 } }) // 'fraction.value (as φ)'
 */
export function fractionArgument(input: Pick<PhysicsRecipeInput, 'fraction'>): string {
  return input.fraction.kind === 'mass' ? 'fraction.value (as φ)' : 'fraction.value';
}
