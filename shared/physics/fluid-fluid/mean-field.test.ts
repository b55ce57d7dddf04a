import { describe, expect, it } from 'vitest';
import { carnahanStarlingCompressibility } from '../hard-spheres/carnahan-starling-compressibility';
import { carnahanStarlingExcessChemicalPotential } from '../hard-spheres/carnahan-starling-excess-chemical-potential';
import { carnahanStarlingInverseCompressibility } from '../hard-spheres/carnahan-starling-inverse-compressibility';
import { meanFieldBinodal } from './mean-field-binodal';
import { meanFieldCriticalPoint } from './mean-field-critical-point';
import { meanFieldSpinodal } from './mean-field-spinodal';
import { expectArgumentError } from '../test-support/expect-relative';

// Independent of the module's internals: the physics.md §3 formulas written out again.
const strength = (b2: number) => 4 * (1 - b2);
const pressure = (phi: number, b2: number) => phi * carnahanStarlingCompressibility(phi) - strength(b2) * phi * phi;
const chemicalPotential = (phi: number, b2: number) => Math.log(phi) + carnahanStarlingExcessChemicalPotential(phi) - 2 * strength(b2) * phi;
const pressureSlope = (phi: number, b2: number) => carnahanStarlingInverseCompressibility(phi) - 2 * strength(b2) * phi;

describe('mean-field CS + B2* fluid–fluid separation', () => {
  it('meanFieldCriticalPoint is φ_c = 0.13044, B2*_c = −1.6503', () => {
    // physics.md §3, derived; mpmath (reference/derive-check-values.py): 0.130443884192454, −1.65030676448070.
    const critical = meanFieldCriticalPoint();
    expect(critical.phi).toBeCloseTo(0.130443884192454, 9);
    expect(critical.b2).toBeCloseTo(-1.6503067644807, 11);
    expect(critical.phi).toBeCloseTo(0.13044, 5);
    expect(critical.b2).toBeCloseTo(-1.6503, 4);
  });

  it('meanFieldBinodal satisfies equal pressure and chemical potential to 1e-9', () => {
    for (const b2 of [-1.66, -1.8, -2, -3, -5, -10, -20]) {
      const pair = meanFieldBinodal(b2);
      expect(pair, `binodal at B2* = ${b2}`).not.toBeNull();
      const { gas, liquid } = pair!;
      expect(Math.abs(pressure(gas, b2) - pressure(liquid, b2))).toBeLessThan(1e-9);
      expect(Math.abs(chemicalPotential(gas, b2) - chemicalPotential(liquid, b2))).toBeLessThan(1e-9);
      expect(liquid - gas).toBeGreaterThan(1e-3);
    }
  });

  it('meanFieldBinodal matches an independent mpmath solution', () => {
    // Derived: reference/derive-check-values.py, mf_binodal.
    const expected: Array<[number, number, number]> = [
      [-2, 0.0402630504314764, 0.258907141190595],
      [-3, 0.00639485094227039, 0.376291124696336],
      [-5, 0.000166084292883990, 0.482767707154569],
    ];
    for (const [b2, gas, liquid] of expected) {
      const pair = meanFieldBinodal(b2)!;
      expect(Math.abs(pair.gas - gas) / gas).toBeLessThan(1e-9);
      expect(Math.abs(pair.liquid - liquid) / liquid).toBeLessThan(1e-9);
    }
  });

  it('meanFieldSpinodal is where dp̃/dφ = 0 and lies inside the binodal', () => {
    for (const b2 of [-1.7, -2, -3, -6, -12]) {
      const spinodal = meanFieldSpinodal(b2)!;
      const binodal = meanFieldBinodal(b2)!;
      expect(Math.abs(pressureSlope(spinodal.low, b2))).toBeLessThan(1e-8);
      expect(Math.abs(pressureSlope(spinodal.high, b2))).toBeLessThan(1e-8);
      expect(binodal.gas).toBeLessThan(spinodal.low);
      expect(spinodal.low).toBeLessThan(spinodal.high);
      expect(spinodal.high).toBeLessThan(binodal.liquid);
    }
    // mpmath spinodal at B2* = −3 (derived): 0.0444206869612878, 0.285445189503349.
    const at3 = meanFieldSpinodal(-3)!;
    expect(at3.low).toBeCloseTo(0.0444206869612878, 12);
    expect(at3.high).toBeCloseTo(0.285445189503349, 12);
  });

  it('meanFieldBinodal and meanFieldSpinodal return null above the critical B2* and close in on φ_c below it', () => {
    const critical = meanFieldCriticalPoint();
    expect(meanFieldBinodal(critical.b2 + 1e-6)).toBeNull();
    expect(meanFieldSpinodal(-1)).toBeNull();
    expect(meanFieldBinodal(1)).toBeNull();
    const near = meanFieldBinodal(critical.b2 - 1e-4)!;
    expect(near.gas).toBeLessThan(critical.phi);
    expect(near.liquid).toBeGreaterThan(critical.phi);
    expect(near.liquid - near.gas).toBeLessThan(0.03);
  });

  it('meanFieldBinodal and meanFieldSpinodal reject B2* below −20, NaN and ±Infinity, naming b2', () => {
    for (const bad of [-20.5, Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      expectArgumentError(() => meanFieldBinodal(bad), 'b2');
      expectArgumentError(() => meanFieldSpinodal(bad), 'b2');
    }
  });
});
