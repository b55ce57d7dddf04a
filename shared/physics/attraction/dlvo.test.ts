import { describe, expect, it } from 'vitest';
import { debyeLength } from '../colloid/debye-length';
import { BOLTZMANN_CONSTANT, VACUUM_PERMITTIVITY } from '../colloid/physical-constants';
import { dlvoPairEnergy, dlvoReducedB2, type DlvoSystem } from './dlvo-pair-energy';
import { doubleLayerEnergy } from './double-layer-energy';
import { hamakerSphereEnergy } from './hamaker-sphere-energy';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';

/** A 100 nm particle, A_H = 1e-20 J, ψ₀ = −25 mV, in 0.1 M 1:1 salt at 25 °C. */
function buildSystem(overrides: Partial<DlvoSystem> = {}): DlvoSystem {
  return { radius: 100e-9, hamaker: 1e-20, surfacePotential: -0.025, inverseDebyeLength: 1 / debyeLength(0.1), relativePermittivity: 78.4, temperature: 298.15, ...overrides };
}

describe('DLVO pair energy', () => {
  it('hamakerSphereEnergy tends to −A_H a/(12h) at small separation (Derjaguin limit)', () => {
    // Hamaker, Physica 4, 1058 (1937); the small-h limit is the standard result (derived). The
    // next term is of relative order (h/a)·ln(a/h), 2e-4 here.
    const a = 100e-9;
    const h = 0.001e-9;
    expectRelative(hamakerSphereEnergy(h, a, 1e-20), (-1e-20 * a) / (12 * h), 1e-3);
  });

  it('hamakerSphereEnergy tends to −(16/9)A_H a⁶/r⁶ far apart', () => {
    // Far-field limit of Hamaker's formula (derived by expansion in a/r).
    const a = 100e-9;
    const r = 100 * a;
    expectRelative(hamakerSphereEnergy(r - 2 * a, a, 1e-20), (-(16 / 9) * 1e-20 * a ** 6) / r ** 6, 1e-3);
  });

  it('doubleLayerEnergy is 2πε_rε₀aψ₀² ln 2 at contact and decays as e^{−κh}', () => {
    // Hogg, Healy & Fuerstenau, Trans. Faraday Soc. 62, 1638 (1966), from memory.
    const a = 100e-9;
    const psi = 0.025;
    const kappa = 1e9;
    expectRelative(doubleLayerEnergy(0, a, psi, kappa, 78.4), 2 * Math.PI * 78.4 * VACUUM_PERMITTIVITY * a * psi * psi * Math.LN2, 1e-14);
    const ratio = doubleLayerEnergy(20e-9, a, psi, kappa, 78.4) / doubleLayerEnergy(19e-9, a, psi, kappa, 78.4);
    expectRelative(ratio, Math.exp(-1), 1e-6);
  });

  it('dlvoPairEnergy is the sum of both terms in units of kT', () => {
    const system = buildSystem();
    const h = 2e-9;
    const expected = (hamakerSphereEnergy(h, system.radius, system.hamaker)
      + doubleLayerEnergy(h, system.radius, system.surfacePotential, system.inverseDebyeLength, system.relativePermittivity)) / (BOLTZMANN_CONSTANT * system.temperature);
    expectRelative(dlvoPairEnergy(h, system), expected, 1e-14);
  });

  it('dlvoReducedB2 matches an independent mpmath quadrature with the hard core at 0.4 nm', () => {
    // Derived: reference/derive-check-values.py (dlvo_check): βU(h_min) = −14.97668191652228,
    // B2* = −526.0052386 (integrated to x = 60; the code stops where |βU| < 1e-9, ~1e-8 lower).
    const summary = dlvoReducedB2(buildSystem(), 0.4e-9);
    expectRelative(summary.contactEnergy, -14.97668191652228, 1e-12);
    expectRelative(summary.b2 as number, -526.0052386215423, 1e-7);
    expect(summary.barrier).toBeGreaterThan(0);
    expect(summary.range).toBeGreaterThan(0);
  });

  it('dlvoReducedB2 range marks where the attraction falls to 1 kT', () => {
    const system = buildSystem();
    const summary = dlvoReducedB2(system, 0.4e-9);
    const edge = (summary.range as number) * 2 * system.radius;
    expect(dlvoPairEnergy(edge * 0.999, system)).toBeLessThan(-1);
    expect(dlvoPairEnergy(edge * 1.001, system)).toBeGreaterThan(-1);
  });

  it('dlvoReducedB2 reports a null B2* (no solution) when the contact attraction exceeds 700 kT', () => {
    const summary = dlvoReducedB2(buildSystem({ radius: 2e-6, hamaker: 5e-20, surfacePotential: 0 }), 0.2e-9);
    expect(summary.contactEnergy).toBeLessThan(-700);
    expect(summary.b2).toBeNull();
  });

  it('the DLVO functions reject bad input, naming the argument', () => {
    expectArgumentError(() => hamakerSphereEnergy(0, 1e-7, 1e-20), 'separation');
    expectArgumentError(() => hamakerSphereEnergy(1e-9, 1e-7, -1), 'hamaker');
    expectArgumentError(() => doubleLayerEnergy(1e-9, 1e-7, Number.NaN, 1e9, 78), 'surfacePotential');
    expectArgumentError(() => dlvoPairEnergy(1e-9, buildSystem({ inverseDebyeLength: 0 })), 'inverseDebyeLength');
    expectArgumentError(() => dlvoReducedB2(buildSystem(), 0), 'closestApproach');
  });
});
