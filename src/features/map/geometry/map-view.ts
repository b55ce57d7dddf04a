import { DEFAULT_SQUARE_WELL_RANGE } from '@shared/physics/map/resolve-map-model';
import type { GlassLineMapping } from '@shared/physics/map/types';
import type { Viewport } from './types';

export type AxisChoice = 'b2' | 'inverseTau' | 'squareWellDepth' | 'polymerReservoir';
export type TheoryChoice = 'meanField' | 'baxterPY';
export const LAYERS = ['regions', 'lines', 'recipes', 'observations', 'mismatches', 'labels', 'calibrated'] as const;
export type Layer = (typeof LAYERS)[number];

/** Everything that makes a map look as it does; it lives in the URL so a copied link shows the same map. */
export interface MapView {
  axis: AxisChoice;
  theory: TheoryChoice;
  lambda: number;
  layers: Set<Layer>;
  zoom: Viewport | null;
  calibrated: boolean;
  minAge: number | null;
  maxAge: number | null;
  /** The glass line rescaled onto the observed hard-sphere φ_g (default) or as MCT computes it. */
  glassLine: GlassLineMapping;
  /** The shelf-life layer (predicted median days to collapse) is shown: `shelf=median` in the address. */
  shelfLife: boolean;
}

export const DEFAULT_LAYERS: Layer[] = ['regions', 'lines', 'recipes', 'observations', 'mismatches', 'labels', 'calibrated'];

const number = (value: string | null, fallback: number, min: number, max: number) => {
  const n = value === null ? NaN : Number(value);
  return Number.isFinite(n) && n >= min && n <= max ? n : fallback;
};
const optionalNumber = (value: string | null) => {
  const n = value === null || value === '' ? NaN : Number(value);
  return Number.isFinite(n) && n >= 0 ? n : null;
};

/** Reads a view from search parameters; anything malformed falls back to the default. */
export function parseMapView(params: URLSearchParams, defaultAxis: AxisChoice): MapView {
  const axis = (['b2', 'inverseTau', 'squareWellDepth', 'polymerReservoir'] as const).find((a) => a === params.get('axis')) ?? defaultAxis;
  const theory = params.get('theory') === 'baxterPY' ? 'baxterPY' : 'meanField';
  const layerParam = params.get('layers');
  const layers = new Set<Layer>(layerParam === null ? DEFAULT_LAYERS : (layerParam.split(',').filter((l) => (LAYERS as readonly string[]).includes(l)) as Layer[]));
  const zoomParts = (params.get('zoom') ?? '').split(',').map(Number);
  const zoom = zoomParts.length === 4 && zoomParts.every(Number.isFinite) && zoomParts[0] < zoomParts[1] && zoomParts[2] < zoomParts[3] ? { x: [zoomParts[0], zoomParts[1]] as [number, number], y: [zoomParts[2], zoomParts[3]] as [number, number] } : null;
  return {
    axis,
    theory,
    lambda: number(params.get('lambda'), DEFAULT_SQUARE_WELL_RANGE, 1.01, 3),
    layers,
    zoom,
    calibrated: params.get('calibrated') !== 'false',
    minAge: optionalNumber(params.get('minAge')),
    maxAge: optionalNumber(params.get('maxAge')),
    glassLine: params.get('glass') === 'computed' ? 'computed' : 'rescaled',
    shelfLife: params.get('shelf') === 'median',
  };
}

/** Writes a view into search parameters, keeping the others (e.g. programme). */
export function writeMapView(params: URLSearchParams, view: MapView): URLSearchParams {
  const next = new URLSearchParams(params);
  next.set('axis', view.axis);
  next.set('theory', view.theory);
  if (view.axis === 'squareWellDepth') next.set('lambda', String(view.lambda));
  else next.delete('lambda');
  next.set('layers', [...view.layers].join(','));
  if (view.zoom) next.set('zoom', [...view.zoom.x, ...view.zoom.y].map((v) => Number(v.toPrecision(5))).join(','));
  else next.delete('zoom');
  if (!view.calibrated) next.set('calibrated', 'false');
  else next.delete('calibrated');
  if (view.glassLine === 'computed') next.set('glass', 'computed');
  else next.delete('glass');
  if (view.shelfLife) next.set('shelf', 'median');
  else next.delete('shelf');
  for (const key of ['minAge', 'maxAge'] as const) {
    if (view[key] === null) next.delete(key);
    else next.set(key, String(view[key]));
  }
  return next;
}
