import { describe, expect, it } from 'vitest';
import { createHitIndex } from './hit-index';
import { parseMapView, writeMapView } from './map-view';
import { pointsToCsv } from './points-csv';
import { gridRegions, stateRegions } from './regions';
import { clampViewport, mapScales, panViewport, zoomViewport } from './scales';
import type { MapPoint } from './types';

const frame = { width: 640, height: 440, margin: { top: 20, right: 20, bottom: 40, left: 60 } };

function ringArea(ring: [number, number][]) {
  let area = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) area += (ring[j][0] - ring[i][0]) * (ring[j][1] + ring[i][1]);
  return Math.abs(area / 2);
}

describe('stateRegions', () => {
  it('outlines each state of a classifier split at x = 0.3 with areas matching the split (shoelace formula)', () => {
    const view = { x: [0, 0.74] as [number, number], y: [0, 10] as [number, number] };
    const regions = stateRegions((x) => (x < 0.3 ? 'fluid' : 'glass'), view, 148, 100);
    const area = (state: string) => regions.find((r) => r.state === state)!.rings.reduce((sum, ring) => sum + ringArea(ring), 0);
    // 0.3 × 10 and 0.44 × 10, to within one grid cell column (0.005 × 10).
    expect(area('fluid')).toBeCloseTo(3.0, 0);
    expect(Math.abs(area('fluid') - 3.0)).toBeLessThan(0.06);
    expect(Math.abs(area('glass') - 4.4)).toBeLessThan(0.06);
    expect(regions.find((r) => r.state === 'fluid')!.labelAt![0]).toBeLessThan(0.3);
  });

  it('leaves out states the classifier never returns, and unclassifiable points', () => {
    const regions = stateRegions((x, y) => (y > 5 ? null : 'gel'), { x: [0, 1], y: [0, 10] }, 50, 50);
    expect(regions.map((r) => r.state)).toEqual(['gel']);
  });
});

describe('gridRegions', () => {
  it("traces a physics grid whose cell centres span the domain, row 0 at the bottom", () => {
    // 101 × 51 cells: fluid where the centre has x < 0.3, gel above y = 6 elsewhere, glass below.
    const columns = 101;
    const rows = 51;
    const cells: number[] = [];
    for (let j = 0; j < rows; j++) for (let i = 0; i < columns; i++) cells.push(i / (columns - 1) < 0.3 / 0.74 ? 0 : (j / (rows - 1)) * 10 > 6 ? 1 : 2);
    const full = { x: [0, 0.74] as [number, number], y: [0, 10] as [number, number] };
    const regions = gridRegions({ columns, rows, codes: ['fluid', 'gel', 'glass'], cells }, full);
    const area = (state: string) => regions.find((r) => r.state === state)!.rings.reduce((sum, ring) => sum + ringArea(ring), 0);
    const cellArea = (0.74 / (columns - 1)) * (10 / (rows - 1));
    // Unsmoothed marching squares follow cell edges but cut each convex corner by 1/8 cell, so a
    // region's area is its cell count × one cell, less half a cell for a rectangle (shoelace
    // formula); the outer cells reach half a cell past the domain, as their centres sit on it.
    for (const [code, state] of ['fluid', 'gel', 'glass'].entries()) {
      expect(Math.abs(area(state) - cells.filter((c) => c === code).length * cellArea)).toBeLessThanOrEqual(0.5 * cellArea + 1e-12);
    }
    expect(area('fluid')).toBeCloseTo(3.0, 0);
    expect(regions.find((r) => r.state === 'gel')!.labelAt![1]).toBeGreaterThan(6);
    expect(regions.find((r) => r.state === 'glass')!.labelAt![1]).toBeLessThan(6);
  });
});

describe('viewport arithmetic', () => {
  const full = { x: [0, 0.74] as [number, number], y: [-8, 1] as [number, number] };
  it('zooms about a point, keeping that point fixed', () => {
    const zoomed = zoomViewport(full, [0.2, -2], 0.5);
    expect(zoomed.x[0]).toBeCloseTo(0.1, 12);
    expect(zoomed.x[1]).toBeCloseTo(0.47, 12);
    expect(zoomed.y[0]).toBeCloseTo(-5, 12);
    expect(zoomed.y[1]).toBeCloseTo(-0.5, 12);
  });
  it('clamps a view to the full domain and to a smallest span', () => {
    expect(clampViewport({ x: [-0.5, 0.2], y: [-3, 4] }, full)).toEqual({ x: [0, 0.7], y: [-6, 1] });
    const tiny = clampViewport({ x: [0.3, 0.3000001], y: [-1, -0.999] }, full);
    expect(tiny.x[1] - tiny.x[0]).toBeCloseTo(0.74 * 0.02, 12);
  });
  it('pans by a pixel drag in the drag direction', () => {
    const scales = mapScales(frame, full);
    const moved = panViewport(full, scales, scales.inner.width / 2, 0);
    expect(moved.x[0]).toBeCloseTo(-0.37, 12);
  });
});

describe('map view in the URL', () => {
  it('round-trips axis, theory, range, layers, zoom and age window', () => {
    const view = parseMapView(new URLSearchParams('axis=squareWellDepth&theory=baxterPY&lambda=1.25&layers=lines,recipes&zoom=0.1,0.4,2,6&minAge=7&maxAge=30&glass=computed&programme=3'), 'b2');
    expect(view).toMatchObject({ axis: 'squareWellDepth', theory: 'baxterPY', lambda: 1.25, zoom: { x: [0.1, 0.4], y: [2, 6] }, minAge: 7, maxAge: 30, glassLine: 'computed' });
    expect([...view.layers]).toEqual(['lines', 'recipes']);
    const written = writeMapView(new URLSearchParams('programme=3'), view);
    expect(parseMapView(written, 'b2')).toEqual(view);
    expect(written.get('programme')).toBe('3');
  });
  it('falls back to defaults for malformed values', () => {
    const view = parseMapView(new URLSearchParams('axis=banana&lambda=-4&zoom=1,0,2,3'), 'polymerReservoir');
    expect(view).toMatchObject({ axis: 'polymerReservoir', theory: 'meanField', lambda: 1.5, zoom: null });
  });
});

const point = (key: string, x: number, y: number, extra: Partial<MapPoint> = {}): MapPoint => ({ key, kind: 'observation', id: 1, x, y, state: 'gel', predicted: 'gel', agrees: true, code: 'HB-0001', name: 'n', ageDays: 7, recipeId: 1, margin: 0.1, ...extra });

describe('hit index', () => {
  it('finds the nearest point within the radius and the points inside a brush', () => {
    const scales = mapScales(frame, { x: [0, 1], y: [0, 1] });
    const points = [point('a', 0.1, 0.1), point('b', 0.5, 0.5), point('c', 0.9, 0.9)];
    const index = createHitIndex(points, scales);
    expect(index.nearest(scales.x(0.5) + 3, scales.y(0.5) - 2)?.key).toBe('b');
    expect(index.nearest(scales.x(0.3), scales.y(0.3))).toBeNull();
    const brushed = index.within([[scales.x(0.4), scales.y(1)], [scales.x(1), scales.y(0.4)]]);
    expect(brushed.map((p) => p.key)).toEqual(['b', 'c']);
  });
});

describe('pointsToCsv', () => {
  it('quotes commas and neutralises formula-looking text (OWASP CSV injection guidance)', () => {
    const csv = pointsToCsv([point('a', 0.2, -3, { name: '=HYPERLINK("x")', code: 'LPG-0001' }), point('b', 0.3, -1, { name: 'a, b' })], 'B2*');
    const lines = csv.trim().split('\n');
    expect(lines[0]).toBe('kind,id,code,name,phi,B2*,state,predicted_state,agrees,age_days');
    expect(lines[1]).toBe(`observation,1,LPG-0001,"'=HYPERLINK(""x"")",0.2,-3,gel,gel,true,7`);
    expect(lines[2]).toContain('"a, b"');
  });
});
