import { expect } from 'vitest';

/** Assert |actual − expected| ≤ tolerance·|expected| (relative tolerance). */
export function expectRelative(actual: number, expected: number, tolerance: number): void {
  expect(Number.isFinite(actual), `expected a finite number, got ${actual}`).toBe(true);
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (relative tolerance ${tolerance})`).toBeLessThanOrEqual(tolerance * Math.abs(expected));
}

/** Assert that calling `run` throws a PhysicsArgumentError whose message names `argument`. */
export function expectArgumentError(run: () => unknown, argument: string): void {
  let thrown: unknown;
  try {
    run();
  } catch (error) {
    thrown = error;
  }
  expect(thrown, `expected an error naming ${argument}`).toBeInstanceOf(RangeError);
  const message = (thrown as Error).message;
  expect(message.startsWith(`${argument} must be `), message).toBe(true);
  // The message states a valid range and the rejected value.
  expect(message).toMatch(/ in [([].*[)\]]|; got /);
  expect(message).toMatch(/; got /);
}

/** Bad volume fractions every φ argument must reject (φ ≤ 0, ≥ close packing, NaN, ±Infinity). */
export const BAD_VOLUME_FRACTIONS = [0, -0.1, Math.PI / Math.sqrt(18), 0.8, Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY];
