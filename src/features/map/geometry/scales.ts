import { scaleLinear, type ScaleLinear } from 'd3-scale';
import type { Viewport, XY } from './types';

export interface MapFrame {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
}

export interface MapScales {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  inner: { width: number; height: number };
}

/**
 * Linear scales from the visible part of the map to pixels inside the frame's margins.
 * y grows upward on screen (attraction increases up), so its range runs bottom to top.
 */
export function mapScales(frame: MapFrame, view: Viewport): MapScales {
  const inner = { width: Math.max(1, frame.width - frame.margin.left - frame.margin.right), height: Math.max(1, frame.height - frame.margin.top - frame.margin.bottom) };
  return {
    x: scaleLinear().domain(view.x).range([0, inner.width]),
    y: scaleLinear().domain(view.y).range([inner.height, 0]),
    inner,
  };
}

/** Keeps a zoomed view inside the full domain and no smaller than a sliver of it. */
export function clampViewport(view: Viewport, full: Viewport, minFraction = 0.02): Viewport {
  const clampAxis = (axis: XY, whole: XY): XY => {
    const lo = Math.min(whole[0], whole[1]);
    const hi = Math.max(whole[0], whole[1]);
    const span = Math.min(hi - lo, Math.max(Math.abs(axis[1] - axis[0]), (hi - lo) * minFraction));
    let start = Math.min(axis[0], axis[1]);
    start = Math.max(lo, Math.min(hi - span, start));
    return [start, start + span];
  };
  return { x: clampAxis(view.x, full.x), y: clampAxis(view.y, full.y) };
}

/** The view after zooming by `factor` (<1 zooms in) about a point in map coordinates. */
export function zoomViewport(view: Viewport, about: XY, factor: number): Viewport {
  const scaleAxis = (axis: XY, centre: number): XY => [centre + (axis[0] - centre) * factor, centre + (axis[1] - centre) * factor];
  return { x: scaleAxis(view.x, about[0]), y: scaleAxis(view.y, about[1]) };
}

/** The view moved by a pixel offset (a drag), given the current scales. */
export function panViewport(view: Viewport, scales: MapScales, dxPixels: number, dyPixels: number): Viewport {
  const dx = scales.x.invert(0) - scales.x.invert(dxPixels);
  const dy = scales.y.invert(0) - scales.y.invert(dyPixels);
  return { x: [view.x[0] + dx, view.x[1] + dx], y: [view.y[0] + dy, view.y[1] + dy] };
}
