import { describe, expect, it } from 'vitest';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { hardSphereFluidSolidCoexistence } from '../hard-spheres/hard-sphere-fluid-solid-coexistence';
import { freeVolumeCriticalEndpoint } from './free-volume-critical-endpoint';
import { freeVolumeCriticalPoint } from './free-volume-critical-point';
import { freeVolumeFluidFluidBinodal } from './free-volume-fluid-fluid-binodal';
import { crystalAgainstDiluteGas, freeVolumeFluidSolidCoexistence, freeVolumeFluidSolidUnchecked } from './free-volume-fluid-solid-coexistence';
import { freeVolumeFraction } from './free-volume-fraction';
import { freeVolumeSpinodal } from './free-volume-spinodal';
import { freeVolumeTriplePoint } from './free-volume-triple-point';
import { reservoirPolymerFraction } from './reservoir-polymer-fraction';
import { systemPolymerFraction } from './system-polymer-fraction';
import { BAD_VOLUME_FRACTIONS, expectArgumentError, expectRelative } from '../test-support/expect-relative';

// physics.md §4 written out again for the checks: α and α′ by hand, p̃ and βμ of each phase.
function alphaAndSlope(phi: number, q: number): [number, number] {
  const y = phi / (1 - phi);
  const a = 3 * q + 3 * q * q + q ** 3;
  const b = 4.5 * q * q + 3 * q ** 3;
  const c = 3 * q ** 3;
  const exponent = a * y + b * y * y + c * y ** 3;
  const exponentSlope = (a + 2 * b * y + 3 * c * y * y) / (1 - phi) ** 2;
  const boltzmann = Math.exp(-exponent);
  return [(1 - phi) * boltzmann, -boltzmann - (1 - phi) * boltzmann * exponentSlope];
}
function fluid(phi: number, q: number, polymer: number) {
  const [alpha, slope] = alphaAndSlope(phi, q);
  const osmotic = polymer / q ** 3;
  // Carnahan–Starling written out: a metastable liquid may lie beyond φ_cp at small q.
  const z = (1 + phi + phi * phi - phi ** 3) / (1 - phi) ** 3;
  const muExcess = (8 * phi - 9 * phi * phi + 3 * phi ** 3) / (1 - phi) ** 3;
  return {
    pressure: phi * z + osmotic * (alpha - phi * slope),
    mu: Math.log(phi) + muExcess - osmotic * slope,
  };
}
function solid(phi: number, q: number, polymer: number) {
  const [alpha, slope] = alphaAndSlope(phi, q);
  const osmotic = polymer / q ** 3;
  const packing = 1 - phi / FCC_CLOSE_PACKING;
  return {
    pressure: (3 * phi) / packing + osmotic * (alpha - phi * slope),
    mu: 2.1306 + 3 * Math.log(phi / packing) + 3 / packing - osmotic * slope,
  };
}

describe('free-volume theory of colloids with ideal polymer', () => {
  it('freeVolumeFraction reproduces the check values', () => {
    // physics.md §4, derived: α(q=0.1, φ=0.3) = 0.601948, α(0.5, 0.3) = 0.186456, α(1, 0.1) = 0.375369.
    expect(freeVolumeFraction(0.3, 0.1)).toBeCloseTo(0.601948, 6);
    expect(freeVolumeFraction(0.3, 0.5)).toBeCloseTo(0.186456, 6);
    expect(freeVolumeFraction(0.1, 1)).toBeCloseTo(0.375369, 6);
  });

  it('the hand-written α′ used by these checks is the derivative of freeVolumeFraction', () => {
    for (const [phi, q] of [[0.1, 0.1], [0.3, 0.5], [0.55, 1]]) {
      const h = 1e-6;
      const slope = (freeVolumeFraction(phi + h, q) - freeVolumeFraction(phi - h, q)) / (2 * h);
      expectRelative(alphaAndSlope(phi, q)[1], slope, 1e-7);
    }
  });

  it('freeVolumeFluidSolidCoexistence at zero polymer is hard-sphere freezing and melting', () => {
    const hardSphere = hardSphereFluidSolidCoexistence();
    for (const q of [0.1, 0.5, 1]) {
      const pair = freeVolumeFluidSolidCoexistence(q, 0);
      expect(pair.fluid).toBeCloseTo(hardSphere.freezing, 11);
      expect(pair.solid).toBeCloseTo(hardSphere.melting, 11);
    }
  });

  it('freeVolumeFluidSolidCoexistence satisfies equal pressure and chemical potential to 1e-9 and matches mpmath', () => {
    for (const [q, polymer] of [[0.1, 0.05], [0.1, 0.2], [0.1, 0.35], [0.4, 0.3], [0.6, 1.5], [1, 0.8]]) {
      const pair = freeVolumeFluidSolidCoexistence(q, polymer);
      const f = fluid(pair.fluid, q, polymer);
      const s = solid(pair.solid, q, polymer);
      expect(Math.abs(f.pressure - s.pressure), `Δp at q=${q}, φ_p^R=${polymer}`).toBeLessThan(1e-9 * Math.max(1, s.pressure));
      expect(Math.abs(f.mu - s.mu), `Δμ at q=${q}, φ_p^R=${polymer}`).toBeLessThan(1e-9 * Math.max(1, Math.abs(s.mu)));
    }
    // Derived: reference/derive-check-values.py (mpmath findroot).
    const a = freeVolumeFluidSolidCoexistence(0.5, 0.2);
    expect(a.fluid).toBeCloseTo(0.490884511771970, 11);
    expect(a.solid).toBeCloseTo(0.543907920633879, 11);
    const b = freeVolumeFluidSolidCoexistence(0.1, 0.1);
    expect(b.fluid).toBeCloseTo(0.470688379380252, 11);
    expect(b.solid).toBeCloseTo(0.590720612669382, 11);
  });

  it('freeVolumeFluidFluidBinodal satisfies equal pressure and chemical potential to 1e-9 and matches mpmath', () => {
    // q = 0.15 near its critical point: the smallest-q case whose liquid lies below close packing.
    for (const [q, polymer] of [[0.15, freeVolumeCriticalPoint(0.15).polymerReservoir * 1.1], [0.3, 0.5], [0.5, 0.6], [0.5, 1], [1, 1.2]]) {
      const pair = freeVolumeFluidFluidBinodal(q, polymer)!;
      expect(pair, `binodal at q=${q}, φ_p^R=${polymer}`).not.toBeNull();
      const gas = fluid(pair.gas, q, polymer);
      const liquid = fluid(pair.liquid, q, polymer);
      expect(Math.abs(gas.pressure - liquid.pressure)).toBeLessThan(1e-9 * Math.max(1, gas.pressure));
      expect(Math.abs(gas.mu - liquid.mu)).toBeLessThan(1e-9 * Math.max(1, Math.abs(gas.mu)));
    }
    // Derived: reference/derive-check-values.py: q = 0.5, φ_p^R = 1 → 0.000401693139823731, 0.514167464449186.
    const pair = freeVolumeFluidFluidBinodal(0.5, 1)!;
    expectRelative(pair.gas, 0.000401693139823731, 1e-9);
    expectRelative(pair.liquid, 0.514167464449186, 1e-11);
  });

  it('freeVolumeSpinodal lies inside the binodal and meets it at the critical point', () => {
    for (const [q, factor] of [[0.15, 1.1], [0.5, 1.3], [1, 2]]) {
      const critical = freeVolumeCriticalPoint(q);
      const polymer = critical.polymerReservoir * factor;
      const spinodal = freeVolumeSpinodal(q, polymer)!;
      const binodal = freeVolumeFluidFluidBinodal(q, polymer)!;
      expect(binodal.gas).toBeLessThan(spinodal.low);
      expect(spinodal.low).toBeLessThan(critical.phi);
      expect(critical.phi).toBeLessThan(spinodal.high!);
      expect(spinodal.high!).toBeLessThan(binodal.liquid);
      expect(freeVolumeSpinodal(q, critical.polymerReservoir * 0.99)).toBeNull();
      expect(freeVolumeFluidFluidBinodal(q, critical.polymerReservoir * 0.99)).toBeNull();
    }
  });

  it('freeVolumeCriticalPoint matches mpmath for q = 0.1 (metastable) and q = 1 (stable)', () => {
    // Derived: reference/derive-check-values.py (mpmath, dp̃/dφ = d²p̃/dφ² = 0).
    const small = freeVolumeCriticalPoint(0.1);
    expect(small.phi).toBeCloseTo(0.605605485034697, 7);
    expectRelative(small.polymerReservoir, 0.258624648307591, 1e-12);
    expect(small.stable).toBe(false);
    const large = freeVolumeCriticalPoint(1);
    expect(large.phi).toBeCloseTo(0.104000553094010, 7);
    expectRelative(large.polymerReservoir, 0.636412047719584, 1e-12);
    expect(large.stable).toBe(true);
  });

  it('freeVolumeFluidSolidCoexistence solves strong depletion at small q, where the gas is extremely dilute', () => {
    // Derived: reference/derive-check-values.py (mpmath, fvt_dilute_gas_crystal, solved in ln φ_gas):
    // q = 0.4, φ_p^R = 20 → φ_gas = 1.43295505642693e-181, φ_solid = 0.735253835782750.
    const strong = freeVolumeFluidSolidCoexistence(0.4, 20);
    expectRelative(strong.fluid, 1.43295505642693e-181, 1e-9);
    expect(strong.solid).toBeCloseTo(0.73525383578275, 10);
    // The dilute-gas limit agrees with the general solver where both work (q = 0.4, φ_p^R = 15).
    expectRelative(crystalAgainstDiluteGas(0.4, 15)!.solid, freeVolumeFluidSolidUnchecked(0.4, 15)!.solid, 1e-12);
    expectRelative(crystalAgainstDiluteGas(0.4, 15)!.fluid, freeVolumeFluidSolidUnchecked(0.4, 15)!.fluid, 1e-9);
    // Below double precision the gas is reported as 0, never as an error; the crystal stays below φ_cp.
    for (const q of [0.01, 0.05, 0.1, 0.2, 0.3, 0.4]) {
      for (const polymer of [10, 15, 20]) {
        const point = freeVolumeFluidSolidCoexistence(q, polymer);
        expect(point.fluid).toBeGreaterThanOrEqual(0);
        expect(point.fluid).toBeLessThan(1e-16);
        expect(point.solid).toBeLessThan(FCC_CLOSE_PACKING);
        expect(point.solid).toBeGreaterThan(0.7);
      }
    }
    expect(freeVolumeFluidSolidCoexistence(0.05, 20).fluid).toBe(0);
  });

  it('free-volume gas–liquid results never put a liquid or a spinodal at or beyond close packing', () => {
    // The theory's formal liquids at q = 0.05, φ_p^R = 0.3 (0.886) and q = 0.05, φ_p^R = 1 (0.938)
    // lie beyond φ_cp = 0.7405 (physics.md §1): no coexistence is reported there.
    expect(freeVolumeFluidFluidBinodal(0.05, 0.3)).toBeNull();
    expect(freeVolumeFluidFluidBinodal(0.05, 1)).toBeNull();
    // The dense spinodal of q = 0.01 would lie at φ ≈ 0.97: flagged as no root (null), not a bound.
    const spinodal = freeVolumeSpinodal(0.01, 1)!;
    expect(spinodal.high).toBeNull();
    expect(spinodal.low).toBeGreaterThan(0);
    for (const q of [0.01, 0.05, 0.1, 0.2, 0.4, 0.5, 1]) {
      for (const polymer of [0.3, 1, 5, 20]) {
        const pair = freeVolumeFluidFluidBinodal(q, polymer);
        if (pair) expect(pair.liquid).toBeLessThan(FCC_CLOSE_PACKING);
        const limits = freeVolumeSpinodal(q, polymer);
        if (limits && limits.high !== null) expect(limits.high).toBeLessThan(FCC_CLOSE_PACKING);
      }
    }
    // Unchanged where the liquid is a liquid (mpmath value of the existing check: q = 0.5, φ_p^R = 1).
    expect(freeVolumeFluidFluidBinodal(0.5, 1)!.liquid).toBeCloseTo(0.514167, 5);
  });

  it('freeVolumeCriticalPoint finds the true minimum at small q and flags one beyond close packing', () => {
    // Derived: reference/derive-check-values.py (mpmath fvt_critical): q = 0.05 → φ = 0.739206985,
    // φ_p^R = 0.221439341568568 (just below φ_cp = 0.7405); q = 0.01 → φ = 0.912671132, φ_p^R = 0.180570077389106.
    const justBelow = freeVolumeCriticalPoint(0.05);
    expect(justBelow.phi).toBeCloseTo(0.739206984509580, 7);
    expectRelative(justBelow.polymerReservoir, 0.221439341568568, 1e-12);
    expect(justBelow.beyondClosePacking).toBe(false);
    const beyond = freeVolumeCriticalPoint(0.01);
    expect(beyond.phi).toBeCloseTo(0.912671132159429, 7);
    expectRelative(beyond.polymerReservoir, 0.180570077389106, 1e-12);
    expect(beyond.beyondClosePacking).toBe(true);
    expect(beyond.stable).toBe(false);
    expect(freeVolumeCriticalPoint(0.5).beyondClosePacking).toBe(false);
  });

  it('freeVolumeCriticalEndpoint is q ≈ 0.3275, near the 1992 paper\'s 0.32', () => {
    // physics.md §4: derived ≈ 0.3275 (mpmath: 0.327544525503449); Lekkerkerker et al. 1992 report
    // about 0.32 (from memory).
    const endpoint = freeVolumeCriticalEndpoint();
    expect(endpoint).toBeCloseTo(0.327544525503449, 8);
    expect(Math.abs(endpoint - 0.32)).toBeLessThan(0.015);
    expect(freeVolumeCriticalPoint(endpoint - 0.005).stable).toBe(false);
    expect(freeVolumeCriticalPoint(endpoint + 0.005).stable).toBe(true);
  });

  it('freeVolumeTriplePoint has gas, liquid and crystal at one pressure and chemical potential', () => {
    const triple = freeVolumeTriplePoint(0.6)!;
    const polymer = triple.polymerReservoir;
    const gas = fluid(triple.gas, 0.6, polymer);
    const liquid = fluid(triple.liquid, 0.6, polymer);
    const crystal = solid(triple.solid, 0.6, polymer);
    expect(Math.abs(gas.pressure - liquid.pressure)).toBeLessThan(1e-9);
    expect(Math.abs(gas.pressure - crystal.pressure)).toBeLessThan(1e-9);
    expect(Math.abs(gas.mu - crystal.mu)).toBeLessThan(1e-9);
    expect(triple.gas).toBeLessThan(triple.liquid);
    expect(triple.liquid).toBeLessThan(triple.solid);
    expect(freeVolumeTriplePoint(0.2)).toBeNull();
  });

  it('systemPolymerFraction and reservoirPolymerFraction convert through α(φ) and invert each other', () => {
    // physics.md §4: φ_p = α(φ)·φ_p^R.
    expectRelative(systemPolymerFraction(0.3, 0.1, 0.5), 0.5 * freeVolumeFraction(0.3, 0.1), 1e-15);
    expectRelative(reservoirPolymerFraction(0.3, 0.1, systemPolymerFraction(0.3, 0.1, 0.5)), 0.5, 1e-14);
  });

  it('the free-volume functions reject φ, q and φ_p^R out of range, NaN and Infinity, naming each', () => {
    for (const bad of BAD_VOLUME_FRACTIONS) expectArgumentError(() => freeVolumeFraction(bad, 0.3), 'phi');
    for (const bad of [0, -0.3, 6, Number.NaN, Number.POSITIVE_INFINITY]) {
      expectArgumentError(() => freeVolumeCriticalPoint(bad), 'q');
      expectArgumentError(() => freeVolumeFluidFluidBinodal(bad, 0.5), 'q');
      expectArgumentError(() => freeVolumeFluidSolidCoexistence(bad, 0.5), 'q');
    }
    expectArgumentError(() => freeVolumeFraction(0.3, 0), 'q');
    expectArgumentError(() => freeVolumeFluidSolidCoexistence(0.3, -0.1), 'polymerReservoir');
    expectArgumentError(() => freeVolumeFluidFluidBinodal(0.3, Number.NaN), 'polymerReservoir');
    expectArgumentError(() => systemPolymerFraction(0.3, 0.1, -1), 'polymerReservoir');
    expectArgumentError(() => reservoirPolymerFraction(0.3, 0.1, Number.POSITIVE_INFINITY), 'systemPolymer');
  });
});
