import { describe, expect, it } from 'vitest';
import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { squareWellReducedB2 } from '../attraction/square-well-reduced-b2';
import { freeVolumeCriticalPoint } from '../depletion/free-volume-critical-point';
import { freeVolumeFluidFluidBinodal } from '../depletion/free-volume-fluid-fluid-binodal';
import { freeVolumeFluidSolidCoexistence } from '../depletion/free-volume-fluid-solid-coexistence';
import { baxterPYBinodal } from '../fluid-fluid/baxter-py-binodal';
import { baxterPYCriticalPoint } from '../fluid-fluid/baxter-py-critical-point';
import { baxterPYNoSolutionBand } from '../fluid-fluid/baxter-py-no-solution-band';
import { meanFieldBinodal } from '../fluid-fluid/mean-field-binodal';
import { meanFieldCriticalPoint } from '../fluid-fluid/mean-field-critical-point';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { hardSphereFluidSolidCoexistence } from '../hard-spheres/hard-sphere-fluid-solid-coexistence';
import { buildStateMap } from './build-state-map';
import { classifyPoint } from './classify-point';
import { domeAt } from './state-rule';
import { allNumbers, baxterB2Map, cachedMap, depletionMap, meanFieldB2Map } from '../test-support/map-builders';
import { expectArgumentError } from '../test-support/expect-relative';
import type { StateMap } from './types';

const pieces = (map: StateMap, id: string) => map.boundaries.filter((boundary) => boundary.id === id);

describe('buildStateMap', () => {
  it('returns a plain JSON-serialisable map with only finite numbers', () => {
    for (const map of [meanFieldB2Map(), baxterB2Map(), depletionMap(0.1), depletionMap(0.6)]) {
      const copy = JSON.parse(JSON.stringify(map));
      expect(copy).toEqual(map);
      const numbers = allNumbers(map);
      expect(numbers.length).toBeGreaterThan(1000);
      expect(numbers.every(Number.isFinite)).toBe(true);
      expect(map.modelVersion).toBe('gw-physics-2');
    }
  });

  it('orients every y axis so that attraction grows upward (B2* inverted, the others not)', () => {
    const b2 = meanFieldB2Map().y;
    expect([b2.weakest, b2.strongest, b2.inverted]).toEqual([1, -10, true]);
    expect(b2.domain).toEqual([-10, 1]);
    const inverse = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'inverseTau' }).y;
    expect([inverse.weakest, inverse.strongest, inverse.inverted]).toEqual([0, 44, false]);
    const well = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'squareWellDepth', lambda: 1.1 }).y;
    expect(well.weakest).toBe(0);
    expect(squareWellReducedB2(well.strongest, 1.1)).toBeCloseTo(-10, 10);
    const polymer = depletionMap(0.3).y;
    expect(polymer.weakest).toBe(0);
    expect(asakuraOosawaReducedB2(0.3, polymer.strongest)).toBeCloseTo(-10, 9);
    expect(meanFieldB2Map().x.domain).toEqual([0, FCC_CLOSE_PACKING]);
  });

  it('marks the theory\'s critical point and the simulated sticky-sphere critical point in map units', () => {
    const meanField = meanFieldB2Map().markers;
    const critical = meanFieldCriticalPoint();
    expect(meanField.find((m) => m.id === 'critical-point')).toMatchObject({ x: critical.phi, y: critical.b2 });
    // Miller & Frenkel, PRL 90, 135702 (2003), from memory: τ_c = 0.1133, φ_c ≈ 0.266.
    const simulation = meanField.find((m) => m.id === 'simulation-critical-point')!;
    expect(simulation.x).toBe(0.266);
    expect(simulation.y).toBeCloseTo(1 - 1 / (4 * 0.1133), 12);
    const inverse = cachedMap({ kind: 'generic', theory: 'baxterPY', axis: 'inverseTau' }).markers;
    expect(inverse.find((m) => m.id === 'critical-point')!.y).toBeCloseTo(1 / baxterPYCriticalPoint().tau, 9);
    expect(inverse.find((m) => m.id === 'simulation-critical-point')!.y).toBeCloseTo(1 / 0.1133, 9);
    const fvt = depletionMap(0.6).markers.find((m) => m.id === 'critical-point')!;
    expect(fvt.y).toBeCloseTo(freeVolumeCriticalPoint(0.6).polymerReservoir, 12);
  });

  it('draws the mean-field binodal through the points meanFieldBinodal computes', () => {
    const map = meanFieldB2Map();
    const points = pieces(map, 'binodal').flatMap((piece) => piece.points);
    const critical = meanFieldCriticalPoint();
    let checked = 0;
    for (const [phi, b2] of points.filter((_, i) => i % 17 === 0)) {
      if (b2 > critical.b2 - 1e-3) continue;
      const pair = meanFieldBinodal(b2)!;
      expect(Math.min(Math.abs(pair.gas - phi), Math.abs(pair.liquid - phi))).toBeLessThan(1e-9);
      checked++;
    }
    expect(checked).toBeGreaterThan(8);
  });

  it('draws the free-volume binodal and freezing line through the points the standalone functions compute', () => {
    const q = 0.6;
    const map = depletionMap(q);
    for (const [phi, polymer] of pieces(map, 'binodal').flatMap((piece) => piece.points).filter((_, i) => i % 23 === 5)) {
      const pair = freeVolumeFluidFluidBinodal(q, polymer)!;
      expect(Math.min(Math.abs(pair.gas - phi), Math.abs(pair.liquid - phi))).toBeLessThan(1e-8);
    }
    for (const [phi, polymer] of pieces(map, 'freezing').flatMap((piece) => piece.points).filter((_, i) => i % 29 === 3)) {
      expect(Math.abs(freeVolumeFluidSolidCoexistence(q, polymer).fluid - phi)).toBeLessThan(1e-8);
    }
    // At zero attraction the crystal lines start at hard-sphere freezing and melting.
    const hardSphere = hardSphereFluidSolidCoexistence();
    expect(pieces(map, 'freezing')[0].points[0][0]).toBeCloseTo(hardSphere.freezing, 10);
    expect(pieces(map, 'melting')[0].points[0][0]).toBeCloseTo(hardSphere.melting, 10);
  });

  it('keeps every spinodal inside its binodal', () => {
    for (const map of [meanFieldB2Map(), baxterB2Map(), depletionMap(0.1), depletionMap(0.6)]) {
      const { binodal, spinodal } = map.tables;
      for (let u = spinodal!.bottom + 1e-6; u <= Math.min(1, binodal!.left.u[binodal!.left.u.length - 1]); u += 0.01) {
        const b = domeAt(binodal, u)!;
        const s = domeAt(spinodal, u)!;
        expect(b[0]).toBeLessThanOrEqual(s[0] + 1e-12);
        expect(s[1]).toBeLessThanOrEqual(b[1] + 1e-12);
      }
    }
  });

  it('uses the Percus–Yevick binodal and the no-solution band edge for the baxterPY theory', () => {
    const map = baxterB2Map();
    const tau = 0.07;
    const b2 = 1 - 1 / (4 * tau);
    const u = (b2 - map.y.weakest) / (map.y.strongest - map.y.weakest);
    const pair = baxterPYBinodal(tau)!;
    const band = baxterPYNoSolutionBand(tau)!;
    expect(domeAt(map.tables.binodal, u)![0]).toBeCloseTo(pair.gas, 4);
    expect(domeAt(map.tables.binodal, u)![1]).toBeCloseTo(pair.liquid, 4);
    expect(domeAt(map.tables.spinodal, u)![0]).toBeCloseTo(band.low, 4);
    expect(map.notes.some((note) => note.includes('no solution'))).toBe(true);
  });

  it('flags the gas–liquid branches metastable below the critical endpoint and above the triple point', () => {
    // q = 0.3 < q_cep (and above the short-range limit, so free-volume lines): every binodal piece
    // is metastable (physics.md §4: draw it dashed).
    expect(pieces(depletionMap(0.3), 'binodal').every((piece) => piece.metastable)).toBe(true);
    // q = 0.6 > q_cep, the triple point lies above this map's top: all stable.
    expect(pieces(depletionMap(0.6), 'binodal').every((piece) => !piece.metastable)).toBe(true);
    // Mean field: stable near the critical point, metastable above the triple point.
    const meanField = meanFieldB2Map();
    const triple = meanField.markers.find((marker) => marker.id === 'triple-point')!;
    expect(triple).toBeDefined();
    for (const piece of pieces(meanField, 'binodal')) {
      const middle = piece.points[Math.floor(piece.points.length / 2)];
      expect(piece.metastable).toBe(middle[1] < triple.y);
    }
  });

  it('moves every theory boundary by the attraction shift (B2* axis: by exactly the shift)', () => {
    const plain = meanFieldB2Map();
    const shifted = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { parameters: { attractionShift: 0.5 } });
    const plainCritical = plain.markers.find((m) => m.id === 'critical-point')!;
    const shiftedCritical = shifted.markers.find((m) => m.id === 'critical-point')!;
    expect(shiftedCritical.x).toBeCloseTo(plainCritical.x, 14);
    expect(shiftedCritical.y).toBeCloseTo(plainCritical.y + 0.5, 12);
    const plainSpinodal = pieces(plain, 'spinodal').flatMap((p) => p.points);
    const shiftedSpinodal = pieces(shifted, 'spinodal').flatMap((p) => p.points);
    expect(shiftedSpinodal[shiftedSpinodal.length - 1][1]).toBeCloseTo(-10, 9); // clipped at the top
    expect(shifted.notes.some((note) => note.includes('shifted'))).toBe(true);
    expect(plainSpinodal.length).toBeGreaterThan(100);
  });

  it('greys the crystal region out above the polydispersity threshold', () => {
    const plain = meanFieldB2Map();
    const polydisperse = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { polydispersity: 15 });
    expect(plain.crystalSuppressed).toBe(false);
    expect(polydisperse.crystalSuppressed).toBe(true);
    expect(plain.regions.cells).toContain(3);
    expect(polydisperse.regions.cells).not.toContain(3);
    expect(polydisperse.regions.cells).toContain(5);
    expect(polydisperse.notes.some((note) => note.includes('Polydispersity 15 %'))).toBe(true);
    expect(cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { polydispersity: 8 }).crystalSuppressed).toBe(false);
  });

  it('fills a region grid of the requested size with every state code', () => {
    // A gel threshold below the critical B2* (a calibration) leaves room for slow separation.
    const map = cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { gridColumns: 50, gridRows: 40, parameters: { gelB2Threshold: -3 } });
    expect(map.regions.cells).toHaveLength(2000);
    expect(map.regions.codes).toEqual(['fluid', 'gel', 'glass', 'crystal', 'separated', 'crystal-suppressed']);
    for (const code of [0, 1, 2, 3, 4]) expect(map.regions.cells).toContain(code);
  });

  it('fills each region cell with the state classifyPoint gives at the cell centre', () => {
    for (const map of [meanFieldB2Map(), depletionMap(0.35), cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { polydispersity: 15 })]) {
      const { columns, rows, cells, codes } = map.regions;
      for (let r = 0; r < rows; r += 3) {
        const y = map.y.weakest + ((r + 0.5) / rows) * (map.y.strongest - map.y.weakest);
        for (let c = 0; c < columns; c += 2) {
          const phi = ((c + 0.5) / columns) * FCC_CLOSE_PACKING;
          const attraction = map.model.kind === 'depletion'
            ? { kind: 'depletion' as const, q: map.model.q, polymerReservoir: y }
            : { kind: 'b2' as const, value: y };
          const code = codes[cells[r * columns + c]];
          expect(classifyPoint(map, { phi, attraction }).state).toBe(code === 'crystal-suppressed' ? 'fluid' : code);
        }
      }
    }
  });

  it('rejects bad models and options, naming the field', () => {
    expectArgumentError(() => buildStateMap({ kind: 'depletion', q: 0 }), 'model.q');
    expectArgumentError(() => buildStateMap({ kind: 'depletion', q: Number.NaN }), 'model.q');
    expectArgumentError(() => buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'squareWellDepth', lambda: 1 }), 'model.lambda');
    expectArgumentError(() => buildStateMap({ kind: 'generic', theory: 'other' as 'meanField', axis: 'b2' }), 'model.theory');
    expectArgumentError(() => buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { levels: 5 }), 'options.levels');
    expectArgumentError(() => buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { levels: 100.5 }), 'options.levels');
    expectArgumentError(() => buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { yMax: 0 }), 'options.yMax');
    expectArgumentError(() => buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { polydispersity: -1 }), 'options.polydispersity');
    expectArgumentError(() => buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { parameters: { glassPhi: Number.NaN } }), 'parameters.glassPhi');
  });
});
