import { describe, expect, it } from 'vitest';
import { adaptiveGaussKronrod } from '../numerics/adaptive-gauss-kronrod';
import { baxterPercolationStickiness } from './baxter-percolation-stickiness';
import { baxterPYBinodal } from './baxter-py-binodal';
import { baxterPYChemicalPotential } from './baxter-py-chemical-potential';
import { baxterPYCriticalPoint } from './baxter-py-critical-point';
import { baxterPYInverseCompressibility } from './baxter-py-inverse-compressibility';
import { baxterPYLambda } from './baxter-py-lambda';
import { baxterPYNoSolutionBand } from './baxter-py-no-solution-band';
import { baxterPYPressure } from './baxter-py-pressure';
import { baxterPYSpinodalStickiness } from './baxter-py-spinodal-stickiness';
import { BAD_VOLUME_FRACTIONS, expectArgumentError, expectRelative } from '../test-support/expect-relative';

describe('Baxter adhesive spheres in the Percus–Yevick approximation', () => {
  it('baxterPYLambda and baxterPYInverseCompressibility reproduce the check values', () => {
    // physics.md §3, derived: (0.1, 0.2) → λ = 4.778222, β∂P/∂ρ = 0.903579;
    // (0.3, 0.5) → 2.727805, 4.394251. mpmath (reference/derive-check-values.py) for more digits.
    expectRelative(baxterPYLambda(0.1, 0.2)!, 4.77822222933356, 1e-13);
    expectRelative(baxterPYInverseCompressibility(0.1, 0.2)!, 0.903579333355311, 1e-13);
    expectRelative(baxterPYLambda(0.3, 0.5)!, 2.72780499084369, 1e-13);
    expectRelative(baxterPYInverseCompressibility(0.3, 0.5)!, 4.39425081697211, 1e-13);
    expect(baxterPYLambda(0.1, 0.2)).toBeCloseTo(4.778222, 6);
    expect(baxterPYInverseCompressibility(0.3, 0.5)).toBeCloseTo(4.394251, 6);
  });

  it('baxterPYLambda tends to 1/τ as φ → 0 without cancellation', () => {
    expectRelative(baxterPYLambda(1e-12, 0.3)!, 1 / 0.3, 1e-10);
  });

  it('baxterPYCriticalPoint is τ_c = (2 − √2)/6, φ_c = (3√2 − 4)/2', () => {
    // Baxter, J. Chem. Phys. 49, 2770 (1968): published closed form; 0.0976311 and 0.1213203.
    const critical = baxterPYCriticalPoint();
    expect(critical.tau).toBeCloseTo((2 - Math.SQRT2) / 6, 14);
    expect(critical.phi).toBeCloseTo((3 * Math.SQRT2 - 4) / 2, 9);
    expect(critical.tau).toBeCloseTo(0.0976311, 7);
    expect(critical.phi).toBeCloseTo(0.1213203, 7);
  });

  it('baxterPYCriticalPoint is the maximum of baxterPYSpinodalStickiness', () => {
    const critical = baxterPYCriticalPoint();
    for (let phi = 0.01; phi < 0.44; phi += 0.005) {
      expect(baxterPYSpinodalStickiness(phi)!).toBeLessThanOrEqual(critical.tau + 1e-15);
    }
    expect(baxterPYSpinodalStickiness(critical.phi)).toBeCloseTo(critical.tau, 15);
  });

  it('baxterPYSpinodalStickiness makes the inverse compressibility vanish on the dense side', () => {
    for (const phi of [0.15, 0.2, 0.3, 0.4]) {
      const tau = baxterPYSpinodalStickiness(phi)!;
      expect(Math.abs(baxterPYInverseCompressibility(phi, tau)!)).toBeLessThan(1e-18);
    }
    expect(baxterPYSpinodalStickiness(0.45)).toBeNull();
  });

  it('baxterPYLambda has no real root inside the band 0.064 < φ < 0.193 at τ = 0.09, and says so with null', () => {
    // physics.md §3 (derived): below τ_c there is a band of φ without a solution.
    const band = baxterPYNoSolutionBand(0.09)!;
    expect(band.low).toBeCloseTo(0.064, 3);
    expect(band.high).toBeCloseTo(0.193, 3);
    expect(baxterPYLambda(0.1, 0.09)).toBeNull();
    expect(baxterPYInverseCompressibility(0.15, 0.09)).toBeNull();
    expect(baxterPYPressure(0.15, 0.09)).toBeNull();
    expect(baxterPYChemicalPotential(0.15, 0.09)).toBeNull();
    expect(baxterPYLambda(band.low * 0.999, 0.09)).not.toBeNull();
    expect(baxterPYLambda(band.high * 1.001, 0.09)).not.toBeNull();
    expect(baxterPYNoSolutionBand(0.1)).toBeNull();
  });

  it('baxterPercolationStickiness gives τ_p(0.1) = 0.101852 and τ_p(0.2) = 0.177083, where λφ = 1', () => {
    // Chiew & Glandt, J. Phys. A 16, 2599 (1983), from memory; values derived (physics.md §3).
    expect(baxterPercolationStickiness(0.1)).toBeCloseTo(0.101852, 6);
    expect(baxterPercolationStickiness(0.2)).toBeCloseTo(0.177083, 6);
    for (const phi of [0.1, 0.2, 0.35]) expectRelative(phi * baxterPYLambda(phi, baxterPercolationStickiness(phi))!, 1, 1e-12);
  });

  it('baxterPYPressure is the integral of the inverse compressibility (closed form checked numerically)', () => {
    // mpmath (derived): p̃(0.3, 0.5) = 0.654787256953134.
    expectRelative(baxterPYPressure(0.3, 0.5)!, 0.654787256953134, 1e-13);
    for (const [phi, tau] of [[0.05, 0.09], [0.25, 0.09], [0.2, 0.3], [0.5, 1]]) {
      const h = 1e-6;
      const slope = (baxterPYPressure(phi + h, tau)! - baxterPYPressure(phi - h, tau)!) / (2 * h);
      expectRelative(slope, baxterPYInverseCompressibility(phi, tau)!, 1e-7);
    }
  });

  it('baxterPYChemicalPotential obeys dβμ/dφ = (dp̃/dφ)/φ and matches direct quadrature on the dilute side', () => {
    // mpmath quadrature of the compressibility (derived): βμ(0.05, 0.5) = −2.78139529140188,
    // βμ(0.3, 0.5) = 0.813892970078319.
    expectRelative(baxterPYChemicalPotential(0.05, 0.5)!, -2.78139529140188, 1e-12);
    expectRelative(baxterPYChemicalPotential(0.3, 0.5)!, 0.813892970078319, 1e-12);
    for (const [phi, tau] of [[0.01, 0.09], [0.03, 0.05], [0.25, 0.09], [0.4, 0.05], [0.3, 0.5], [0.5, 2]]) {
      const h = 1e-6;
      const slope = (baxterPYChemicalPotential(phi + h, tau)! - baxterPYChemicalPotential(phi - h, tau)!) / (2 * h);
      expectRelative(slope, baxterPYInverseCompressibility(phi, tau)! / phi, 1e-6);
    }
    // The switch between quadrature and closed form is seamless.
    const tau = 0.4;
    const switchAt = 0.06 * tau * tau;
    expectRelative(baxterPYChemicalPotential(switchAt * (1 - 1e-9), tau)!, baxterPYChemicalPotential(switchAt * (1 + 1e-9), tau)!, 1e-9);
    const integral = adaptiveGaussKronrod((x) => (baxterPYInverseCompressibility(x, tau)! - 1) / x, 0, 0.2, { relativeTolerance: 1e-13 }).value;
    expectRelative(baxterPYChemicalPotential(0.2, tau)!, Math.log(0.2) + integral, 1e-11);
  });

  it('baxterPYChemicalPotential tends to the Percus–Yevick hard-sphere value as τ → ∞, without cancellation', () => {
    // PY compressibility route for hard spheres, Z = (1 + φ + φ²)/(1 − φ)³ (Thiele, J. Chem. Phys.
    // 39, 474 (1963); Wertheim, Phys. Rev. Lett. 10, 321 (1963): published), integrated in closed
    // form: βμ = ln φ − ln(1 − φ) + (14φ − 13φ² + 5φ³)/(2(1 − φ)³) (derived; e.g. Hansen &
    // McDonald, Theory of Simple Liquids, from memory). At φ = 0.5 it is exactly 17.5.
    const hardSphere = (phi: number) => Math.log(phi) - Math.log1p(-phi) + (14 * phi - 13 * phi ** 2 + 5 * phi ** 3) / (2 * (1 - phi) ** 3);
    expect(hardSphere(0.5)).toBeCloseTo(17.5, 13);
    for (const phi of [0.05, 0.3, 0.5, 0.7]) {
      expectRelative(baxterPYChemicalPotential(phi, 1e300)!, hardSphere(phi), 1e-13);
      expectRelative(baxterPYChemicalPotential(phi, 1e12)!, hardSphere(phi), 1e-10);
      // The approach is from below and of order 1/τ (stickiness only lowers βμ).
      const gap = hardSphere(phi) - baxterPYChemicalPotential(phi, 1e4)!;
      expect(gap).toBeGreaterThan(0);
      expectRelative(10 * (hardSphere(phi) - baxterPYChemicalPotential(phi, 1e5)!), gap, 1e-3);
    }
    // mpmath quadrature of the compressibility (derived, reference/derive-check-values.py):
    // βμ(0.3, 1e4) = 3.76616321689440, βμ(0.5, 1e5) = 17.4998425014562.
    expectRelative(baxterPYChemicalPotential(0.3, 1e4)!, 3.7661632168944, 1e-12);
    expectRelative(baxterPYChemicalPotential(0.5, 1e5)!, 17.4998425014562, 1e-12);
  });

  it('baxterPYChemicalPotential is continuous across the critical stickiness τ_c = (2 − √2)/6', () => {
    const criticalTau = (2 - Math.SQRT2) / 6;
    for (const phi of [0.05, 0.3, 0.5]) {
      const at = baxterPYChemicalPotential(phi, criticalTau)!;
      for (const relative of [1e-12, 1e-9, 1e-7, 2e-6]) {
        expect(Math.abs(baxterPYChemicalPotential(phi, criticalTau * (1 + relative))! - at)).toBeLessThan(1e-5);
        expect(Math.abs(baxterPYChemicalPotential(phi, criticalTau * (1 - relative))! - at)).toBeLessThan(1e-5);
      }
    }
    // mpmath (derived, reference/derive-check-values.py): βμ(0.05, τ_c) = −3.59905057686514 by
    // quadrature, βμ(0.3, τ_c) = −3.38478006780687 from the closed form just above τ_c.
    expectRelative(baxterPYChemicalPotential(0.05, criticalTau)!, -3.59905057686514, 1e-9);
    expectRelative(baxterPYChemicalPotential(0.3, criticalTau)!, -3.38478006780687, 1e-9);
  });

  it('baxterPYBinodal satisfies equal pressure and chemical potential and brackets the no-solution band', () => {
    for (const tau of [0.0975, 0.09, 0.07, 0.05, 0.03]) {
      const pair = baxterPYBinodal(tau)!;
      const band = baxterPYNoSolutionBand(tau)!;
      expect(Math.abs(baxterPYPressure(pair.gas, tau)! - baxterPYPressure(pair.liquid, tau)!)).toBeLessThan(1e-9);
      expect(Math.abs(baxterPYChemicalPotential(pair.gas, tau)! - baxterPYChemicalPotential(pair.liquid, tau)!)).toBeLessThan(1e-9);
      expect(pair.gas).toBeLessThan(band.low);
      expect(pair.liquid).toBeGreaterThan(band.high);
      // The dense branch of the spinodal lies inside the binodal too.
      const critical = baxterPYCriticalPoint();
      let phi = critical.phi;
      while (baxterPYSpinodalStickiness(phi)! > tau) phi += 1e-4;
      expect(phi).toBeLessThan(pair.liquid);
    }
    // Derived with mpmath (reference/derive-check-values.py, py_binodal, same closed form written
    // independently): τ = 0.09 → 0.0490891819458, 0.315220626358.
    const at009 = baxterPYBinodal(0.09)!;
    expect(at009.gas).toBeCloseTo(0.0490891819458, 10);
    expect(at009.liquid).toBeCloseTo(0.315220626358, 10);
    expect(baxterPYBinodal(0.1)).toBeNull();
  });

  it('baxterPYBinodal reports no solution (null) where the gas would fall inside the band', () => {
    expect(baxterPYBinodal(0.015)).toBeNull();
  });

  it('the Baxter functions reject bad φ and τ, naming the argument', () => {
    for (const bad of BAD_VOLUME_FRACTIONS) {
      expectArgumentError(() => baxterPYLambda(bad, 0.2), 'phi');
      expectArgumentError(() => baxterPYSpinodalStickiness(bad), 'phi');
      expectArgumentError(() => baxterPercolationStickiness(bad), 'phi');
      expectArgumentError(() => baxterPYPressure(bad, 0.2), 'phi');
    }
    for (const bad of [0, -1, Number.NaN, Number.POSITIVE_INFINITY]) {
      expectArgumentError(() => baxterPYLambda(0.2, bad), 'tau');
      expectArgumentError(() => baxterPYNoSolutionBand(bad), 'tau');
      expectArgumentError(() => baxterPYChemicalPotential(0.2, bad), 'tau');
    }
    expectArgumentError(() => baxterPYBinodal(0.005), 'tau');
  });
});
