import { FCC_CLOSE_PACKING, reducedB2FromStickiness, squareWellDepthFromReducedB2, DEFAULT_SQUARE_WELL_RANGE } from '@shared/physics';
import type { MapModel } from '@shared/physics/map/types';
import { SIMILAR_RECIPE_DISTANCE } from '@shared/shelf-life/similar-recipe-groups';
import { modelMedianDays, type ShelfLifeModel, type ShelfLifeModelFitted } from '@shared/shelf-life/shelf-life-model';
import type { XY } from './types';

/** Bins of predicted median days (upper edges) and their fills: short-lived warm, long-lived green. */
export const SHELF_LIFE_BINS = [
  { below: 7, label: 'under 7 days', fill: '#b23b3b' },
  { below: 14, label: '7–14 days', fill: '#b7791f' },
  { below: 30, label: '14–30 days', fill: '#f4e2bd' },
  { below: 60, label: '30–60 days', fill: '#7fb0b9' },
  { below: Infinity, label: '60 days or more', fill: '#2f7d52' },
] as const;
/** Fill of a cell whose predicted median lies beyond the longest the bench has watched. */
export const BEYOND_BENCH_FILL = '#235e3d';

export interface ShelfLifeCell {
  /** The cell's corners in map coordinates (φ, drawn y). */
  x: XY;
  y: XY;
  /** Predicted median days; null when it lies beyond what the bench watched. */
  medianDays: number | null;
  /** No sampled recipe within the similar-recipe distance: the prediction is an extrapolation. */
  thin: boolean;
  fill: string;
}

export type ShelfLifeLayer =
  | { status: 'off'; reason: string }
  | { status: 'on'; cells: ShelfLifeCell[]; attractionNote: string; typicalNote: string; lastTimeDays: number };

/**
 * U/kT at a drawn map height: the y a map plots turned into the contact attraction the
 * shelf-life model was fitted on. Depletion maps: y = φ_p^R and U/kT = φ_p^R·(1 + 3/(2q))
 * (Asakura–Oosawa contact value, as the recipe derivation computes it); the square-well depth axis is
 * U/kT itself; B2* and 1/τ are read as the depth of a square well of range λ (the map's, else
 * 1.5) with that B2* (squareWellDepthFromReducedB2; 1/τ → B2* = 1 − 1/(4τ), Baxter). Null where no
 * well has that B2* (B2* ≥ 1: no attraction).
 * @example attractionAtMapY({ kind: 'depletion', q: 0.1 }, 0.25) // 4
 */
export function attractionAtMapY(model: MapModel, y: number): number | null {
  if (model.kind === 'depletion') return y * (1 + 3 / (2 * model.q));
  const lambda = model.lambda ?? DEFAULT_SQUARE_WELL_RANGE;
  if (model.axis === 'squareWellDepth') return y;
  const b2 = model.axis === 'b2' ? y : y > 0 ? reducedB2FromStickiness(1 / y) : 1;
  if (!(b2 < 1)) return null;
  try {
    const depth = squareWellDepthFromReducedB2(b2, lambda);
    return Number.isFinite(depth) ? depth : null;
  } catch {
    return null;
  }
}

/** How the layer reads attraction on this map, for its legend. */
export function attractionNote(model: MapModel): string {
  if (model.kind === 'depletion') return `attraction from the polymer dose as U/kT = φ_p^R·(1 + 3/(2q)) at q = ${Number(model.q.toPrecision(3))}`;
  if (model.axis === 'squareWellDepth') return 'attraction as the square-well depth U/kT the axis shows';
  return `attraction as the depth U/kT of a square well of range ${model.lambda ?? DEFAULT_SQUARE_WELL_RANGE} with the axis's ${model.axis === 'b2' ? 'B2*' : '1/τ'}`;
}

export function fillForMedian(medianDays: number | null): string {
  if (medianDays === null) return BEYOND_BENCH_FILL;
  return SHELF_LIFE_BINS.find((bin) => medianDays < bin.below)!.fill;
}

/**
 * The shelf-life layer of the state map: predicted median days to collapse from the programme's
 * Cox model on a columns × rows grid over the drawn domain, with φ and the attraction from the
 * map's axes and every other covariate at the programme's typical (median) value. A cell farther
 * than the similar-recipe distance (0.05 of the map, in x = φ/φ_cp and the drawn height's
 * fraction) from every recipe with bench samples is `thin`. Off, with the reason in words, when
 * the model was refused or no recipe with samples lies on this map.
 *
 * @param samplePoints sampled recipes placed on this map (φ, drawn y)
 * @param sign +1, or −1 when the drawn y is minus the map's y (B2*: stickier upward)
 */
export function shelfLifeLayer(
  shelfLife: ShelfLifeModel,
  map: { model: MapModel; sign: 1 | -1; xDomain: XY; yDomain: XY },
  samplePoints: readonly XY[],
  grid: { columns: number; rows: number } = { columns: 48, rows: 36 },
): ShelfLifeLayer {
  if (shelfLife.status === 'refused') return { status: 'off', reason: `Shelf-life layer off: ${shelfLife.message.replace(/^Cannot fit what drives collapse: /, '')}` };
  if (samplePoints.length === 0) return { status: 'off', reason: 'Shelf-life layer off: no recipe with bench samples lies on this map.' };
  const model: ShelfLifeModelFitted = shelfLife;
  const [x0, x1] = map.xDomain;
  const [y0, y1] = map.yDomain;
  const height = y1 - y0;
  const normal = ([phi, y]: XY): XY => [phi / FCC_CLOSE_PACKING, (y - y0) / height];
  const samples = samplePoints.map(normal);
  const cells: ShelfLifeCell[] = [];
  for (let j = 0; j < grid.rows; j++) {
    const cy: XY = [y0 + (j / grid.rows) * height, y0 + ((j + 1) / grid.rows) * height];
    const attractionKt = attractionAtMapY(map.model, map.sign * (cy[0] + cy[1]) / 2);
    for (let i = 0; i < grid.columns; i++) {
      const cx: XY = [x0 + (i / grid.columns) * (x1 - x0), x0 + ((i + 1) / grid.columns) * (x1 - x0)];
      const phi = (cx[0] + cx[1]) / 2;
      if (attractionKt === null || !(phi > 0)) continue;
      const [nx, nu] = normal([phi, (cy[0] + cy[1]) / 2]);
      const thin = !samples.some(([sx, su]) => Math.hypot(sx - nx, su - nu) <= SIMILAR_RECIPE_DISTANCE);
      const medianDays = modelMedianDays(model, { attractionKt, phi });
      cells.push({ x: cx, y: cy, medianDays, thin, fill: fillForMedian(medianDays) });
    }
  }
  const typical = Object.entries(model.typical).filter(([key]) => key !== 'attractionKt' && key !== 'phi');
  const typicalNote = typical.length
    ? `${typical
        .map(([key, value]) => {
          const term = model.terms.find((t) => t.key === key);
          return `${term?.label ?? key} at the programme's typical ${Number(value.toPrecision(3))}${term?.unit ? ` ${term.unit}` : ''}`;
        })
        .join(', ')}`
    : 'no other quantity in the model';
  return { status: 'on', cells, attractionNote: attractionNote(map.model), typicalNote, lastTimeDays: model.lastTimeDays };
}
