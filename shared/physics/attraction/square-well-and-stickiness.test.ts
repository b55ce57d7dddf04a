import { describe, expect, it } from 'vitest';
import { reducedB2FromStickiness } from './reduced-b2-from-stickiness';
import { squareWellDepthFromReducedB2 } from './square-well-depth-from-reduced-b2';
import { squareWellReducedB2 } from './square-well-reduced-b2';
import { stickinessFromReducedB2 } from './stickiness-from-reduced-b2';
import { inverseStickinessFromReducedB2 } from './inverse-stickiness-from-reduced-b2';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';

describe('square well, Baxter stickiness and their conversions', () => {
  it('inverseStickinessFromReducedB2 is 1/τ = 4(1 − B2*), the reciprocal of stickinessFromReducedB2', () => {
    // Noro & Frenkel, J. Chem. Phys. 113, 2941 (2000), published relation; B2* = −1.5 gives τ = 0.1 (derived).
    expect(inverseStickinessFromReducedB2(-1.5)).toBe(10);
    expectRelative(inverseStickinessFromReducedB2(-2.0258433150744166), 1 / stickinessFromReducedB2(-2.0258433150744166), 1e-14);
    expect(inverseStickinessFromReducedB2(1)).toBe(0);
  });

  it('squareWellReducedB2 puts the simulated λ = 1.5 critical point at B2* ≈ −2.03', () => {
    // kT_c/ε = 1.2172 for λ = 1.5: Singh, Kofke & Errington, J. Chem. Phys. 119, 3405 (2003),
    // published; B2*_c ≈ −2.03 per physics.md §2 (derived: −2.0258433150744166).
    expect(squareWellReducedB2(1 / 1.2172, 1.5)).toBeCloseTo(-2.0258433150744166, 12);
    expect(squareWellReducedB2(1 / 1.2172, 1.5)).toBeCloseTo(-2.03, 2);
  });

  it('squareWellReducedB2 is 1 for a zero-depth well and follows 1 − (λ³ − 1)(e^U − 1)', () => {
    // Standard result (physics.md §2).
    expect(squareWellReducedB2(0, 1.3)).toBe(1);
    expectRelative(squareWellReducedB2(2, 1.1), 1 - (1.1 ** 3 - 1) * (Math.exp(2) - 1), 1e-14);
  });

  it('squareWellDepthFromReducedB2 inverts squareWellReducedB2', () => {
    for (const [depth, lambda] of [[0.3, 1.5], [2, 1.1], [5, 1.03], [0.01, 2]]) {
      expectRelative(squareWellDepthFromReducedB2(squareWellReducedB2(depth, lambda), lambda), depth, 1e-12);
    }
  });

  it('reducedB2FromStickiness places Miller & Frenkel\'s τ_c = 0.1133 at B2* = −1.2065', () => {
    // B2* = 1 − 1/(4τ): Baxter, J. Chem. Phys. 49, 2770 (1968), published formula;
    // τ_c = 0.1133 from Miller & Frenkel, PRL 90, 135702 (2003), from memory.
    expect(reducedB2FromStickiness(0.1133)).toBeCloseTo(1 - 1 / (4 * 0.1133), 14);
    expect(reducedB2FromStickiness(0.1133)).toBeCloseTo(-1.2065, 4);
  });

  it('stickinessFromReducedB2 inverts reducedB2FromStickiness (Noro–Frenkel mapping)', () => {
    // Noro & Frenkel, J. Chem. Phys. 113, 2941 (2000): τ = 1/(4(1 − B2*)).
    expect(stickinessFromReducedB2(-1.5)).toBeCloseTo(0.1, 14);
    for (const tau of [0.02, 0.0976, 0.5, 3]) expectRelative(stickinessFromReducedB2(reducedB2FromStickiness(tau)), tau, 1e-13);
  });

  it('the conversions reject out-of-range, NaN and infinite input, naming the argument', () => {
    expectArgumentError(() => squareWellReducedB2(-1, 1.5), 'depth');
    expectArgumentError(() => squareWellReducedB2(Number.NaN, 1.5), 'depth');
    expectArgumentError(() => squareWellReducedB2(1, 1), 'lambda');
    expectArgumentError(() => squareWellReducedB2(1, Number.POSITIVE_INFINITY), 'lambda');
    expectArgumentError(() => squareWellDepthFromReducedB2(1.5, 1.5), 'b2');
    expectArgumentError(() => reducedB2FromStickiness(0), 'tau');
    expectArgumentError(() => reducedB2FromStickiness(Number.NaN), 'tau');
    expectArgumentError(() => stickinessFromReducedB2(1), 'b2');
    expectArgumentError(() => stickinessFromReducedB2(Number.NEGATIVE_INFINITY), 'b2');
  });
});
