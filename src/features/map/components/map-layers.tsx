import { line } from 'd3-shape';
import { STATE_LABELS } from '@shared/states';
import { STATE_STYLE } from '@/lib/state-style';
import { formatNumber } from '@/lib/format';
import { SvgSymbolText } from '@/components/ui/symbol-text';
import { fittingLabel } from '../geometry/axis-label';
import { markerLabelSpot, placeLineLabels, regionLabelSpots, reservedBoxes, shortLabel } from '../geometry/label-placement';
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

export function MapLayers({ drawing, regions, scales, layers, clipId }: { drawing: MapDrawing; regions: StateRegion[]; scales: MapScales; layers: Set<Layer>; clipId: string }) {
  const regionSpots = regionLabelSpots(drawing.markers, regions, REGION_LABEL, scales);
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
          [...placeLineLabels(drawing.lines, scales, reservedBoxes(drawing.markers, regionSpots, scales, layers.has('regions'))).entries()].map(([id, spot]) => {
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
