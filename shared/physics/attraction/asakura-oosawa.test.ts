import { describe, expect, it } from 'vitest';
import { asakuraOosawaAttraction } from './asakura-oosawa-attraction';
import { asakuraOosawaContactEnergy } from './asakura-oosawa-contact-energy';
import { asakuraOosawaPairEnergy } from './asakura-oosawa-pair-energy';
import { asakuraOosawaReducedB2 } from './asakura-oosawa-reduced-b2';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';

describe('Asakura–Oosawa depletion attraction', () => {
  it('asakuraOosawaContactEnergy is −φ_p^R(1 + 3/(2q)) and equals the pair energy at contact', () => {
    // physics.md §2 (derived from the overlap volume); Asakura & Oosawa, J. Chem. Phys. 22, 1255 (1954).
    expect(asakuraOosawaContactEnergy(0.1, 0.25)).toBeCloseTo(-4, 14);
    for (const [q, polymer] of [[0.05, 0.3], [0.3, 0.8], [1, 0.5]]) {
      expectRelative(asakuraOosawaPairEnergy(1, q, polymer), asakuraOosawaContactEnergy(q, polymer), 1e-13);
    }
  });

  it('asakuraOosawaPairEnergy rises monotonically to zero at x = 1 + q and stays zero beyond', () => {
    const q = 0.4;
    let previous = asakuraOosawaPairEnergy(1, q, 0.5);
    for (let x = 1.02; x < 1 + q; x += 0.02) {
      const value = asakuraOosawaPairEnergy(x, q, 0.5);
      expect(value).toBeGreaterThan(previous);
      expect(value).toBeLessThan(0);
      previous = value;
    }
    expect(Math.abs(asakuraOosawaPairEnergy(1 + q - 1e-9, q, 0.5))).toBeLessThan(1e-12);
    expect(asakuraOosawaPairEnergy(1 + q + 0.1, q, 0.5)).toBe(0);
  });

  it('asakuraOosawaReducedB2 matches an independent mpmath quadrature', () => {
    // Derived: reference/derive-check-values.py (mpmath quad of the Mayer function).
    expectRelative(asakuraOosawaReducedB2(0.1, 0.25), -1.2559058938454251, 1e-10);
    expectRelative(asakuraOosawaReducedB2(0.5, 0.3), -0.15303184813841436, 1e-9);
    expect(asakuraOosawaReducedB2(0.3, 0)).toBe(1);
  });

  it('asakuraOosawaAttraction gathers contact depth, range, B2* and τ', () => {
    const attraction = asakuraOosawaAttraction(0.1, 0.25);
    expect(attraction.contactEnergy).toBeCloseTo(4, 14);
    expect(attraction.range).toBe(0.1);
    expectRelative(attraction.b2, -1.2559058938454251, 1e-10);
    expectRelative(attraction.tau!, 1 / (4 * (1 + 1.2559058938454251)), 1e-10);
    expect(asakuraOosawaAttraction(0.1, 0).tau).toBeNull();
  });

  it('the depletion functions reject q ≤ 0, negative polymer fractions, NaN and Infinity', () => {
    for (const q of [0, -0.2, Number.NaN, Number.POSITIVE_INFINITY]) {
      expectArgumentError(() => asakuraOosawaContactEnergy(q, 0.1), 'q');
      expectArgumentError(() => asakuraOosawaPairEnergy(1.01, q, 0.1), 'q');
      expectArgumentError(() => asakuraOosawaReducedB2(q, 0.1), 'q');
    }
    expectArgumentError(() => asakuraOosawaContactEnergy(0.2, -0.1), 'polymerReservoir');
    expectArgumentError(() => asakuraOosawaReducedB2(0.2, Number.NaN), 'polymerReservoir');
    expectArgumentError(() => asakuraOosawaPairEnergy(0.9, 0.2, 0.1), 'x');
  });
});
