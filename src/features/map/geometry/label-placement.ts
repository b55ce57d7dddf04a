import type { StateRegion } from './regions';
import type { MapScales } from './scales';
import type { XY } from './types';

/** A label's extent in pixels inside the plot (y grows downward, as on screen). */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/** A marker's name without its parenthesised numbers (those stay in its tooltip). */
export const shortLabel = (label: string) => label.split(' (')[0];

export interface MarkerLabelSpot {
  dx: number;
  anchor: 'start' | 'end';
  box: Box;
}

/**
 * Where a marker's label goes: to the right of the marker, or to its left when it would run off
 * the plot; null when it fits on neither side (the marker's tooltip still names it). About 6 px
 * per character at 11 px.
 */
export function markerLabelSpot(m: { x: number; y: number; label: string }, scales: MapScales): MarkerLabelSpot | null {
  const x = scales.x(m.x);
  const y = scales.y(m.y);
  const width = shortLabel(m.label).length * 6;
  if (x + 7 + width <= scales.inner.width - 2) return { dx: 7, anchor: 'start', box: { x0: x - 6, y0: y - 18, x1: x + 10 + width, y1: y + 6 } };
  if (x - 7 - width >= 2) return { dx: -7, anchor: 'end', box: { x0: x - 10 - width, y0: y - 18, x1: x + 6, y1: y + 6 } };
  return null;
}

export interface RegionLabelSpot {
  x: number;
  y: number;
  box: Box;
}

/**
 * Where a region's name (`text`) is drawn: its own spot, or a line above or below it when a
 * marker's label is there; if every line is taken, its own spot anyway. Null when the spot is
 * too near the plot's edge.
 */
export function regionLabelSpot(region: Pick<StateRegion, 'labelAt'>, text: string, scales: MapScales, avoid: Box[]): RegionLabelSpot | null {
  if (!region.labelAt) return null;
  const x = scales.x(region.labelAt[0]);
  const y0 = scales.y(region.labelAt[1]);
  // About 7.5 px per character at 13 px semibold, centred on the spot.
  const half = (text.length * 7.5) / 2;
  if (x < 20 || x > scales.inner.width - 20) return null;
  for (const dy of [0, 18, -18, 36, -36]) {
    const y = y0 + dy;
    if (y < 14 || y > scales.inner.height - 6) continue;
    const box = { x0: x - half, y0: y - 13, x1: x + half, y1: y + 3 };
    if (!avoid.some((b) => overlaps(b, box))) return { x, y, box };
  }
  return y0 >= 14 && y0 <= scales.inner.height - 6 ? { x, y: y0, box: { x0: x - half, y0: y0 - 13, x1: x + half, y1: y0 + 3 } } : null;
}

/** Each region's label spot, kept off the markers' labels; `textOf` names a region. */
export function regionLabelSpots<S extends string>(
  markers: { x: number; y: number; label: string }[],
  regions: { state: S; labelAt: XY | null }[],
  textOf: (state: S) => string,
  scales: MapScales,
): Map<S, RegionLabelSpot | null> {
  const markerBoxes = markers.flatMap((m) => markerLabelSpot(m, scales)?.box ?? []);
  return new Map(regions.map((region) => [region.state, regionLabelSpot(region, textOf(region.state), scales, markerBoxes)]));
}

/** The space the marker labels and (when shown) the region labels take, kept free of line labels. */
export function reservedBoxes(markers: { x: number; y: number; label: string }[], regionSpots: Map<string, { box: Box } | null>, scales: MapScales, regionsShown: boolean): Box[] {
  const boxes = markers.flatMap((m) => markerLabelSpot(m, scales)?.box ?? []);
  if (regionsShown) for (const spot of regionSpots.values()) if (spot) boxes.push(spot.box);
  return boxes;
}

export interface LineLabelSpot {
  x: number;
  y: number;
  anchor: 'start' | 'end';
}

/**
 * Places each line's label on a visible stretch of its line, trying spots along it until one
 * neither leaves the plot nor covers a label already placed (or a reserved box); a line with no
 * free spot goes unlabelled (its name is still in the legend of lines below the map). Lines
 * sharing a label are named once. About 5.8 px per character at 10.5 px.
 */
export function placeLineLabels(lines: { id: string; label: string; points: XY[] }[], scales: MapScales, reserved: Box[] = []): Map<string, LineLabelSpot> {
  const placed: Box[] = [...reserved];
  const out = new Map<string, LineLabelSpot>();
  const named = new Set<string>();
  for (const line of lines) {
    if (named.has(line.label)) continue;
    // The whole label must fit the spot, however long.
    const width = line.label.length * 5.8;
    const visible = line.points
      .map(([x, y]) => [scales.x(x), scales.y(y)] as [number, number])
      .filter(([px, py]) => px > 4 && py > 14 && px < scales.inner.width - 4 && py < scales.inner.height - 4);
    const step = Math.max(1, Math.floor(visible.length / 12));
    for (let i = Math.floor(visible.length * 0.35); i < visible.length + visible.length; i += step) {
      const [px, py] = visible[i % Math.max(1, visible.length)] ?? [];
      if (px === undefined) break;
      const anchor = px + width + 6 > scales.inner.width ? 'end' : 'start';
      const box: Box = anchor === 'start' ? { x0: px + 3, y0: py - 16, x1: px + 3 + width, y1: py - 3 } : { x0: px - 3 - width, y0: py - 16, x1: px - 3, y1: py - 3 };
      if (box.x0 < 0 || box.y0 < 0) continue;
      if (placed.some((b) => overlaps(b, box))) continue;
      placed.push(box);
      named.add(line.label);
      out.set(line.id, { x: anchor === 'start' ? px + 3 : px - 3, y: py - 5, anchor });
      break;
    }
  }
  return out;
}
