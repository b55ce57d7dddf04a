import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { curveAt, domeAt } from './state-rule';
import type { MapFrame } from './map-frame';
import { clipPolyline } from './polyline-tools';
import type { BoundaryId, ClassifierParameters, ClassifierTables, DomeCurve, GlassLineSource, LevelCurve, MapVertex } from './types';
import { baxterPercolationStickiness } from '../fluid-fluid/baxter-percolation-stickiness';

export type DrawnCurve = ClassifierTables['curves'][number];

/**
 * Coordinates rounded to 1e-10 (absolute): far below anything drawn or measured on a map whose
 * axes span ≥ 0.3 units, and half the JSON of full doubles.
 */
function round10(value: number): number {
  return Math.round(value * 1e10) / 1e10;
}

export function roundPoint(point: MapVertex): MapVertex {
  return [round10(point[0]), round10(point[1])];
}

/**
 * Every boundary as a polyline in map units (drawn frame: the attraction shift applied), clipped
 * to the y domain. Internal.
 */
export function buildDrawnCurves(
  tables: Pick<ClassifierTables, 'binodal' | 'spinodal' | 'freezing' | 'melting' | 'glass' | 'attractiveGlassFrom'>,
  theory: MapFrame,
  drawn: MapFrame,
  parameters: ClassifierParameters,
  labels: { binodal: string; spinodal: string },
  glass: GlassLineSource,
): DrawnCurve[] {
  const curves: DrawnCurve[] = [];
  const shift = drawn.shift;
  const toPoint = (phi: number, u0: number): MapVertex => [phi, drawn.drawnYFromTheoryU(u0)];
  const add = (id: BoundaryId, label: string, shape: DrawnCurve['shape'], points: MapVertex[]) => {
    for (const inY of clipPolyline(points, (point) => drawn.uFromY(point[1]), 0, 1)) {
      for (const run of clipPolyline(inY, (point) => point[0], 0, FCC_CLOSE_PACKING)) curves.push({ id, label, shape, points: run.map(roundPoint) });
    }
  };
  const domePoints = (dome: DomeCurve): MapVertex[] => {
    const left = dome.left.u.map((u, i) => toPoint(dome.left.phi[i], u)).reverse();
    const right = dome.right.u.slice(1).map((u, i) => toPoint(dome.right.phi[i + 1], u));
    return [...left, ...right];
  };
  const levelPoints = (curve: LevelCurve): MapVertex[] => curve.u.map((u, i) => toPoint(curve.phi[i], u));

  if (tables.binodal && tables.binodal.left.u.length > 1) add('binodal', labels.binodal, 'dome', domePoints(tables.binodal));
  if (tables.spinodal && tables.spinodal.left.u.length > 1) add('spinodal', labels.spinodal, 'dome', domePoints(tables.spinodal));
  add('freezing', 'Freezing (fluid side of fluid–crystal coexistence)', 'phiOfY', levelPoints(tables.freezing));
  add('melting', 'Melting (crystal side of fluid–crystal coexistence)', 'phiOfY', levelPoints(tables.melting));

  const samples = 160;
  const percolation: MapVertex[] = [];
  for (let i = 0; i <= samples; i++) {
    const phi = 0.001 + ((FCC_CLOSE_PACKING - 0.002) * i) / samples;
    const b2 = 1 - 1 / (4 * baxterPercolationStickiness(phi));
    percolation.push([phi, drawn.yFromB2(b2 + shift)]);
  }
  add('percolation', 'Percolation (Chiew–Glandt, Percus–Yevick)', 'yOfPhi', percolation);

  const placed = glass.mapping === 'rescaled' ? `MCT, rescaled to φ_g = ${parameters.glassPhi}` : 'MCT, as computed';
  const glassPoints = levelPoints(tables.glass);
  const nose = tables.attractiveGlassFrom;
  if (nose === null) {
    // Flat in φ: extend to the map's top whatever the theory span.
    const phi = tables.glass.phi[0];
    add('repulsive-glass', `Repulsive glass (${placed})`, 'phiOfY', [[phi, drawn.yFromU(0)], [phi, drawn.yFromU(1)]]);
  } else {
    const split = tables.glass.u.indexOf(nose);
    add('repulsive-glass', `Repulsive glass (${placed})`, 'phiOfY', glassPoints.slice(0, split + 1));
    const attractive = glassPoints.slice(split);
    const last = attractive[attractive.length - 1];
    // Held beyond the last level: continue to the map's top.
    if (drawn.uFromY(last[1]) < 1) attractive.push([last[0], drawn.yFromU(1)]);
    add('attractive-glass', `Attractive glass (${placed}; approximate)`, 'phiOfY', attractive);
  }

  const gelU0 = theory.uFromY(theory.yFromB2(parameters.gelB2Threshold));
  const gelBinodal = domeAt(tables.binodal, gelU0);
  const glassAtGel = curveAt(tables.glass, gelU0);
  if (gelBinodal && gelBinodal[0] < glassAtGel) {
    const y = drawn.yFromB2(parameters.gelB2Threshold + shift);
    add('gel', `Gel threshold inside the binodal (B2* = ${parameters.gelB2Threshold}, approximate)`, 'yOfPhi', [
      [gelBinodal[0], y],
      [Math.min(gelBinodal[1], glassAtGel), y],
    ]);
  }
  return curves;
}
