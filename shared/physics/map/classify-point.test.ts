import { describe, expect, it } from 'vitest';
import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { meanFieldBinodal } from '../fluid-fluid/mean-field-binodal';
import { meanFieldSpinodal } from '../fluid-fluid/mean-field-spinodal';
import { hardSphereFluidSolidCoexistence } from '../hard-spheres/hard-sphere-fluid-solid-coexistence';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { classifyPoint } from './classify-point';
import { signedBoundaryDistance } from './signed-boundary-distance';
import { causeOnRow, decideCause, ruleRowAt } from './state-rule';
import { cachedMap, depletionMap, meanFieldB2Map } from '../test-support/map-builders';
import { expectArgumentError } from '../test-support/expect-relative';
import type { AttractionInput } from './types';

const b2 = (value: number): AttractionInput => ({ kind: 'b2', value });

/** Distance in normalised map units from (φ, B2*) to the nearest point of a drawn boundary id. */
function bruteForceDistance(id: string, phi: number, value: number): number {
  const map = meanFieldB2Map();
  const span = map.y.strongest - map.y.weakest;
  const x = phi / FCC_CLOSE_PACKING;
  const u = (value - map.y.weakest) / span;
  let best = Infinity;
  for (const piece of map.boundaries.filter((boundary) => boundary.id === id)) {
    for (let i = 0; i + 1 < piece.points.length; i++) {
      const [ax, au] = [piece.points[i][0] / FCC_CLOSE_PACKING, (piece.points[i][1] - map.y.weakest) / span];
      const [bx, bu] = [piece.points[i + 1][0] / FCC_CLOSE_PACKING, (piece.points[i + 1][1] - map.y.weakest) / span];
      const length2 = (bx - ax) ** 2 + (bu - au) ** 2;
      const t = Math.min(1, Math.max(0, ((x - ax) * (bx - ax) + (u - au) * (bu - au)) / length2));
      best = Math.min(best, Math.hypot(x - ax - t * (bx - ax), u - au - t * (bu - au)));
    }
  }
  return best;
}

describe('classifyPoint', () => {
  const map = meanFieldB2Map();

  it('predicts gel inside the spinodal computed by meanFieldSpinodal', () => {
    const spinodal = meanFieldSpinodal(-4)!;
    const result = classifyPoint(map, { phi: 0.5 * (spinodal.low + spinodal.high), attraction: b2(-4) });
    expect(result.state).toBe('gel');
    expect(result.reason).toContain('spinodal');
  });

  it('gels everywhere inside the binodal by default (Lu et al. 2008), and separates between binodal and spinodal above a calibrated threshold', () => {
    const moderate = -2.5;
    const binodal = meanFieldBinodal(moderate)!;
    const spinodal = meanFieldSpinodal(moderate)!;
    const phi = 0.5 * (binodal.gas + spinodal.low);
    expect(classifyPoint(map, { phi, attraction: b2(moderate) }).state).toBe('gel');
    expect(classifyPoint(map, { phi, attraction: b2(moderate) }).reason).toContain('binodal');
    // A calibration that lowers the threshold below the point: slow nucleated separation.
    expect(classifyPoint(map, { phi, attraction: b2(moderate) }, { gelB2Threshold: -3 }).state).toBe('separated');
    const strong = -5;
    const strongBinodal = meanFieldBinodal(strong)!;
    const strongSpinodal = meanFieldSpinodal(strong)!;
    expect(classifyPoint(map, { phi: 0.5 * (strongBinodal.gas + strongSpinodal.low), attraction: b2(strong) }, { gelB2Threshold: -3 }).state).toBe('gel');
  });

  it('predicts fluid below freezing, crystal in coexistence and above melting, glass at φ ≥ 0.58', () => {
    const { freezing, melting } = hardSphereFluidSolidCoexistence();
    expect(classifyPoint(map, { phi: freezing - 0.01, attraction: b2(1) }).state).toBe('fluid');
    expect(classifyPoint(map, { phi: 0.5 * (freezing + melting), attraction: b2(1) }).state).toBe('crystal');
    expect(classifyPoint(map, { phi: 0.5 * (melting + 0.58), attraction: b2(1) }).state).toBe('crystal');
    const glass = classifyPoint(map, { phi: 0.6, attraction: b2(1) });
    expect(glass.state).toBe('glass');
    expect(glass.reason).toContain('repulsive');
    const attractive = classifyPoint(map, { phi: 0.62, attraction: b2(-8) });
    expect(attractive.state).toBe('glass');
    expect(attractive.reason).toContain('attractive');
  });

  it('classifies as fluid in the crystal region when polydispersity suppresses crystallisation', () => {
    const polydisperse = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { polydispersity: 15 });
    const result = classifyPoint(polydisperse, { phi: 0.52, attraction: b2(1) });
    expect(result.state).toBe('fluid');
    expect(result.reason).toContain('polydispersity');
  });

  it('gives as margin the distance to the nearest state-changing boundary, with Δφ and Δy', () => {
    // A separated point close to the binodal's gas branch: nearest is the binodal.
    const value = -2.5;
    const gas = meanFieldBinodal(value)!.gas;
    const phi = gas + 0.004;
    const result = classifyPoint(map, { phi, attraction: b2(value) });
    expect(result.nearestBoundary.id).toBe('binodal');
    // Brute force over the drawn polylines (index simplified to within 1e-4).
    expect(Math.abs(result.margin - bruteForceDistance('binodal', phi, value))).toBeLessThan(1.5e-4);
    expect(result.margin).toBeLessThan(0.004 / FCC_CLOSE_PACKING + 1e-4);
    expect(result.marginDescription).toMatch(/Δφ = -0\.00/);
    expect(result.marginDescription).toContain('ΔB2*');
    // The margin shrinks as the point approaches the boundary.
    const closer = classifyPoint(map, { phi: gas + 0.001, attraction: b2(value) });
    expect(closer.margin).toBeLessThan(result.margin);
  });

  it('skips boundaries that do not change the state (percolation) when choosing the nearest', () => {
    // On the percolation line in the fluid: percolation is drawn but is not the margin.
    const phi = 0.05;
    const tau = (19 * phi * phi - 2 * phi + 1) / (12 * (1 - phi) ** 2);
    const onLine = 1 - 1 / (4 * tau);
    const result = classifyPoint(map, { phi, attraction: b2(onLine + 0.3) });
    expect(result.nearestBoundary.id).not.toBe('percolation');
    expect(Math.abs(signedBoundaryDistance(map, { phi, attraction: b2(onLine) }, 'percolation')!)).toBeLessThan(1e-3);
  });

  it('uses the map tables exactly like the full rule (lazy lookups change nothing)', () => {
    for (let i = 0; i < 500; i++) {
      const phi = 0.001 + 0.735 * ((i * 0.618034) % 1);
      const u = (i * 0.754877) % 1;
      const value = map.y.weakest + u * (map.y.strongest - map.y.weakest);
      const full = causeOnRow(ruleRowAt(map.tables, u, value), map.parameters, false, phi);
      expect(decideCause(map.tables, map.parameters, false, phi, u, value)).toBe(full);
    }
  });

  it('gives the same answer after a JSON round trip of the map', () => {
    const copy = JSON.parse(JSON.stringify(map));
    for (const [phi, value] of [[0.2, -4], [0.05, -2.5], [0.52, 1], [0.6, -8]]) {
      expect(classifyPoint(copy, { phi, attraction: b2(value) }).toJSON()).toEqual(classifyPoint(map, { phi, attraction: b2(value) }).toJSON());
    }
  });

  it('treats every attraction description through its B2*', () => {
    const tau = classifyPoint(map, { phi: 0.2, attraction: { kind: 'tau', value: 0.05 } });
    const same = classifyPoint(map, { phi: 0.2, attraction: b2(1 - 1 / (4 * 0.05)) });
    expect(tau.toJSON()).toEqual(same.toJSON());
    // On a depletion map, polymer at the map's q and the same B2* given directly land together.
    const depletion = depletionMap(0.3);
    for (const polymer of [0.1, 0.35, 0.5, 0.7]) {
      const direct = classifyPoint(depletion, { phi: 0.2, attraction: { kind: 'depletion', q: 0.3, polymerReservoir: polymer } });
      const viaB2 = classifyPoint(depletion, { phi: 0.2, attraction: b2(asakuraOosawaReducedB2(0.3, polymer)) });
      expect(viaB2.state).toBe(direct.state);
      expect(viaB2.margin).toBeCloseTo(direct.margin, 6);
    }
  });

  it('applies an attraction shift like a map built with that shift', () => {
    const shifted = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { parameters: { attractionShift: 1 } });
    for (const [phi, value] of [[0.1, -1.2], [0.3, -2], [0.05, -1.5], [0.45, -0.5]]) {
      const onShifted = classifyPoint(shifted, { phi, attraction: b2(value) });
      const overridden = classifyPoint(map, { phi, attraction: b2(value) }, { attractionShift: 1 });
      const moved = classifyPoint(map, { phi, attraction: b2(value - 1) });
      expect(onShifted.state).toBe(moved.state);
      expect(overridden.state).toBe(moved.state);
      expect(onShifted.margin).toBeCloseTo(moved.margin, 3);
    }
  });

  it('returns an object whose toJSON carries all five fields as plain data', () => {
    const plain = classifyPoint(map, { phi: 0.2, attraction: b2(-4) }).toJSON();
    expect(Object.keys(plain).sort()).toEqual(['margin', 'marginDescription', 'nearestBoundary', 'reason', 'state']);
    expect(JSON.parse(JSON.stringify(classifyPoint(map, { phi: 0.2, attraction: b2(-4) })))).toEqual(plain);
  });

  it('rejects bad φ, attractions, parameters and maps, naming the argument', () => {
    for (const bad of [0, -0.1, FCC_CLOSE_PACKING, Number.NaN, Number.POSITIVE_INFINITY]) {
      expectArgumentError(() => classifyPoint(map, { phi: bad, attraction: b2(-2) }), 'phi');
    }
    expectArgumentError(() => classifyPoint(map, { phi: 0.2, attraction: { kind: 'tau', value: 0 } }), 'tau');
    expectArgumentError(() => classifyPoint(map, { phi: 0.2, attraction: b2(Number.NaN) }), 'b2');
    expectArgumentError(() => classifyPoint(map, { phi: 0.2, attraction: { kind: 'other' } as unknown as AttractionInput }), 'attraction.kind');
    expectArgumentError(() => classifyPoint(map, { phi: 0.2, attraction: b2(-2) }, { glassPhi: 2 }), 'parameters.glassPhi');
    expectArgumentError(() => classifyPoint({} as never, { phi: 0.2, attraction: b2(-2) }), 'map');
  });
});

describe('signedBoundaryDistance', () => {
  const map = meanFieldB2Map();

  it('is positive inside the binodal and spinodal, negative outside', () => {
    expect(signedBoundaryDistance(map, { phi: 0.2, attraction: b2(-4) }, 'binodal')!).toBeGreaterThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.2, attraction: b2(-4) }, 'spinodal')!).toBeGreaterThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.2, attraction: b2(0) }, 'binodal')!).toBeLessThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.6, attraction: b2(-3) }, 'binodal')!).toBeLessThan(0);
  });

  it('is positive at higher φ for freezing and the repulsive glass, above the line for percolation', () => {
    expect(signedBoundaryDistance(map, { phi: 0.52, attraction: b2(1) }, 'freezing')!).toBeGreaterThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.45, attraction: b2(1) }, 'freezing')!).toBeLessThan(0);
    // Weak stickiness (B2* = 0.95, τ = 5) keeps the repulsive branch of the glass line (≈ 0.60 rescaled).
    expect(signedBoundaryDistance(map, { phi: 0.66, attraction: b2(0.95) }, 'repulsive-glass')!).toBeGreaterThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.5, attraction: b2(0.95) }, 'repulsive-glass')!).toBeLessThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.5, attraction: b2(-4) }, 'attractive-glass')!).toBeGreaterThan(0);
    // τ_p(0.3) = 0.359 (B2* = 0.30): B2* = 0 is stickier, above the line.
    expect(signedBoundaryDistance(map, { phi: 0.3, attraction: b2(0) }, 'percolation')!).toBeGreaterThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.3, attraction: b2(0.5) }, 'percolation')!).toBeLessThan(0);
    expect(signedBoundaryDistance(map, { phi: 0.05, attraction: b2(0.5) }, 'percolation')!).toBeLessThan(0);
  });

  it('changes sign smoothly across the binodal (a logistic fit needs a continuous covariate)', () => {
    const gas = meanFieldBinodal(-3)!.gas;
    const inside = signedBoundaryDistance(map, { phi: gas + 1e-3, attraction: b2(-3) }, 'binodal')!;
    const outside = signedBoundaryDistance(map, { phi: gas - 1e-3, attraction: b2(-3) }, 'binodal')!;
    expect(inside).toBeGreaterThan(0);
    expect(outside).toBeLessThan(0);
    expect(inside - outside).toBeLessThan(3e-3);
  });

  it('rejects unknown boundary ids and returns null for a boundary the map does not draw', () => {
    expectArgumentError(() => signedBoundaryDistance(map, { phi: 0.2, attraction: b2(-2) }, 'other' as never), 'boundaryId');
    const noGel = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { parameters: { gelB2Threshold: -1 } });
    expect(signedBoundaryDistance(noGel, { phi: 0.2, attraction: b2(-2) }, 'gel')).toBeNull();
  });
});
