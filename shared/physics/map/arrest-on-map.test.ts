import { describe, expect, it } from 'vitest';
import { deriveRecipeParameters } from '../recipe/derive-recipe-parameters';
import { cachedMap, depletionMap, meanFieldB2Map } from '../test-support/map-builders';
import { classifyPoint } from './classify-point';
import type { StateMap } from './types';

// The glass lines on the map come from mode-coupling theory (shared/physics/arrest, checked
// against Franosch et al. 1997 there); these tests check how the map places and uses them.

const b2 = (value: number) => ({ kind: 'b2' as const, value });
const boundary = (map: StateMap, id: string) => map.boundaries.filter((line) => line.id === id);

/** PEG in water (R_g = 0.0215 nm·M^0.583, physics.md §6) on polystyrene-like particles at 25 °C. */
function pegRecipe(radiusNm: number, molarMassKgMol: number, concentrationGL: number, phi: number) {
  return {
    particle: { radiusNm, densityGcm3: 1.05 },
    solvent: { viscosityMPas: 0.89002, densityGcm3: 0.997 },
    temperatureC: 25,
    fraction: { kind: 'volume' as const, value: phi },
    depletant: { molarMassKgMol, scaling: { prefactorNm: 0.0215, exponent: 0.583 }, concentrationGL },
  };
}

describe('the glass line on a short-range map', () => {
  const map = meanFieldB2Map();

  it('draws a repulsive branch that bulges past the hard-sphere value (re-entrant) and an approximate attractive branch', () => {
    const repulsive = boundary(map, 'repulsive-glass').flatMap((line) => line.points);
    const attractive = boundary(map, 'attractive-glass');
    expect(repulsive[0][0]).toBeCloseTo(0.58, 6); // hard spheres, rescaled onto Pusey & van Megen's 0.58
    expect(Math.max(...repulsive.map((point) => point[0]))).toBeGreaterThan(0.61);
    expect(attractive.length).toBeGreaterThan(0);
    expect(attractive.every((line) => line.approximate)).toBe(true);
    expect(Math.min(...attractive.flatMap((line) => line.points.map((point) => point[0])))).toBeLessThan(0.45);
    expect(map.glassLine).toMatchObject({ kind: 'mct', mapping: 'rescaled', points: 100, cutoff: 40 });
    expect(map.notes.some((note) => note.includes('mode-coupling'))).toBe(true);
    expect(map.notes.join(' ')).not.toContain('placeholder');
  });

  it('melts the glass with weak stickiness and arrests at lower φ with strong attraction', () => {
    expect(classifyPoint(map, { phi: 0.6, attraction: b2(1) }).state).toBe('glass');
    // τ = 1 (B2* = 0.75): the line stands near 0.627 rescaled, so φ = 0.6 is no longer glass.
    expect(classifyPoint(map, { phi: 0.6, attraction: b2(0.75) }).state).not.toBe('glass');
    const attractive = classifyPoint(map, { phi: 0.45, attraction: b2(-4) });
    expect(attractive.state).toBe('glass');
    expect(attractive.reason).toContain('attractive');
    expect(classifyPoint(map, { phi: 0.25, attraction: b2(-4) }).state).toBe('gel');
  });

  it('draws the line as computed on request (hard spheres at MCT\'s 0.5159)', () => {
    const computed = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { glassLine: 'computed' });
    expect(computed.glassLine.scale).toBe(1);
    expect(Math.abs(computed.tables.glass.phi[0] - 0.5159)).toBeLessThan(1.5e-3);
    expect(classifyPoint(computed, { phi: 0.55, attraction: b2(1) }).state).toBe('glass');
    expect(classifyPoint(map, { phi: 0.55, attraction: b2(1) }).state).not.toBe('glass');
  });
});

describe('depletion maps', () => {
  it('place long-range depletion (q > 0.25) by free-volume theory with the hard-sphere glass line only', () => {
    const map = depletionMap(1.35);
    expect(map.glassLine.kind).toBe('hardSphere');
    expect(boundary(map, 'attractive-glass')).toEqual([]);
    expect(map.tables.glass.phi.every((phi) => Math.abs(phi - 0.58) < 1e-9)).toBe(true);
  });

  it('use the B2* fluid–fluid lines for short-range depletion, so the critical point is on the map', () => {
    const map = depletionMap(0.03);
    expect(map.markers.some((marker) => marker.id === 'critical-point')).toBe(true);
    expect(map.glassLine.kind).toBe('mct');
  });
});

describe('realistic depletion recipes', () => {
  it('gel when dilute and strongly attractive at short range (PEG 20 kg/mol on a = 250 nm, q ≈ 0.028; Lu et al. 2008), never glass', () => {
    for (const [phi, concentration] of [[0.2, 8], [0.01, 10], [0.05, 10], [0.1, 10], [0.1, 4]]) {
      const derived = deriveRecipeParameters(pegRecipe(250, 20, concentration, phi));
      expect(derived.sizeRatio!).toBeLessThan(0.03);
      expect(derived.contactEnergyKT!).toBeGreaterThan(10);
      expect(derived.predictedState, `φ = ${phi}, ${concentration} g/L`).toBe('gel');
    }
  });

  it('are not called attractive glass at long range (q ≈ 1.35, 1–3 kT at contact): free-volume theory places them', () => {
    for (const [phi, concentration] of [[0.05, 0.3], [0.1, 0.3], [0.05, 1]]) {
      const derived = deriveRecipeParameters(pegRecipe(50, 1000, concentration, phi));
      expect(derived.sizeRatio!).toBeGreaterThan(1);
      expect(derived.predictedState).not.toBe('glass');
    }
  });

  it('stay on free-volume lines far above the default top (q ≈ 1.35, 37 kT at φ = 0.2): a gel, not an extrapolated fluid', () => {
    const derived = deriveRecipeParameters(pegRecipe(50, 1000, 0.3, 0.2));
    expect(derived.contactEnergyKT!).toBeGreaterThan(30);
    expect(derived.predictedState).toBe('gel');
  });
});
