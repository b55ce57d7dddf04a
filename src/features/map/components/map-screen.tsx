import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { ProgrammeView } from '@shared/views/programme';
import { Card } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { ErrorState, Loading } from '@/components/ui/states';
import { formatDate } from '@/lib/format';
import { useUrlParams } from '@/lib/use-url-params';
import { useCalibrations } from '@/features/calibration';
import { SafetyNote } from '@/features/cautions';
import { useProgrammeShelfLife } from '@/features/shelf-life';
import { useMapPoints, type MapOverlay } from '../api/get-map-points';
import { LAYERS, parseMapView, writeMapView, type Layer, type MapView } from '../geometry/map-view';
import type { MapPoint, Viewport } from '../geometry/types';
import type { CalibrationOverlay } from '../geometry/calibration-lines';
import { shelfLifeLayer, type ShelfLifeLayer } from '../geometry/shelf-life-layer';
import { useCalibrationOverlay } from '../hooks/use-calibration-overlay';
import { placePoints, useStateMapDrawing } from '../hooks/use-map-drawing';
import { CalibrationSwitch } from './calibration-switch';
import { MapControls } from './map-controls';
import { MapExports } from './map-exports';
import { middleSizeRatio } from '../geometry/middle-size-ratio';
import { MapLegend } from './map-legend';
import { PointsTable } from './points-table';
import { SelectionPanel } from './selection-panel';
import { ShelfLifeKey, ShelfLifeOverlay } from './shelf-life-overlay';
import { StateMap } from './state-map';

/**
 * A programme's state map: the computed diagram with the programme's recipes and bench outcomes
 * over it, its layers, the calibration switch, the shelf-life layer, a selection to shortlist and
 * the points as a table. The view (axis, theory, layers, zoom) lives in the address.
 */
export function MapScreen({ programme, canShortlist }: { programme: ProgrammeView; canShortlist: boolean }) {
  const points = useMapPoints(programme.id);
  const calibrations = useCalibrations(programme.id);
  const inUse = calibrations.data?.inUse ?? null;
  const calibration = useMemo<CalibrationOverlay | null>(
    () => (inUse && inUse.acceptedAt ? { parameters: inUse.parameters, shiftStandardError: inUse.estimates.attractionShift.standardError, dateLabel: formatDate(inUse.acceptedAt) } : null),
    [inUse?.id, inUse?.acceptedAt],
  );
  if (points.isPending || calibrations.isPending) return <Loading label="Loading the programme's points…" />;
  if (points.isError) return <ErrorState error={points.error} retry={() => points.refetch()} />;
  if (calibrations.isError) return <ErrorState error={calibrations.error} retry={() => calibrations.refetch()} />;
  return <LoadedMap programme={programme} data={points.data} canShortlist={canShortlist} calibration={calibration} />;
}

function LoadedMap({ programme, data, canShortlist, calibration }: { programme: ProgrammeView; data: MapOverlay; canShortlist: boolean; calibration: CalibrationOverlay | null }) {
  const [params, setParams] = useUrlParams();
  const navigate = useNavigate();
  const recipeRows = data.recipes;
  const sizeRatio = useMemo(() => middleSizeRatio(recipeRows.map((r) => r.sizeRatio).filter((v): v is number => v !== null)), [recipeRows]);
  const depletion = programme.attractionSource === 'depletion' && sizeRatio !== null;
  const view = parseMapView(params, depletion ? 'polymerReservoir' : 'b2');
  // Every change is applied to the newest parameters (useUrlParams), not to this render's view:
  // two quick changes in a row (axis, then theory) must both survive.
  const setView = useCallback(
    (change: Partial<MapView> | ((current: MapView) => Partial<MapView>)) =>
      setParams((previous) => {
        const current = parseMapView(previous, depletion ? 'polymerReservoir' : 'b2');
        return writeMapView(previous, { ...current, ...(typeof change === 'function' ? change(current) : change) });
      }, { replace: true }),
    [setParams, depletion],
  );
  const strongest = useMemo(() => {
    const finite = (values: (number | null)[]) => values.filter((v): v is number => v !== null && Number.isFinite(v));
    const b2s = finite(recipeRows.map((r) => r.reducedB2));
    const polymers = finite(recipeRows.map((r) => r.polymerReservoir));
    return { reducedB2: b2s.length ? Math.min(...b2s) : null, polymerReservoir: polymers.length ? Math.max(...polymers) : null };
  }, [recipeRows]);
  const layersKey = [...view.layers].sort().join(',');
  const layers = useMemo(() => view.layers, [layersKey]);
  // With an accepted calibration the map is drawn with it unless the view asks for the theory.
  const drawnCalibrated = calibration !== null && view.calibrated;
  const built = useStateMapDrawing({ view, sizeRatio, strongest, parameters: drawnCalibrated ? calibration.parameters : undefined });
  const calibrationLines = useCalibrationOverlay(built.map, calibration, drawnCalibrated);
  const showCalibration = calibration !== null && layers.has('calibrated');
  const drawing = useMemo(
    () => (built.drawing && showCalibration ? { ...built.drawing, lines: [...built.drawing.lines, ...calibrationLines] } : built.drawing),
    [built.drawing, showCalibration, calibrationLines],
  );
  const [selected, setSelected] = useState<MapPoint[]>([]);
  // The export buttons need the elements themselves, so keep them in state (a ref would not re-render).
  const [svgElement, setSvgElement] = useState<SVGSVGElement | null>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const placed = useMemo(() => (built.map ? placePoints(built.map, data, { minAge: view.minAge, maxAge: view.maxAge }) : { points: [], skipped: 0 }), [built.map, data, view.minAge, view.maxAge]);
  const visible = useMemo(
    () => placed.points.filter((p) => (p.kind === 'recipe' ? layers.has('recipes') : layers.has('observations'))),
    [placed.points, layers],
  );
  const selectedKeys = useMemo(() => new Set(selected.map((p) => p.key)), [selected]);
  // Zoom events arrive many per second while panning: the figure follows them at once, and the
  // URL (which re-renders the whole screen) is written once the movement settles.
  const zoomKey = JSON.stringify(view.zoom);
  const [liveZoom, setLiveZoom] = useState<Viewport | null>(view.zoom);
  useEffect(() => setLiveZoom(view.zoom), [zoomKey]);
  const pendingZoom = useRef<ReturnType<typeof setTimeout> | null>(null);
  useEffect(() => () => void (pendingZoom.current && clearTimeout(pendingZoom.current)), []);
  const onZoomChange = useCallback(
    (zoom: Viewport | null) => {
      setLiveZoom(zoom);
      if (pendingZoom.current) clearTimeout(pendingZoom.current);
      pendingZoom.current = setTimeout(
        () => setParams((previous) => writeMapView(previous, { ...parseMapView(previous, depletion ? 'polymerReservoir' : 'b2'), zoom }), { replace: true }),
        250,
      );
    },
    [setParams, depletion],
  );
  const onOpen = useCallback((p: MapPoint) => p.code && navigate(`/recipes/${p.code}`), [navigate]);
  // The shelf-life layer: the programme's Cox model across φ and attraction, read only when asked for.
  const shelfLife = useProgrammeShelfLife(programme.id, null, view.shelfLife);
  const shelfLayer = useMemo<ShelfLifeLayer | null>(() => {
    if (!view.shelfLife || !shelfLife.data || !built.map || !drawing) return null;
    const sampled = new Set(shelfLife.data.recipes.map((r) => r.recipeId));
    const samplePoints = placed.points.filter((p) => p.kind === 'recipe' && sampled.has(p.id)).map((p): [number, number] => [p.x, p.y]);
    return shelfLifeLayer(shelfLife.data.drivers, { model: built.map.model, sign: built.map.y.inverted ? -1 : 1, xDomain: drawing.xDomain, yDomain: drawing.yDomain }, samplePoints);
  }, [view.shelfLife, shelfLife.data, built.map, drawing, placed.points]);
  const decorations = useCallback((scales: Parameters<typeof ShelfLifeOverlay>[0]['scales']) => (shelfLayer ? <ShelfLifeOverlay layer={shelfLayer} scales={scales} /> : null), [shelfLayer]);

  if (!built.map || !drawing) return <Notice tone="error" title="The map could not be computed">{built.error?.message}</Notice>;
  const recipes = placed.points.filter((p) => p.kind === 'recipe').length;
  const observations = placed.points.length - recipes;
  const mismatches = placed.points.filter((p) => p.agrees === false).length;
  const offMap = placed.points.filter((p) => p.y > drawing.yDomain[1] || p.y < drawing.yDomain[0]).length;
  const toggle = (layer: Layer) =>
    setView((current) => {
      const layers = new Set(current.layers);
      if (layers.has(layer)) layers.delete(layer);
      else layers.add(layer);
      return { layers };
    });
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex flex-wrap items-end gap-3">
          <MapControls view={view} onChange={setView} depletion={depletion} />
          {calibration && <CalibrationSwitch calibration={calibration} calibrated={view.calibrated} onChange={(calibrated) => setView({ calibrated })} />}
        </div>
        <MapExports svg={svgElement} canvas={canvasRef.current} points={visible} yLabel={drawing.yLabel.split(' — ')[0]} displayY={drawing.displayY} fileStem={`gelwright-${programme.codePrefix.toLowerCase()}-map`} />
      </div>
      <div className="grid gap-5 xl:grid-cols-[minmax(0,1fr)_18rem]">
        <Card>
          <StateMap
            drawing={drawing}
            points={visible}
            layers={layers}
            zoom={liveZoom}
            onZoomChange={onZoomChange}
            selected={selectedKeys}
            onSelect={setSelected}
            onOpen={onOpen}
            svgRef={setSvgElement}
            canvasRef={canvasRef}
            decorations={view.shelfLife ? decorations : undefined}
            ariaLabel={`State map of ${programme.name}: ${drawing.modelLabel}; ${recipes} recipes and ${observations} observations, ${mismatches} differing from the prediction`}
          />
          <p className="mt-3 text-xs text-ink-soft" data-testid="map-model-note">
            Lines are approximate: {drawing.modelLabel}. {drawing.notes.join(' ')}
            {drawnCalibrated ? ` Calibrated ${calibration.dateLabel} to the team's bench: still approximate, within the band drawn.` : calibration ? ' Drawn with the uncalibrated theory; the stored predictions of recipes and observations (their shapes and rings) use the calibration.' : ''}
            {placed.skipped > 0 ? ` ${placed.skipped} point${placed.skipped === 1 ? ' has' : 's have'} no coordinate on this axis and ${placed.skipped === 1 ? 'is' : 'are'} not shown.` : ''}
            {offMap > 0 ? ` ${offMap} point${offMap === 1 ? ' lies' : 's lie'} beyond the drawn attraction range (stronger than the map's top) and ${offMap === 1 ? 'is' : 'are'} not shown.` : ''}
          </p>
        </Card>
        <div className="flex flex-col gap-5">
          <Card title="Layers and key">
            <MapLegend layers={view.layers} onToggle={toggle} available={LAYERS.filter((l) => l !== 'calibrated' || calibration !== null)} />
          </Card>
          <Card title="Shelf life">
            <label className="flex cursor-pointer items-center gap-2 text-sm">
              <input type="checkbox" checked={view.shelfLife} onChange={() => setView((current) => ({ shelfLife: !current.shelfLife }))} className="h-4 w-4 accent-fjord-500" />
              Predicted median days to collapse
            </label>
            {view.shelfLife && (
              <div className="mt-3">
                {shelfLife.isError ? <ErrorState error={shelfLife.error} retry={() => shelfLife.refetch()} /> : <ShelfLifeKey layer={shelfLayer} loading={shelfLife.isPending} />}
              </div>
            )}
          </Card>
          <Card title="Selection">
            <SelectionPanel points={selected} programmeId={programme.id} goalState={programme.goalState} canShortlist={canShortlist} onClear={() => setSelected([])} />
          </Card>
        </div>
      </div>
      <PointsTable points={visible} yLabel={drawing.yLabel.split(' — ')[0]} displayY={drawing.displayY} />
      <SafetyNote compact />
    </div>
  );
}
