import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import type { BoundaryId, StateMap } from './types';

/**
 * Nearest-boundary index of a map: its state-changing ("active") boundary segments in normalised
 * coordinates (x = φ/φ_cp, u = normalised attraction), simplified (Douglas–Peucker) to within
 * SIMPLIFY_TOLERANCE, and for each cell of a GRID × GRID grid over the unit square the list of
 * segments that can be nearest to some point of the cell: those within D + 2h of the cell centre
 * (D: the centre's nearest distance, h: half the cell diagonal — triangle inequality), sorted by
 * their distance from the centre so a query can stop early. Built on first use and cached per map
 * object (the map stays plain JSON). Internal.
 */
export interface SegmentIndex {
  size: number;
  halfDiagonal: number;
  /** All segments, flattened [ax, au, bx, bu, …], and the curve each belongs to. */
  coordinates: Float64Array;
  curveOf: Int32Array;
  /**
   * All cells' candidates in one flat array, cell after cell: [ax, au, bx, bu, distance from the
   * cell centre] per candidate; cell i owns candidates cellStart[i] … cellStart[i + 1] − 1.
   */
  cellSegments: Float64Array;
  cellCurves: Int32Array;
  cellStart: Int32Array;
  /** Frozen { id, label } of each curve, shared by every classification. */
  boundaries: ReadonlyArray<Readonly<{ id: BoundaryId; label: string }>>;
}

/** The nearest point found by nearestActiveSegment (a reused scratch object: copy what you need). */
export interface NearestSegment {
  distance: number;
  curveIndex: number;
  x: number;
  u: number;
}

const cache = new WeakMap<StateMap, SegmentIndex>();
const GRID = 48;
/** Largest deviation (normalised units) of the index's simplified boundaries from the drawn ones. */
export const SIMPLIFY_TOLERANCE = 1e-4;

export function segmentIndexOf(map: StateMap): SegmentIndex {
  const cached = cache.get(map);
  if (cached) return cached;
  const { coordinates, curveOf } = activeSegmentsOf(map);
  const count = curveOf.length;
  const halfDiagonal = Math.SQRT1_2 / GRID;
  const packedSegments: number[] = [];
  const packedCurves: number[] = [];
  const cellStart = new Int32Array(GRID * GRID + 1);
  const fromCentre2 = new Float64Array(count);
  for (let cu = 0; cu < GRID; cu++) {
    for (let cx = 0; cx < GRID; cx++) {
      const x = (cx + 0.5) / GRID;
      const u = (cu + 0.5) / GRID;
      // Brute force from the centre: a few hundred segments, cheaper than a search structure.
      let nearest2 = Infinity;
      for (let s = 0; s < count; s++) {
        const d2 = pointSegmentDistance2(x, u, coordinates[4 * s], coordinates[4 * s + 1], coordinates[4 * s + 2], coordinates[4 * s + 3]);
        fromCentre2[s] = d2;
        if (d2 < nearest2) nearest2 = d2;
      }
      const limit = Math.sqrt(nearest2) + 2 * halfDiagonal;
      const order: number[] = [];
      for (let s = 0; s < count; s++) if (fromCentre2[s] <= limit * limit) order.push(s);
      order.sort((a, b) => fromCentre2[a] - fromCentre2[b]);
      for (const s of order) {
        packedSegments.push(coordinates[4 * s], coordinates[4 * s + 1], coordinates[4 * s + 2], coordinates[4 * s + 3], Math.sqrt(fromCentre2[s]));
        packedCurves.push(curveOf[s]);
      }
      cellStart[cu * GRID + cx + 1] = packedCurves.length;
    }
  }
  const index: SegmentIndex = {
    size: GRID,
    halfDiagonal,
    coordinates,
    curveOf,
    cellSegments: Float64Array.from(packedSegments),
    cellCurves: Int32Array.from(packedCurves),
    cellStart,
    boundaries: map.tables.curves.map((curve) => Object.freeze({ id: curve.id, label: curve.label })),
  };
  cache.set(map, index);
  return index;
}

const scratch: NearestSegment = { distance: 0, curveIndex: -1, x: 0, u: 0 };

/**
 * Nearest active segment to a normalised point: inside the unit square only the point's cell
 * candidates are scanned (stopping once dist(centre, s) − h exceeds the best), off the map every
 * segment. Exact for the simplified segments. Returns a shared scratch object, or `null` if the
 * map has no active segment. Internal.
 */
export function nearestActiveSegment(index: SegmentIndex, x: number, u: number): NearestSegment | null {
  let segments: Float64Array;
  let curves: Int32Array;
  let first: number;
  let end: number;
  let stride: number;
  if (x >= 0 && x < 1 && u >= 0 && u < 1) {
    const cell = Math.floor(u * index.size) * index.size + Math.floor(x * index.size);
    segments = index.cellSegments;
    curves = index.cellCurves;
    first = index.cellStart[cell];
    end = index.cellStart[cell + 1];
    stride = 5;
  } else {
    segments = index.coordinates;
    curves = index.curveOf;
    first = 0;
    end = curves.length;
    stride = 4;
  }
  const h = index.halfDiagonal;
  let best = Infinity;
  let best2 = Infinity;
  let found = -1;
  let bestX = 0;
  let bestU = 0;
  for (let k = first; k < end; k++) {
    const o = k * stride;
    // dist(point, s) ≥ dist(centre, s) − h, and a cell's list is sorted by dist(centre, s).
    if (stride === 5 && segments[o + 4] - h > best) break;
    const ax = segments[o];
    const au = segments[o + 1];
    const dx = segments[o + 2] - ax;
    const du = segments[o + 3] - au;
    const length2 = dx * dx + du * du;
    let t = length2 > 0 ? ((x - ax) * dx + (u - au) * du) / length2 : 0;
    if (t < 0) t = 0; else if (t > 1) t = 1;
    const nx = ax + t * dx;
    const nu = au + t * du;
    const distance2 = (x - nx) * (x - nx) + (u - nu) * (u - nu);
    if (distance2 < best2) {
      best2 = distance2;
      best = Math.sqrt(distance2);
      found = k;
      bestX = nx;
      bestU = nu;
    }
  }
  if (found < 0) return null;
  scratch.distance = best;
  scratch.curveIndex = curves[found];
  scratch.x = bestX;
  scratch.u = bestU;
  return scratch;
}

/** Active runs of every drawn curve, simplified, as flat normalised segments. */
function activeSegmentsOf(map: StateMap): { coordinates: Float64Array; curveOf: Int32Array } {
  const uOf = (y: number) => (y - map.y.weakest) / (map.y.strongest - map.y.weakest);
  const coordinates: number[] = [];
  const curveOf: number[] = [];
  map.tables.curves.forEach((curve, curveIndex) => {
    const flags = map.tables.active[curveIndex] ?? [];
    let run: Array<[number, number]> = [];
    const flush = () => {
      const kept = simplify(run, SIMPLIFY_TOLERANCE);
      for (let i = 0; i + 1 < kept.length; i++) {
        coordinates.push(kept[i][0], kept[i][1], kept[i + 1][0], kept[i + 1][1]);
        curveOf.push(curveIndex);
      }
      run = [];
    };
    for (let i = 0; i + 1 < curve.points.length; i++) {
      if (!flags[i]) {
        flush();
        continue;
      }
      if (run.length === 0) run.push([curve.points[i][0] / FCC_CLOSE_PACKING, uOf(curve.points[i][1])]);
      run.push([curve.points[i + 1][0] / FCC_CLOSE_PACKING, uOf(curve.points[i + 1][1])]);
    }
    flush();
  });
  return { coordinates: Float64Array.from(coordinates), curveOf: Int32Array.from(curveOf) };
}

function pointSegmentDistance2(x: number, u: number, ax: number, au: number, bx: number, bu: number): number {
  const dx = bx - ax;
  const du = bu - au;
  const length2 = dx * dx + du * du;
  let t = length2 > 0 ? ((x - ax) * dx + (u - au) * du) / length2 : 0;
  if (t < 0) t = 0; else if (t > 1) t = 1;
  const nx = ax + t * dx - x;
  const nu = au + t * du - u;
  return nx * nx + nu * nu;
}

/** Douglas–Peucker simplification of a polyline to within `tolerance` (iterative). */
function simplify(points: Array<[number, number]>, tolerance: number): Array<[number, number]> {
  if (points.length <= 2) return points;
  const keep = new Uint8Array(points.length);
  keep[0] = 1;
  keep[points.length - 1] = 1;
  const stack: Array<[number, number]> = [[0, points.length - 1]];
  while (stack.length > 0) {
    const [first, last] = stack.pop()!;
    const [ax, au] = points[first];
    const [bx, bu] = points[last];
    let worst = -1;
    let worstDistance2 = tolerance * tolerance;
    for (let i = first + 1; i < last; i++) {
      const d2 = pointSegmentDistance2(points[i][0], points[i][1], ax, au, bx, bu);
      if (d2 > worstDistance2) { worst = i; worstDistance2 = d2; }
    }
    if (worst >= 0) {
      keep[worst] = 1;
      stack.push([first, worst], [worst, last]);
    }
  }
  return points.filter((_, i) => keep[i] === 1);
}
