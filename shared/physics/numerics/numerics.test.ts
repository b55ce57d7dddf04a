import { describe, expect, it } from 'vitest';
import { adaptiveGaussKronrod } from './adaptive-gauss-kronrod';
import { brentMinimize } from './brent-minimize';
import { brentRoot } from './brent-root';
import { newton2d } from './newton-2d';
import { safeguardedNewton } from './safeguarded-newton';

describe('root finding, minimisation and quadrature', () => {
  it('brentRoot finds √2 and cos x = x, and returns null without a bracket', () => {
    expect(brentRoot((x) => x * x - 2, 0, 2)).toBeCloseTo(Math.SQRT2, 15);
    // Dottie number (Wolfram MathWorld, "Dottie Number", published): 0.739085133215161.
    expect(brentRoot((x) => Math.cos(x) - x, 0, 1)).toBeCloseTo(0.739085133215161, 14);
    expect(brentRoot((x) => x * x + 1, -1, 1)).toBeNull();
  });

  it('safeguardedNewton converges on a steep monotone function where plain Newton overshoots', () => {
    const root = safeguardedNewton((x) => Math.atan(x - 3), (x) => 1 / (1 + (x - 3) ** 2), -50, 50, -40);
    expect(root).toBeCloseTo(3, 13);
  });

  it('brentMinimize finds the minimum of a smooth unimodal function', () => {
    // A flat minimum is located to ~√ε only: f changes by δ² for a shift δ.
    expect(brentMinimize((x) => (x - 2) ** 2 + 1, 0, 5).x).toBeCloseTo(2, 7);
  });

  it('newton2d solves a coupled system and reports failure on a singular one', () => {
    const solution = newton2d((x, y, out) => out.set([x * x + y * y - 4, x - y, 2 * x, 2 * y, 1, -1]), 1, 0.5)!;
    expect(solution[0]).toBeCloseTo(Math.SQRT2, 12);
    expect(solution[1]).toBeCloseTo(Math.SQRT2, 12);
    expect(newton2d((x, y, out) => out.set([1, 1, 0, 0, 0, 0]), 0, 0)).toBeNull();
  });

  it('adaptiveGaussKronrod integrates smooth, peaked and singular-derivative integrands to tolerance', () => {
    expect(adaptiveGaussKronrod(Math.sin, 0, Math.PI).value).toBeCloseTo(2, 14);
    // A narrow Gaussian: ∫ exp(−((x − 0.3)/0.001)²) dx over [0, 1] = 0.001·√π (derived).
    expect(adaptiveGaussKronrod((x) => Math.exp(-(((x - 0.3) / 0.001) ** 2)), 0, 1).value).toBeCloseTo(0.001 * Math.sqrt(Math.PI), 13);
    expect(adaptiveGaussKronrod(Math.sqrt, 0, 1, { relativeTolerance: 1e-12 }).value).toBeCloseTo(2 / 3, 11);
  });
});
