import type { MapScales } from '../geometry/scales';
import { BEYOND_BENCH_FILL, SHELF_LIFE_BINS, type ShelfLifeLayer } from '../geometry/shelf-life-layer';

const HATCH_ID = 'shelf-life-thin-hatch';

/** The shelf-life layer's cells over the map: coloured by predicted median days, hatched grey where data are thin. */
export function ShelfLifeOverlay({ layer, scales }: { layer: ShelfLifeLayer; scales: MapScales }) {
  if (layer.status !== 'on') return null;
  return (
    <g data-testid="shelf-life-layer" aria-hidden="true">
      <defs>
        <pattern id={HATCH_ID} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width={6} height={6} fill="#f6f5f1" fillOpacity={0.7} />
          <line x1={0} y1={0} x2={0} y2={6} stroke="#636d77" strokeWidth={1.2} />
        </pattern>
      </defs>
      {layer.cells.map((cell) => {
        const x = scales.x(cell.x[0]);
        const y = scales.y(cell.y[1]);
        const width = scales.x(cell.x[1]) - x;
        const height = scales.y(cell.y[0]) - y;
        return <rect key={`${cell.x[0]}|${cell.y[0]}`} x={x} y={y} width={width + 0.5} height={height + 0.5} fill={cell.thin ? `url(#${HATCH_ID})` : cell.fill} fillOpacity={cell.thin ? 0.85 : 0.55} />;
      })}
    </g>
  );
}

/** The layer's key: the bins, how attraction and the other quantities were read, or why the layer is off. */
export function ShelfLifeKey({ layer, loading }: { layer: ShelfLifeLayer | null; loading: boolean }) {
  if (loading || layer === null) return <p className="text-xs text-ink-soft">Fitting the programme's shelf-life model…</p>;
  if (layer.status === 'off') return <p className="text-sm" data-testid="shelf-life-key">{layer.reason}</p>;
  return (
    <div className="flex flex-col gap-2 text-sm" data-testid="shelf-life-key">
      <p className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Predicted median days to collapse</p>
      <ul className="flex flex-col gap-1">
        {SHELF_LIFE_BINS.map((bin) => (
          <li key={bin.label} className="flex items-center gap-2">
            <span className="inline-block h-3 w-5 rounded-sm" style={{ background: bin.fill, opacity: 0.8 }} aria-hidden="true" />
            {bin.label}
          </li>
        ))}
        <li className="flex items-center gap-2">
          <span className="inline-block h-3 w-5 rounded-sm" style={{ background: BEYOND_BENCH_FILL, opacity: 0.8 }} aria-hidden="true" />
          beyond {layer.lastTimeDays} days, the longest the bench has watched
        </li>
        <li className="flex items-center gap-2">
          <span className="inline-block h-3 w-5 rounded-sm border border-line-strong" style={{ background: 'repeating-linear-gradient(45deg, #636d77 0 1px, #f6f5f1 1px 5px)' }} aria-hidden="true" />
          too thin: no recipe with bench samples within 0.05 of the map
        </li>
      </ul>
      <p className="text-xs text-ink-soft">
        From the programme's Cox model of time to collapse: φ from the x axis, {layer.attractionNote}; {layer.typicalNote}. A prediction, not a stability test.
      </p>
    </div>
  );
}
