import { line } from 'd3-shape';
import { STATE_LABELS } from '@shared/states';
import { STATE_STYLE } from '@/lib/state-style';
import { formatNumber } from '@/lib/format';
import { SvgSymbolText } from '@/components/ui/symbol-text';
import { fittingLabel } from '../geometry/axis-label';
import type { StateRegion } from '../geometry/regions';
import type { MapScales } from '../geometry/scales';
import type { Layer } from '../geometry/map-view';
import type { MapDrawing, MapLine, XY } from '../geometry/types';

/** Colours of the shaded regions; the greyed crystal region has no state of its own. */
const REGION_FILL = (state: StateRegion['state']) => (state === 'crystal-suppressed' ? '#e4e2dc' : STATE_STYLE[state].tint);
const REGION_LABEL = (state: StateRegion['state']) => (state === 'crystal-suppressed' ? 'Crystal suppressed' : STATE_LABELS[state]);
const REGION_INK = (state: StateRegion['state']) => (state === 'crystal-suppressed' ? '#5d6670' : STATE_STYLE[state].colour);

const TONE: Record<MapLine['tone'], { stroke: string; width: number }> = {
  coexistence: { stroke: '#1c2630', width: 2 },
  spinodal: { stroke: '#4a5662', width: 1.4 },
  percolation: { stroke: '#2c6e7f', width: 1.4 },
  glass: { stroke: '#7d55b8', width: 1.8 },
  crystal: { stroke: '#c27a1c', width: 1.8 },
  gel: { stroke: '#1c8a63', width: 1.8 },
  // Dark brick: apart from the crystal lines' amber-brown and every other tone.
  calibrated: { stroke: '#862b2b', width: 2.4 },
};

function pathOf(points: XY[], scales: MapScales) {
  return line<XY>()
    .defined(([x, y]) => Number.isFinite(x) && Number.isFinite(y))
    .x(([x]) => scales.x(x))
    .y(([, y]) => scales.y(y))(points) ?? '';
}

interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** A marker's name without its parenthesised numbers (those stay in its tooltip). */
const shortLabel = (label: string) => label.split(' (')[0];

/**
 * Where a marker's label goes: to the right of the marker, or to its left when it would run off
 * the plot; null when it fits on neither side (the marker's tooltip still names it). About 6 px
 * per character at 11 px.
 */
function markerLabelSpot(m: { x: number; y: number; label: string }, scales: MapScales): { dx: number; anchor: 'start' | 'end'; box: Box } | null {
  const x = scales.x(m.x);
  const y = scales.y(m.y);
  const width = shortLabel(m.label).length * 6;
  if (x + 7 + width <= scales.inner.width - 2) return { dx: 7, anchor: 'start', box: { x0: x - 6, y0: y - 18, x1: x + 10 + width, y1: y + 6 } };
  if (x - 7 - width >= 2) return { dx: -7, anchor: 'end', box: { x0: x - 10 - width, y0: y - 18, x1: x + 6, y1: y + 6 } };
  return null;
}

/** A region's name is drawn where it fits; null when its spot is too near the edge. */
function regionLabelSpot(region: StateRegion, scales: MapScales, avoid: Box[]): { x: number; y: number; box: Box } | null {
  if (!region.labelAt) return null;
  const x = scales.x(region.labelAt[0]);
  const y0 = scales.y(region.labelAt[1]);
  // About 7.5 px per character at 13 px semibold, centred on the spot.
  const half = (REGION_LABEL(region.state).length * 7.5) / 2;
  if (x < 20 || x > scales.inner.width - 20) return null;
  // The region's own spot, or a line above or below it when a marker's label is there.
  for (const dy of [0, 18, -18, 36, -36]) {
    const y = y0 + dy;
    if (y < 14 || y > scales.inner.height - 6) continue;
    const box = { x0: x - half, y0: y - 13, x1: x + half, y1: y + 3 };
    if (!avoid.some((b) => overlaps(b, box))) return { x, y, box };
  }
  return y0 >= 14 && y0 <= scales.inner.height - 6 ? { x, y: y0, box: { x0: x - half, y0: y0 - 13, x1: x + half, y1: y0 + 3 } } : null;
}

/** Each region's label spot, kept off the markers' labels. */
function regionLabelSpots(drawing: MapDrawing, regions: StateRegion[], scales: MapScales) {
  const markers = drawing.markers.flatMap((m) => markerLabelSpot(m, scales)?.box ?? []);
  return new Map(regions.map((region) => [region.state, regionLabelSpot(region, scales, markers)]));
}

/** The space the marker and region labels take, kept free of line labels. */
function reservedBoxes(drawing: MapDrawing, regionSpots: Map<string, { box: Box } | null>, scales: MapScales, layers: Set<Layer>): Box[] {
  const boxes = drawing.markers.flatMap((m) => markerLabelSpot(m, scales)?.box ?? []);
  if (layers.has('regions')) for (const spot of regionSpots.values()) if (spot) boxes.push(spot.box);
  return boxes;
}

const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/**
 * Places each line's label on a visible stretch of its line, trying spots along it until one
 * neither leaves the plot nor covers a label already placed; a line with no free spot goes
 * unlabelled (its name is still in the legend of lines below the map).
 */
export function placeLineLabels(lines: { id: string; label: string; points: XY[] }[], scales: MapScales, reserved: Box[] = []) {
  const placed: Box[] = [...reserved];
  const out = new Map<string, { x: number; y: number; anchor: 'start' | 'end' }>();
  const named = new Set<string>();
  for (const line of lines) {
    if (named.has(line.label)) continue;
    // About 5.8 px per character at 10.5 px: the whole label must fit the spot, however long.
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

export function MapLayers({ drawing, regions, scales, layers, clipId }: { drawing: MapDrawing; regions: StateRegion[]; scales: MapScales; layers: Set<Layer>; clipId: string }) {
  const regionSpots = regionLabelSpots(drawing, regions, scales);
  return (
    <>
      <defs>
        <clipPath id={clipId}>
          <rect width={scales.inner.width} height={scales.inner.height} />
        </clipPath>
      </defs>
      <rect width={scales.inner.width} height={scales.inner.height} fill="#fbfaf7" stroke="#c4c0b4" />
      <g clipPath={`url(#${clipId})`}>
        {layers.has('regions') &&
          regions.map((region) => (
            <path key={region.state} d={region.rings.map((ring) => `${pathOf(ring, scales)}Z`).join(' ')} fill={REGION_FILL(region.state)} fillOpacity={0.75} fillRule="evenodd" stroke="none" data-region={region.state} />
          ))}
        {layers.has('lines') &&
          drawing.lines.map((l) => (
            <path
              key={l.id}
              d={pathOf(l.points, scales)}
              fill="none"
              stroke={TONE[l.tone].stroke}
              strokeWidth={TONE[l.tone].width}
              strokeDasharray={l.dashed ? '6 4' : l.approximate ? '2 3' : undefined}
              data-line={l.id}
            />
          ))}
        {layers.has('lines') &&
          drawing.markers.map((m) => {
            const spot = markerLabelSpot(m, scales);
            return (
              <g key={m.id} transform={`translate(${scales.x(m.x)},${scales.y(m.y)})`} data-marker={m.id}>
                {m.reference ? <path d="M-5,-5L5,5M-5,5L5,-5" stroke="#1c2630" strokeWidth={1.6} /> : <circle r={4.5} fill="#1c2630" stroke="#ffffff" strokeWidth={1.5} />}
                <title>{m.label}</title>
                {layers.has('labels') && spot && (
                  <text x={spot.dx} y={-6} textAnchor={spot.anchor} fontSize={11} fill="#1c2630" paintOrder="stroke" stroke="#fbfaf7" strokeWidth={3}>
                    {shortLabel(m.label)}
                  </text>
                )}
              </g>
            );
          })}
        {layers.has('labels') && layers.has('regions') &&
          regions.map((region) => {
            const spot = regionSpots.get(region.state);
            if (!spot) return null;
            return (
              <text key={region.state} x={spot.x} y={spot.y} textAnchor="middle" fontSize={13} fontWeight={600} fill={REGION_INK(region.state)} opacity={0.9} paintOrder="stroke" stroke="#fbfaf7" strokeWidth={3}>
                {REGION_LABEL(region.state)}
              </text>
            );
          })}
        {layers.has('labels') && layers.has('lines') &&
          [...placeLineLabels(drawing.lines, scales, reservedBoxes(drawing, regionSpots, scales, layers)).entries()].map(([id, spot]) => {
            const l = drawing.lines.find((line) => line.id === id)!;
            return (
              <text key={id} x={spot.x} y={spot.y} textAnchor={spot.anchor} fontSize={10.5} fill={TONE[l.tone].stroke} paintOrder="stroke" stroke="#fbfaf7" strokeWidth={3}>
                {l.label}
              </text>
            );
          })}
      </g>
    </>
  );
}

export function MapAxes({ scales, xLabel, yLabel, displayY }: { scales: MapScales; xLabel: string; yLabel: string; displayY: (y: number) => number }) {
  const xTicks = scales.x.ticks(8);
  const yTicks = scales.y.ticks(7);
  return (
    <g fontSize={11} fill="#4a5662">
      <g transform={`translate(0,${scales.inner.height})`}>
        {xTicks.map((t) => (
          <g key={t} transform={`translate(${scales.x(t)},0)`}>
            <line y2={5} stroke="#7b858f" />
            <text y={18} textAnchor="middle" data-axis-tick="x">
              {formatNumber(t, 3)}
            </text>
          </g>
        ))}
        <text x={scales.inner.width / 2} y={36} textAnchor="middle" fontSize={12} fill="#1c2630" fontWeight={500}>
          <SvgSymbolText text={xLabel} />
        </text>
      </g>
      {yTicks.map((t) => (
        <g key={t} transform={`translate(0,${scales.y(t)})`}>
          <line x2={-5} stroke="#7b858f" />
          <text x={-8} dy="0.32em" textAnchor="end" data-axis-tick="y">
            {formatNumber(displayY(t), 3)}
          </text>
        </g>
      ))}
      <text transform={`translate(${-46},${scales.inner.height / 2}) rotate(-90)`} textAnchor="middle" fontSize={12} fill="#1c2630" fontWeight={500}>
        <SvgSymbolText text={fittingLabel(yLabel, scales.inner.height)} />
      </text>
    </g>
  );
}
