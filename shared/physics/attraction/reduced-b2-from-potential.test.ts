import { describe, expect, it } from 'vitest';
import { reducedB2FromPotential } from './reduced-b2-from-potential';
import { squareWellReducedB2 } from './square-well-reduced-b2';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';

describe('reducedB2FromPotential (Mayer-function quadrature)', () => {
  it('reproduces the square-well closed form for deep and shallow, narrow and wide wells', () => {
    // Consistency check of physics.md §2: quadrature against 1 − (λ³ − 1)(e^U − 1).
    for (const [depth, lambda] of [[0.5, 1.5], [1, 1.5], [3, 1.1], [8, 1.02], [20, 1.01], [0.01, 2.5]]) {
      expectRelative(reducedB2FromPotential(() => -depth, lambda), squareWellReducedB2(depth, lambda), 1e-10);
    }
  });

  it('gives 1 for hard spheres and λ³ for a hard shoulder out to λ', () => {
    expect(reducedB2FromPotential(() => 0, 2)).toBe(1);
    // An infinite shoulder to x = λ makes an effective hard sphere of diameter λσ: B2* = λ³.
    expectRelative(reducedB2FromPotential(() => Infinity, 1.2), 1.2 ** 3, 1e-12);
  });

  it('handles a potential with a jump when the jump is given as a breakpoint', () => {
    // Square well of depth 2 to x = 1.2, then a shoulder of height 1 to x = 1.5 (derived by hand):
    // B2* = 1 − (1.2³ − 1)(e² − 1) − (1.5³ − 1.2³)(e^{−1} − 1).
    const betaU = (x: number) => (x < 1.2 ? -2 : 1);
    const expected = 1 - (1.2 ** 3 - 1) * Math.expm1(2) - (1.5 ** 3 - 1.2 ** 3) * Math.expm1(-1);
    expectRelative(reducedB2FromPotential(betaU, 1.5, { breakpoints: [1.2] }), expected, 1e-11);
  });

  it('finds a narrow deep well at contact without breakpoints', () => {
    // Square-well closed form B2* = 1 − (λ³ − 1)(e^U − 1) (physics.md §2, standard result; e^600 ≈ 3.8e260
    // is finite in double precision), for a well much narrower than the interaction range.
    for (const [depth, lambda, xMax] of [[600, 1.01, 1.5], [600, 1.001, 1.5], [100, 1.001, 3], [30, 1.0001, 2], [5, 1.001, 1.5]]) {
      const betaU = (x: number) => (x < lambda ? -depth : 0);
      expectRelative(reducedB2FromPotential(betaU, xMax), 1 - (lambda ** 3 - 1) * Math.expm1(depth), 1e-9);
    }
  });

  it('reports a narrow well too deep to represent as an error, never as B2* = 1', () => {
    // λ = 1.001, U = 800: e^800 overflows double precision.
    expectArgumentError(() => reducedB2FromPotential((x) => (x < 1.001 ? -800 : 0), 1.5), 'betaU');
  });

  it('rejects xMax ≤ 1, non-functions, NaN energies and attraction beyond 700 kT', () => {
    expectArgumentError(() => reducedB2FromPotential(() => -1, 1), 'xMax');
    expectArgumentError(() => reducedB2FromPotential(() => -1, Number.NaN), 'xMax');
    expectArgumentError(() => reducedB2FromPotential(42 as unknown as () => number, 1.5), 'betaU');
    expectArgumentError(() => reducedB2FromPotential(() => Number.NaN, 1.5), 'betaU');
    expectArgumentError(() => reducedB2FromPotential(() => -800, 1.5), 'betaU');
  });
});
