import { describe, expect, it } from 'vitest';
import { materialCostPerLitre } from './material-cost-per-litre';

describe('materialCostPerLitre', () => {
  it('adds particles, solvent and polymer for one litre of sample (hand calculation)', () => {
    // Derived by hand: φ = 0.2 of particles at 2.0 kg/L → 0.4 kg × 120 = 48; solvent 0.8 L × 0.997 kg/L
    // = 0.7976 kg × 0.01 = 0.007976; polymer 10 g/L × 0.8 L = 8 g → 0.008 kg × 40 = 0.32.
    const cost = materialCostPerLitre(0.2, 10, 'polymer', { particleDensity: 2, solventDensity: 0.997, prices: { particles: 120, solvent: 0.01, polymer: 40 } });
    expect(cost.parts.particles).toBeCloseTo(48, 12);
    expect(cost.parts.solvent).toBeCloseTo(0.007976, 12);
    expect(cost.parts.polymer).toBeCloseTo(0.32, 12);
    expect(cost.total).toBeCloseTo(48.327976, 12);
    expect(cost.unpriced).toEqual([]);
  });

  it('prices salt from mM through its molar mass (hand calculation)', () => {
    // 200 mM NaCl (58.44 g/mol) in 0.75 L of solvent = 0.15 mol = 8.766 g → 0.008766 kg × 0.3 = 0.0026298.
    const cost = materialCostPerLitre(0.25, 200, 'salt', { particleDensity: 2.2, solventDensity: 0.99705, saltMolarMass: 58.44, prices: { particles: 3.2, solvent: 0.002, salt: 0.3 } });
    expect(cost.parts.salt).toBeCloseTo(0.0026298, 12);
    expect(cost.parts.particles).toBeCloseTo(0.25 * 2.2 * 3.2, 12);
  });

  it('counts unpriced materials as zero and names them', () => {
    const cost = materialCostPerLitre(0.1, 5, 'polymer', { particleDensity: 1.05, solventDensity: 1, prices: { particles: 14, solvent: null, polymer: null } });
    expect(cost.total).toBeCloseTo(0.1 * 1.05 * 14, 12);
    expect(cost.unpriced).toEqual(['solvent', 'polymer']);
    const salty = materialCostPerLitre(0.1, 50, 'salt', { particleDensity: 1.05, solventDensity: 1, saltMolarMass: null, prices: { particles: 14, solvent: 0, salt: 1 } });
    expect(salty.unpriced).toEqual(['salt (no molar mass)']);
  });

  it('refuses φ outside [0, 1) and negative doses', () => {
    const inputs = { particleDensity: 1, solventDensity: 1, prices: { particles: 1, solvent: 1 } };
    expect(() => materialCostPerLitre(1, 1, 'polymer', inputs)).toThrow(RangeError);
    expect(() => materialCostPerLitre(0.1, -1, 'polymer', inputs)).toThrow(RangeError);
  });
});
