import { quadtree } from 'd3-quadtree';
import type { MapScales } from './scales';
import type { MapPoint } from './types';

/** Finds the point under the pointer in pixel space; rebuilt when the view changes. */
export function createHitIndex(points: MapPoint[], scales: MapScales) {
  const tree = quadtree<MapPoint>()
    .x((p) => scales.x(p.x))
    .y((p) => scales.y(p.y))
    .addAll(points);
  return {
    nearest: (px: number, py: number, radius = 8) => tree.find(px, py, radius) ?? null,
    /** Points inside a pixel rectangle (a brush), in map order. */
    within: ([[x0, y0], [x1, y1]]: [[number, number], [number, number]]) =>
      points.filter((p) => {
        const x = scales.x(p.x);
        const y = scales.y(p.y);
        return x >= Math.min(x0, x1) && x <= Math.max(x0, x1) && y >= Math.min(y0, y1) && y <= Math.max(y0, y1);
      }),
  };
}
