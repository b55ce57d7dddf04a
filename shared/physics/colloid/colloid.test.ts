import { describe, expect, it } from 'vitest';
import { brownianTime } from './brownian-time';
import { debyeLength } from './debye-length';
import { gravitationalPecletNumber } from './gravitational-peclet-number';
import { BOLTZMANN_CONSTANT } from './physical-constants';
import { polymerOverlapConcentration } from './polymer-overlap-concentration';
import { polymerRadiusOfGyration } from './polymer-radius-of-gyration';
import { stokesEinsteinDiffusion } from './stokes-einstein-diffusion';
import { stokesSettlingSpeed } from './stokes-settling-speed';
import { symmetricSaltIonicStrength } from './symmetric-salt-ionic-strength';
import { volumeFractionFromMassFraction } from './volume-fraction-from-mass-fraction';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';

/** Water viscosity, Pa·s: IAPWS 2008 (Huber et al., J. Phys. Chem. Ref. Data 38, 101 (2009)), published. */
const WATER_VISCOSITY_25C = 0.89002e-3;
const WATER_VISCOSITY_20C = 1.0016e-3;

describe('time, gravity, salt and polymer', () => {
  it('stokesEinsteinDiffusion gives 2.4537e-12 m²/s for a 100 nm radius in water at 25 °C', () => {
    // physics.md §6, derived (mpmath: 2.45367595665898e-12).
    expectRelative(stokesEinsteinDiffusion(298.15, WATER_VISCOSITY_25C, 100e-9), 2.45367595665898e-12, 1e-12);
    // At 20 °C the IAPWS viscosity slows it to T/η scaling (derived).
    expectRelative(stokesEinsteinDiffusion(293.15, WATER_VISCOSITY_20C, 100e-9), 2.45367595665898e-12 * (293.15 / 298.15) * (0.89002 / 1.0016), 1e-12);
  });

  it('brownianTime is a²/D', () => {
    const d = stokesEinsteinDiffusion(298.15, WATER_VISCOSITY_25C, 100e-9);
    expectRelative(brownianTime(100e-9, d), 1e-14 / d, 1e-14);
  });

  it('gravitationalPecletNumber and stokesSettlingSpeed follow their definitions and scale as a⁴ and a²', () => {
    // physics.md §6 (definitions, derived).
    const a = 1e-6;
    expectRelative(gravitationalPecletNumber(a, 1000, 298.15), ((4 * Math.PI) / 3) * a ** 4 * 1000 * 9.80665 / (BOLTZMANN_CONSTANT * 298.15), 1e-14);
    expectRelative(gravitationalPecletNumber(2 * a, 1000, 298.15) / gravitationalPecletNumber(a, 1000, 298.15), 16, 1e-12);
    expectRelative(stokesSettlingSpeed(a, 1000, 1e-3), (2 * a * a * 1000 * 9.80665) / (9 * 1e-3), 1e-14);
    expect(stokesSettlingSpeed(a, -50, 1e-3)).toBeLessThan(0);
  });

  it('debyeLength gives 0.304/√I nm for a 1:1 salt in water at 25 °C', () => {
    // physics.md §6: 0.304 nm at 1 M (derived, ε_r = 78.4; common practice); mpmath 0.304011912660618.
    expectRelative(debyeLength(1) * 1e9, 0.304011912660618, 1e-12);
    expectRelative(debyeLength(0.01) * 1e9, 3.04011912660618, 1e-12);
    expect(debyeLength(1) * 1e9).toBeCloseTo(0.304, 3);
  });

  it('symmetricSaltIonicStrength is c·z²', () => {
    expect(symmetricSaltIonicStrength(0.01, 1)).toBeCloseTo(0.01, 15);
    expect(symmetricSaltIonicStrength(0.01, 2)).toBeCloseTo(0.04, 15);
  });

  it('polymerRadiusOfGyration gives 6.92 nm for 20 kg/mol PEG and polymerOverlapConcentration follows 3M/(4πN_A R_g³)', () => {
    // k = 0.0215 nm, ν = 0.583: Devanand & Selser, Macromolecules 24, 5943 (1991), fit from memory;
    // 6.92 nm per physics.md §6. c* derived with mpmath: 23.9537571264255 g/L.
    const rg = polymerRadiusOfGyration(20000, 0.0215, 0.583);
    expect(rg).toBeCloseTo(6.92, 2);
    expectRelative(polymerOverlapConcentration(20000, rg), 23.9537571264255, 1e-12);
  });

  it('volumeFractionFromMassFraction converts with both densities', () => {
    // Definition (physics.md §6): 20 wt% of ρ = 2 in ρ = 1 gives (0.1)/(0.1 + 0.8) = 1/9.
    expect(volumeFractionFromMassFraction(0.2, 2, 1)).toBeCloseTo(1 / 9, 15);
    expect(volumeFractionFromMassFraction(0.5, 1, 1)).toBeCloseTo(0.5, 15);
  });

  it('the helpers reject out-of-range, NaN and infinite input, naming the argument', () => {
    expectArgumentError(() => stokesEinsteinDiffusion(0, 1e-3, 1e-7), 'temperature');
    expectArgumentError(() => stokesEinsteinDiffusion(298, 0, 1e-7), 'viscosity');
    expectArgumentError(() => stokesEinsteinDiffusion(298, 1e-3, Number.NaN), 'radius');
    expectArgumentError(() => brownianTime(1e-7, 0), 'diffusion');
    expectArgumentError(() => gravitationalPecletNumber(1e-7, Number.POSITIVE_INFINITY, 298), 'densityDifference');
    expectArgumentError(() => debyeLength(0), 'ionicStrength');
    expectArgumentError(() => symmetricSaltIonicStrength(0.1, 1.5), 'valence');
    expectArgumentError(() => polymerRadiusOfGyration(20000, 0.0215, 1.5), 'exponent');
    expectArgumentError(() => polymerOverlapConcentration(-1, 5), 'molarMass');
    expectArgumentError(() => volumeFractionFromMassFraction(1, 2, 1), 'massFraction');
  });
});
