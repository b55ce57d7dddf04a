import { describe, expect, it } from 'vitest';
import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { freeVolumeFraction } from '../depletion/free-volume-fraction';
import { allNumbers } from '../test-support/map-builders';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { deriveRecipeParameters } from './derive-recipe-parameters';
import type { PhysicsRecipeInput } from './recipe-types';

/** A 100 nm polystyrene-like particle in water at 25 °C (IAPWS viscosity 0.89002 mPa·s). */
function buildRecipe(overrides: Partial<PhysicsRecipeInput> = {}): PhysicsRecipeInput {
  return {
    particle: { radiusNm: 100, densityGcm3: 1.05, polydispersityPct: 5, surfacePotentialMv: -25, hamakerJ: 1e-20 },
    solvent: { viscosityMPas: 0.89002, densityGcm3: 0.997 },
    temperatureC: 25,
    fraction: { kind: 'volume', value: 0.2 },
    ...overrides,
  };
}

describe('deriveRecipeParameters', () => {
  it('derives the depletion parameters from PEG concentration: q, c*, φ_p, φ_p^R, U/kT, B2*, τ', () => {
    const derived = deriveRecipeParameters(buildRecipe({
      depletant: { molarMassKgMol: 20, scaling: { prefactorNm: 0.0215, exponent: 0.583 }, concentrationGL: 3 },
    }));
    // R_g = 6.9173 nm (physics.md §6, Devanand & Selser fit from memory), c* = 23.9538 g/L (derived).
    expectRelative(derived.radiusOfGyrationNm!, 6.91733720962861, 1e-12);
    expectRelative(derived.overlapConcentrationGL!, 23.9537571264255, 1e-12);
    expectRelative(derived.sizeRatio!, 0.0691733720962861, 1e-12);
    expectRelative(derived.polymerSystem!, 3 / 23.9537571264255, 1e-12);
    expectRelative(derived.polymerReservoir!, derived.polymerSystem! / freeVolumeFraction(0.2, derived.sizeRatio!), 1e-13);
    expectRelative(derived.contactEnergyKT!, derived.polymerReservoir! * (1 + 3 / (2 * derived.sizeRatio!)), 1e-13);
    expectRelative(derived.reducedB2!, asakuraOosawaReducedB2(derived.sizeRatio!, derived.polymerReservoir!), 1e-13);
    expectRelative(derived.stickiness!, 1 / (4 * (1 - derived.reducedB2!)), 1e-13);
    expect(derived.rangeSigma).toBe(derived.sizeRatio);
    expect(derived.mapModel).toEqual({ kind: 'depletion', q: derived.sizeRatio });
    expect(derived.mapY).toBe(derived.polymerReservoir);
    expect(derived.attractionSource).toBe('depletion');
  });

  it('scales a per-solvent concentration by (1 − φ)', () => {
    const sample = deriveRecipeParameters(buildRecipe({ depletant: { molarMassKgMol: 20, radiusOfGyrationNm: 7, concentrationGL: 4 } }));
    const solvent = deriveRecipeParameters(buildRecipe({ depletant: { molarMassKgMol: 20, radiusOfGyrationNm: 7, concentrationGL: 4, concentrationBasis: 'solvent' } }));
    expectRelative(solvent.polymerSystem!, sample.polymerSystem! * 0.8, 1e-13);
  });

  it('derives transport: Stokes–Einstein D, Brownian time, Péclet number and settling speed', () => {
    const derived = deriveRecipeParameters(buildRecipe());
    // physics.md §6: D = 2.4537e-12 m²/s for a = 100 nm in water at 25 °C (derived).
    expectRelative(derived.diffusionM2PerS, 2.45367595665898e-12, 1e-12);
    expectRelative(derived.brownianTimeS, (100e-9) ** 2 / derived.diffusionM2PerS, 1e-13);
    expectRelative(derived.gravitationalPeclet, ((4 * Math.PI) / 3) * (100e-9) ** 4 * 53 * 9.80665 / (1.380649e-23 * 298.15), 1e-10);
    expectRelative(derived.settlingSpeedMPerS, (2 * (100e-9) ** 2 * 53 * 9.80665) / (9 * 0.89002e-3), 1e-10);
  });

  it('uses DLVO for salt with the closest approach stated, and reports the Debye length', () => {
    const derived = deriveRecipeParameters(buildRecipe({ salt: { concentrationMM: 100, valence: 1 } }));
    expect(derived.attractionSource).toBe('salt');
    expectRelative(derived.debyeLengthNm!, 0.304011912660618 / Math.sqrt(0.1), 1e-12);
    expect(derived.closestApproachNm).toBe(0.4);
    expect(derived.warnings.some((warning) => warning.includes('0.4 nm'))).toBe(true);
    // Derived with mpmath (reference/derive-check-values.py, dlvo_check): contact −14.9767 kT.
    expectRelative(derived.contactEnergyKT!, 14.97668191652228, 1e-12);
    expect(derived.mapModel).toMatchObject({ kind: 'generic', axis: 'b2' });
    expect(derived.reducedB2!).toBeLessThan(-100);
  });

  it('places a direct U/kT and range on the square-well map of that range', () => {
    const derived = deriveRecipeParameters(buildRecipe({ direct: { contactEnergyKT: 3, range: 0.1 } }));
    expect(derived.mapModel).toEqual({ kind: 'generic', theory: 'meanField', axis: 'squareWellDepth', lambda: 1.1 });
    expect(derived.mapY).toBeCloseTo(3, 12);
    expectRelative(derived.reducedB2!, 1 - (1.1 ** 3 - 1) * Math.expm1(3), 1e-13);
  });

  it('converts a mass fraction to φ and treats a recipe without attraction as hard spheres', () => {
    const derived = deriveRecipeParameters(buildRecipe({ fraction: { kind: 'mass', value: 0.3 } }));
    expectRelative(derived.phi, (0.3 / 1.05) / (0.3 / 1.05 + 0.7 / 0.997), 1e-14);
    expect(derived.reducedB2).toBe(1);
    expect(derived.stickiness).toBeNull();
    expect(derived.predictedState).toBe('fluid');
    expect(derived.warnings.some((warning) => warning.includes('hard spheres'))).toBe(true);
  });

  it('reports no real root of the Percus–Yevick quadratic as a warning, never as NaN', () => {
    const derived = deriveRecipeParameters(buildRecipe({ fraction: { kind: 'volume', value: 0.1 }, theory: 'baxterPY', direct: { contactEnergyKT: 2.3, range: 0.1 } }));
    expect(derived.stickiness!).toBeLessThan(0.097);
    expect(derived.warnings.some((warning) => warning.includes('no real root'))).toBe(true);
    expect(allNumbers(derived).every(Number.isFinite)).toBe(true);
  });

  it('returns only finite numbers and the model version for every kind of recipe', () => {
    const recipes = [
      buildRecipe(),
      buildRecipe({ salt: { concentrationMM: 10, valence: 2 } }),
      buildRecipe({ depletant: { molarMassKgMol: 100, radiusOfGyrationNm: 15, concentrationGL: 8 } }),
      buildRecipe({ direct: { contactEnergyKT: 6, range: 0.05 } }),
    ];
    for (const recipe of recipes) {
      const derived = deriveRecipeParameters(recipe);
      expect(derived.modelVersion).toBe('gw-physics-2');
      expect(allNumbers(derived).every(Number.isFinite)).toBe(true);
      expect(['fluid', 'gel', 'glass', 'crystal', 'separated']).toContain(derived.predictedState);
      expect(derived.reason.length).toBeGreaterThan(10);
    }
  });

  it('gives dense depletion recipes a state or an error naming the particle fraction, never a bare pair-energy error', () => {
    // 30 nm particles with PEG 100 kg/mol (R_g from the PEG fit, q ≈ 0.59), per-solvent 1 and 5 g/L:
    // the free volume runs out as φ rises, so φ_p^R = φ_p/α(φ) and the contact attraction grow without bound.
    const outcomes: string[] = [];
    for (const concentrationGL of [1, 5]) {
      for (const phi of [0.4, 0.45, 0.5, 0.55, 0.6, 0.65]) {
        const recipe = buildRecipe({
          particle: { radiusNm: 30, densityGcm3: 1.05 }, fraction: { kind: 'volume', value: phi },
          depletant: { molarMassKgMol: 100, scaling: { prefactorNm: 0.0215, exponent: 0.583 }, concentrationGL: concentrationGL, concentrationBasis: 'solvent' },
        });
        try {
          const derived = deriveRecipeParameters(recipe);
          expect(allNumbers(derived).every(Number.isFinite)).toBe(true);
          expect(derived.contactEnergyKT!).toBeLessThanOrEqual(600);
          outcomes.push('state');
        } catch (error) {
          expect(error).toBeInstanceOf(PhysicsArgumentError);
          expect((error as PhysicsArgumentError).argument).toBe('fraction.value');
          expect((error as Error).message).toMatch(/^Particle fraction too high for this polymer: .*Use a particle fraction below φ = 0\.\d+/);
          outcomes.push('fraction');
        }
      }
    }
    expect(outcomes.slice(0, 3)).toEqual(['state', 'state', 'state']);
    expect(outcomes.slice(3, 6)).toEqual(['fraction', 'fraction', 'fraction']);
  });

  it('names the particle fraction, not an infinite φ_p^R, where the free volume underflows (q ≈ 6.7)', () => {
    const recipe = buildRecipe({
      particle: { radiusNm: 3, densityGcm3: 1.05 }, fraction: { kind: 'volume', value: 0.5 },
      depletant: { molarMassKgMol: 100, radiusOfGyrationNm: 20, concentrationGL: 1 },
    });
    expect(() => deriveRecipeParameters(recipe)).toThrow(/^Particle fraction too high for this polymer/);
    const withoutPolymer = deriveRecipeParameters({ ...recipe, depletant: { ...recipe.depletant!, concentrationGL: 0 } });
    expect(withoutPolymer.polymerReservoir).toBe(0);
    expect(allNumbers(withoutPolymer).every(Number.isFinite)).toBe(true);
  });

  it('screens a 2 M 3:3 salt (ionic strength 18 mol/L) as at 10 mol/L, with a warning, instead of failing', () => {
    const derived = deriveRecipeParameters(buildRecipe({ salt: { concentrationMM: 2000, valence: 3 } }));
    // κ⁻¹ = 0.304 nm/√(I/M) at 25 °C (physics.md §6, derived), taken at the 10 mol/L cap.
    expectRelative(derived.debyeLengthNm!, 0.304011912660618 / Math.sqrt(10), 1e-12);
    expect(derived.warnings.some((warning) => warning.includes('Ionic strength 18 mol/L'))).toBe(true);
    expect(allNumbers(derived).every(Number.isFinite)).toBe(true);
  });

  it('rejects missing or out-of-range input, naming the field', () => {
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ particle: { radiusNm: 0, densityGcm3: 1 } })), 'particle.radiusNm');
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ fraction: { kind: 'weight' as 'mass', value: 0.2 } })), 'fraction.kind');
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ fraction: { kind: 'volume', value: 0.9 } })), 'fraction.value');
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ fraction: { kind: 'mass', value: 0.99 } })), 'fraction.value (as φ)');
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ temperatureC: Number.NaN })), 'temperatureC');
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ depletant: { molarMassKgMol: 20, concentrationGL: 3 } })), 'depletant.radiusOfGyrationNm');
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ particle: { radiusNm: 100, densityGcm3: 1.05 }, salt: { concentrationMM: 50, valence: 1 } })), 'particle.surfacePotentialMv');
    expectArgumentError(() => deriveRecipeParameters(buildRecipe({ direct: { contactEnergyKT: -1, range: 0.1 } })), 'direct.contactEnergyKT');
  });
});
