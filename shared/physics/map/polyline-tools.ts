import type { MapVertex } from './types';

/**
 * Split a polyline into the runs that lie inside lo ≤ key(point) ≤ hi, adding the crossing
 * points by linear interpolation. Internal (used to clip boundaries to the map's y domain).
 */
export function clipPolyline(points: MapVertex[], key: (point: MapVertex) => number, lo: number, hi: number): MapVertex[][] {
  const runs: MapVertex[][] = [];
  let current: MapVertex[] = [];
  const inside = (k: number) => k >= lo && k <= hi;
  for (let i = 0; i < points.length; i++) {
    const point = points[i];
    const k = key(point);
    if (i > 0) {
      const previous = points[i - 1];
      const kp = key(previous);
      if (inside(kp) !== inside(k)) {
        const edge = inside(kp) ? (k > hi ? hi : lo) : (kp > hi ? hi : lo);
        const t = (edge - kp) / (k - kp);
        const crossing: MapVertex = [previous[0] + t * (point[0] - previous[0]), previous[1] + t * (point[1] - previous[1])];
        current.push(crossing);
        if (!inside(k)) {
          if (current.length > 1) runs.push(current);
          current = [];
        }
      }
    }
    if (inside(k)) current.push(point);
  }
  if (current.length > 1) runs.push(current);
  return runs;
}

/**
 * Split a polyline where a per-segment flag changes; each run keeps its flag and shares its end
 * points with its neighbours. Internal.
 */
export function splitByFlag(points: MapVertex[], flagOfSegment: (a: MapVertex, b: MapVertex) => boolean): Array<{ points: MapVertex[]; flag: boolean }> {
  const runs: Array<{ points: MapVertex[]; flag: boolean }> = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const flag = flagOfSegment(points[i], points[i + 1]);
    const last = runs[runs.length - 1];
    if (last && last.flag === flag) last.points.push(points[i + 1]);
    else runs.push({ points: [points[i], points[i + 1]], flag });
  }
  return runs;
}

/** Squared distance from (px, py) to the segment (ax, ay)–(bx, by), with the nearest point. Internal. */
export function segmentNearest(px: number, py: number, ax: number, ay: number, bx: number, by: number): { distance2: number; x: number; y: number } {
  const dx = bx - ax;
  const dy = by - ay;
  const length2 = dx * dx + dy * dy;
  let t = length2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / length2 : 0;
  if (t < 0) t = 0; else if (t > 1) t = 1;
  const x = ax + t * dx;
  const y = ay + t * dy;
  return { distance2: (px - x) * (px - x) + (py - y) * (py - y), x, y };
}
