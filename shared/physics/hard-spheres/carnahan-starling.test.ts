import { describe, expect, it } from 'vitest';
import { carnahanStarlingCompressibility } from './carnahan-starling-compressibility';
import { carnahanStarlingExcessChemicalPotential } from './carnahan-starling-excess-chemical-potential';
import { carnahanStarlingExcessFreeEnergy } from './carnahan-starling-excess-free-energy';
import { carnahanStarlingInverseCompressibility } from './carnahan-starling-inverse-compressibility';
import { BAD_VOLUME_FRACTIONS, expectArgumentError, expectRelative } from '../test-support/expect-relative';

describe('Carnahan–Starling hard-sphere fluid', () => {
  it('carnahanStarlingCompressibility, ExcessFreeEnergy and ExcessChemicalPotential give 13, 5 and 17 at φ = 0.5', () => {
    // physics.md §1, derived (exact rational values of the published formulas).
    expect(carnahanStarlingCompressibility(0.5)).toBeCloseTo(13, 12);
    expect(carnahanStarlingExcessFreeEnergy(0.5)).toBeCloseTo(5, 12);
    expect(carnahanStarlingExcessChemicalPotential(0.5)).toBeCloseTo(17, 12);
  });

  it('carnahanStarlingExcessChemicalPotential equals βF_ex/N + Z − 1 at every φ', () => {
    // Thermodynamic identity of physics.md §1 (derived).
    for (const phi of [0.01, 0.1, 0.3, 0.45, 0.6, 0.72]) {
      expectRelative(carnahanStarlingExcessChemicalPotential(phi), carnahanStarlingExcessFreeEnergy(phi) + carnahanStarlingCompressibility(phi) - 1, 1e-13);
    }
  });

  it('carnahanStarlingExcessFreeEnergy is the integral of (Z − 1)/φ (its derivative times φ is Z − 1)', () => {
    for (const phi of [0.05, 0.2, 0.4, 0.55]) {
      const h = 1e-6;
      const slope = (carnahanStarlingExcessFreeEnergy(phi + h) - carnahanStarlingExcessFreeEnergy(phi - h)) / (2 * h);
      expectRelative(phi * slope, carnahanStarlingCompressibility(phi) - 1, 1e-8);
    }
  });

  it('carnahanStarlingInverseCompressibility is d(φZ)/dφ', () => {
    for (const phi of [0.05, 0.2, 0.4, 0.6]) {
      const h = 1e-6;
      const slope = ((phi + h) * carnahanStarlingCompressibility(phi + h) - (phi - h) * carnahanStarlingCompressibility(phi - h)) / (2 * h);
      expectRelative(carnahanStarlingInverseCompressibility(phi), slope, 1e-8);
    }
  });

  it('carnahanStarlingCompressibility expands as 1 + Σ(n² + 3n)φⁿ and its low virial coefficients match the exact ones', () => {
    // Series form: physics.md §1 (derived). Exact coefficients 4, 10, 18.3647684:
    // Clisby & McCoy, J. Stat. Phys. 122, 15 (2006), published. CS gives 4, 10, 18.
    const phi = 1e-3;
    let series = 1;
    for (let n = 1; n <= 12; n++) series += (n * n + 3 * n) * phi ** n;
    expectRelative(carnahanStarlingCompressibility(phi), series, 1e-14);
    // Recover the fourth coefficient numerically from Z itself at small φ.
    const small = 1e-3;
    const third = (carnahanStarlingCompressibility(small) - 1 - 4 * small - 10 * small * small) / small ** 3;
    expect(third).toBeCloseTo(18 + 28 * small, 3);
    expect(Math.abs(third - 18.3647684) / 18.3647684).toBeLessThan(0.02);
  });

  it('carnahanStarlingCompressibility lies within 0.5 % of a simulation-fitted equation of state up to φ = 0.49', () => {
    // Z = 3.9840, 6.9455, 9.4041, 12.1702 at φ = 0.30, 0.40, 0.45, 0.49: derived from A. Schultz's
    // published simulation fit (physics.md §1); tolerance 0.5 % as stated there.
    const fitted: Array<[number, number]> = [[0.3, 3.984], [0.4, 6.9455], [0.45, 9.4041], [0.49, 12.1702]];
    for (const [phi, z] of fitted) expectRelative(carnahanStarlingCompressibility(phi), z, 0.005);
  });

  it('the Carnahan–Starling functions reject φ ≤ 0, φ ≥ close packing, NaN and ±Infinity, naming phi', () => {
    for (const bad of BAD_VOLUME_FRACTIONS) {
      expectArgumentError(() => carnahanStarlingCompressibility(bad), 'phi');
      expectArgumentError(() => carnahanStarlingExcessFreeEnergy(bad), 'phi');
      expectArgumentError(() => carnahanStarlingExcessChemicalPotential(bad), 'phi');
      expectArgumentError(() => carnahanStarlingInverseCompressibility(bad), 'phi');
    }
  });
});
