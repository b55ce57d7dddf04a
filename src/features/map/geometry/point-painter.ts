import { symbol, symbolCircle, symbolCross, symbolDiamond, symbolSquare, symbolStar, symbolTriangle, symbolWye } from 'd3-shape';
import type { ObservedState } from '@shared/states';
import { STATE_STYLE } from '@/lib/state-style';
import type { MapScales } from './scales';
import type { MapPoint } from './types';

const SYMBOLS = { circle: symbolCircle, square: symbolSquare, triangle: symbolTriangle, star: symbolStar, wye: symbolWye, diamond: symbolDiamond, cross: symbolCross };

const glyphCache = new Map<string, Path2D>();

/** The state's shape as a Path2D around (0, 0), made once per state and size. */
function glyph(state: ObservedState, area: number): Path2D {
  const key = `${state}:${area}`;
  let path = glyphCache.get(key);
  if (!path) {
    path = new Path2D(symbol(SYMBOLS[STATE_STYLE[state].shape], area)() ?? '');
    glyphCache.set(key, path);
  }
  return path;
}

export interface PaintOptions {
  selected: Set<string>;
  highlight: string | null;
  showMismatches: boolean;
  pixelRatio: number;
}

/**
 * Paints the points on a canvas (SVG would be slow past a few thousand): observations as
 * filled shapes, recipes as outlined ones, mismatches ringed, selected ones outlined in ink.
 * Points are grouped by state so the fill colour changes once per group, not per point.
 */
export function paintPoints(context: CanvasRenderingContext2D, points: MapPoint[], scales: MapScales, options: PaintOptions) {
  const { width, height } = scales.inner;
  context.setTransform(options.pixelRatio, 0, 0, options.pixelRatio, 0, 0);
  context.clearRect(0, 0, width, height);
  const groups = new Map<string, MapPoint[]>();
  for (const p of points) {
    const x = scales.x(p.x);
    const y = scales.y(p.y);
    if (x < -8 || x > width + 8 || y < -8 || y > height + 8) continue;
    const key = `${p.kind}:${p.state}`;
    const group = groups.get(key);
    if (group) group.push(p);
    else groups.set(key, [p]);
  }
  for (const [key, group] of groups) {
    const [kind, state] = key.split(':') as [MapPoint['kind'], ObservedState];
    const style = STATE_STYLE[state];
    const path = glyph(state, kind === 'recipe' ? 70 : 46);
    context.fillStyle = kind === 'recipe' ? '#ffffff' : style.colour;
    context.strokeStyle = kind === 'recipe' ? style.colour : '#ffffff';
    context.lineWidth = kind === 'recipe' ? 1.8 : 0.8;
    for (const p of group) {
      context.setTransform(options.pixelRatio, 0, 0, options.pixelRatio, scales.x(p.x) * options.pixelRatio, scales.y(p.y) * options.pixelRatio);
      context.fill(path);
      context.stroke(path);
    }
  }
  context.setTransform(options.pixelRatio, 0, 0, options.pixelRatio, 0, 0);
  for (const p of points) {
    const ringed = (options.showMismatches && p.agrees === false) || options.selected.has(p.key) || options.highlight === p.key;
    if (!ringed) continue;
    const x = scales.x(p.x);
    const y = scales.y(p.y);
    context.beginPath();
    context.arc(x, y, options.highlight === p.key ? 9 : 7.5, 0, Math.PI * 2);
    context.lineWidth = options.selected.has(p.key) || options.highlight === p.key ? 2 : 1.4;
    context.strokeStyle = options.selected.has(p.key) || options.highlight === p.key ? '#1c2630' : '#bf3f48';
    if (!options.selected.has(p.key) && options.highlight !== p.key) context.setLineDash([2, 2]);
    context.stroke();
    context.setLineDash([]);
  }
}
