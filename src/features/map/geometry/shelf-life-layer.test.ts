import { describe, expect, it } from 'vitest';
import { asakuraOosawaContactEnergy } from '@shared/physics';
import type { ShelfLifeModelFitted } from '@shared/shelf-life/shelf-life-model';
import { attractionAtMapY, BEYOND_BENCH_FILL, fillForMedian, shelfLifeLayer } from './shelf-life-layer';

// A model written by hand (not fitted): H₀ = 0.2, 0.7, 1.5 at 10, 20, 40 days, centred on 5 kT;
// β = −0.5 per kT, 0 for φ. Expected medians by hand: the first H₀ ≥ ln 2 · exp(0.5·(U − 5)) (derived).
const MODEL: ShelfLifeModelFitted = {
  status: 'fitted',
  terms: [],
  coefficients: { attractionKt: -0.5, phi: 0 },
  baseline: { timeDays: [10, 20, 40], cumulativeHazard: [0.2, 0.7, 1.5], centre: { attractionKt: 5, phi: 0.2 } },
  typical: { attractionKt: 5, phi: 0.2 },
  sampleCount: 40,
  eventCount: 20,
  lastTimeDays: 60,
  omitted: [],
};
const handMedian = (u: number) => {
  const needed = Math.LN2 * Math.exp(0.5 * (u - 5));
  return [10, 20, 40][[0.2, 0.7, 1.5].findIndex((h) => h >= needed)] ?? null;
};

describe('attractionAtMapY', () => {
  it('reads a depletion map\'s polymer fraction as the Asakura–Oosawa contact attraction (physics module: −U/kT = 4 at q = 0.1, φ_p^R = 0.25, its documented example)', () => {
    expect(attractionAtMapY({ kind: 'depletion', q: 0.1 }, 0.25)).toBeCloseTo(-asakuraOosawaContactEnergy(0.1, 0.25), 12);
  });

  it('inverts the square-well B2* = 1 − (λ³ − 1)(e^{U/kT} − 1) (Noro & Frenkel 2000; textbook) on the B2* and 1/τ axes, and passes U/kT through', () => {
    const depth = 2.3;
    const b2 = 1 - (1.5 ** 3 - 1) * (Math.exp(depth) - 1);
    expect(attractionAtMapY({ kind: 'generic', theory: 'meanField', axis: 'b2' }, b2)).toBeCloseTo(depth, 9);
    // Baxter: B2* = 1 − 1/(4τ), so 1/τ = 4(1 − B2*).
    expect(attractionAtMapY({ kind: 'generic', theory: 'meanField', axis: 'inverseTau' }, 4 * (1 - b2))).toBeCloseTo(depth, 9);
    expect(attractionAtMapY({ kind: 'generic', theory: 'meanField', axis: 'squareWellDepth', lambda: 1.2 }, 3.1)).toBe(3.1);
    expect(attractionAtMapY({ kind: 'generic', theory: 'meanField', axis: 'b2' }, 1.5)).toBeNull();
  });
});

describe('shelfLifeLayer', () => {
  const map = { model: { kind: 'generic', theory: 'meanField', axis: 'squareWellDepth' } as const, sign: 1 as const, xDomain: [0, 0.74] as [number, number], yDomain: [0, 10] as [number, number] };

  it('is off, saying why, when the fit was refused or nothing sampled lies on the map', () => {
    const refused = shelfLifeLayer({ status: 'refused', reason: 'too-few-events', message: 'Cannot fit what drives collapse: 4 collapses seen; at least 10 are needed.', sampleCount: 9, eventCount: 4, lastTimeDays: 30, omitted: [] }, map, [[0.2, 5]]);
    expect(refused).toEqual({ status: 'off', reason: 'Shelf-life layer off: 4 collapses seen; at least 10 are needed.' });
    expect(shelfLifeLayer(MODEL, map, [])).toMatchObject({ status: 'off', reason: /no recipe with bench samples/ });
  });

  it('colours each cell by the hand-computed median at its attraction, and marks cells far from every sample as thin', () => {
    const layer = shelfLifeLayer(MODEL, map, [[0.407, 5.5]], { columns: 10, rows: 10 });
    if (layer.status !== 'on') throw new Error('layer should be on');
    expect(layer.cells).toHaveLength(100);
    for (const cell of layer.cells) {
      const u = (cell.y[0] + cell.y[1]) / 2;
      expect(cell.medianDays).toBe(handMedian(u));
      expect(cell.fill).toBe(fillForMedian(handMedian(u)));
    }
    // The sample sits at the centre of the cell φ ∈ [0.37, 0.444), U ∈ [5, 6); neighbouring centres are a tenth of the map away, beyond 0.05.
    const near = layer.cells.filter((c) => !c.thin);
    expect(near.map((c) => [c.x[0], c.y[0]])).toEqual([[0.37, 5]].map(([x, y]) => [expect.closeTo(x, 12), y]));
    expect(fillForMedian(null)).toBe(BEYOND_BENCH_FILL);
    expect(layer.typicalNote).toBe('no other quantity in the model');
  });

  it('names the other quantities of the model at their typical values with their units (a sample height of 45 mm)', () => {
    const height = { key: 'sampleHeightMm', label: 'sample height', unit: 'mm', step: 10 } as ShelfLifeModelFitted['terms'][number];
    const withHeight: ShelfLifeModelFitted = {
      ...MODEL,
      terms: [height],
      coefficients: { ...MODEL.coefficients, sampleHeightMm: 0 },
      baseline: { ...MODEL.baseline, centre: { ...MODEL.baseline.centre, sampleHeightMm: 45 } },
      typical: { ...MODEL.typical, sampleHeightMm: 45 },
    };
    const layer = shelfLifeLayer(withHeight, map, [[0.407, 5.5]], { columns: 4, rows: 4 });
    if (layer.status !== 'on') throw new Error('layer should be on');
    expect(layer.typicalNote).toBe("sample height at the programme's typical 45 mm");
  });
});
