import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { attractionOnMap } from './attraction-on-map';
import { framesOfMap } from './frames-of-map';
import { segmentNearest } from './polyline-tools';
import type { AttractionInput, BoundaryId, MapVertex, StateMap } from './types';

/**
 * Signed distance from a composition to a named boundary of a map, in the normalised map
 * coordinates of classifyPoint (x = φ/φ_cp, u = normalised attraction). The magnitude is the
 * distance to the nearest point of any drawn piece of that boundary (stable or metastable, active
 * or not). The sign is positive on the side the boundary announces:
 * - 'binodal', 'spinodal': inside the dome (two-phase / unstable side);
 * - 'freezing', 'melting', 'repulsive-glass', 'attractive-glass': at higher φ than the line;
 * - 'percolation', 'gel': at stronger attraction than the line (above it);
 *   beyond the ends of a line the end value is used.
 * A calibration can fit P(observed state) = logistic(a + b·distance) against it.
 *
 * @returns the signed distance, or `null` when the map does not draw that boundary.
 * @throws PhysicsArgumentError for a bad map, φ, attraction or boundary id.
 * @example signedBoundaryDistance(map, { phi: 0.2, attraction: { kind: 'b2', value: -4 } }, 'binodal') // > 0
 */
export function signedBoundaryDistance(map: StateMap, point: { phi: number; attraction: AttractionInput }, boundaryId: BoundaryId): number | null {
  const { drawn } = framesOfMap(map);
  if (point === null || typeof point !== 'object') throw new PhysicsArgumentError('point', '{ phi, attraction }', point);
  const phi = requireVolumeFraction('phi', point.phi);
  const known: BoundaryId[] = ['binodal', 'spinodal', 'freezing', 'melting', 'percolation', 'repulsive-glass', 'attractive-glass', 'gel'];
  if (!known.includes(boundaryId)) throw new PhysicsArgumentError('boundaryId', known.map((id) => `'${id}'`).join(', '), boundaryId);
  const pieces = map.tables.curves.filter((curve) => curve.id === boundaryId);
  if (pieces.length === 0) return null;
  const { y } = attractionOnMap(map, drawn, point.attraction);
  const x = phi / FCC_CLOSE_PACKING;
  const u = drawn.uFromY(y);
  const normalised = (p: MapVertex): [number, number] => [p[0] / FCC_CLOSE_PACKING, drawn.uFromY(p[1])];
  let best2 = Infinity;
  const all: Array<[number, number]> = [];
  for (const piece of pieces) {
    const points = piece.points.map(normalised);
    all.push(...points);
    for (let i = 0; i + 1 < points.length; i++) {
      const near = segmentNearest(x, u, points[i][0], points[i][1], points[i + 1][0], points[i + 1][1]);
      if (near.distance2 < best2) best2 = near.distance2;
    }
  }
  const distance = Math.sqrt(best2);
  return positiveSide(pieces[0].shape, all, x, u) ? distance : -distance;
}

function positiveSide(shape: 'dome' | 'phiOfY' | 'yOfPhi', points: Array<[number, number]>, x: number, u: number): boolean {
  if (shape === 'phiOfY') return x > interpolate(points.map((p) => [p[1], p[0]]), u);
  if (shape === 'yOfPhi') return u > interpolate(points, x);
  // Dome: split at its lowest point into a left and a right branch, each monotone in u.
  let bottom = 0;
  for (let i = 1; i < points.length; i++) if (points[i][1] < points[bottom][1]) bottom = i;
  if (u < points[bottom][1]) return false;
  const left = points.slice(0, bottom + 1).map((p): [number, number] => [p[1], p[0]]);
  const right = points.slice(bottom).map((p): [number, number] => [p[1], p[0]]);
  return x > interpolate(left, u) && x < interpolate(right, u);
}

/** Linear interpolation of value at key over [key, value] pairs (any order), clamped at the ends. */
function interpolate(pairs: Array<[number, number]>, key: number): number {
  const sorted = [...pairs].sort((a, b) => a[0] - b[0]);
  if (key <= sorted[0][0]) return sorted[0][1];
  const last = sorted[sorted.length - 1];
  if (key >= last[0]) return last[1];
  for (let i = 0; i + 1 < sorted.length; i++) {
    const [k0, v0] = sorted[i];
    const [k1, v1] = sorted[i + 1];
    if (key >= k0 && key <= k1) return k1 === k0 ? v1 : v0 + ((key - k0) / (k1 - k0)) * (v1 - v0);
  }
  return last[1];
}
