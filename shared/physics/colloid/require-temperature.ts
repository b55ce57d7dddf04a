import { requireInRange } from '../validation/require-in-range';

/** Check an absolute temperature in kelvin: 0 < T < 10 000 K. */
export function requireTemperature(argument: string, kelvin: number): number {
  return requireInRange(argument, kelvin, 0, 10_000, { what: 'an absolute temperature in K' });
}
