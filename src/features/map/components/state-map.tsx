import { useEffect, useId, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { select } from 'd3-selection';
import { zoom as d3zoom, zoomIdentity, type ZoomBehavior, type ZoomTransform } from 'd3-zoom';
import { brush as d3brush } from 'd3-brush';
import { Button } from '@/components/ui/button';
import { createHitIndex } from '../geometry/hit-index';
import type { Layer } from '../geometry/map-view';
import { paintPoints } from '../geometry/point-painter';
import { gridRegions } from '../geometry/regions';
import { mapScales, type MapFrame, type MapScales } from '../geometry/scales';
import type { MapDrawing, MapPoint, Viewport } from '../geometry/types';
import { HoverCard } from './hover-card';
import { MapAxes, MapLayers } from './map-layers';

const MARGIN = { top: 16, right: 24, bottom: 48, left: 64 };

export interface StateMapProps {
  drawing: MapDrawing;
  points: MapPoint[];
  layers: Set<Layer>;
  zoom: Viewport | null;
  onZoomChange: (zoom: Viewport | null) => void;
  selected: Set<string>;
  onSelect: (points: MapPoint[]) => void;
  onOpen: (point: MapPoint) => void;
  height?: number;
  ariaLabel: string;
  /** Small maps (recipe editor, shortlists) do not zoom or select. */
  interactive?: boolean;
  svgRef?: React.Ref<SVGSVGElement>;
  canvasRef?: React.RefObject<HTMLCanvasElement | null>;
  /** Extra shapes drawn over the regions and lines, under the points, clipped to the plot (e.g. a planner's window). */
  decorations?: (scales: MapScales) => React.ReactNode;
}

declare global {
  interface Window {
    /** Paint timings for the benchmark (npm run bench); harmless in normal use. */
    __gelwrightMapPaints?: number[];
    /** Redraw timings: from a zoom or pan event to just after the frame that shows it. */
    __gelwrightMapRedraws?: number[];
    __gelwrightZoomAt?: number;
  }
}

/**
 * The state map figure: computed regions and boundaries in SVG, the team's points on a
 * canvas over it, wheel/drag to zoom and pan (d3-zoom), a brush to select (d3-brush),
 * hover for a card and click to open a record.
 */
export function StateMap({ drawing, points, layers, zoom, onZoomChange, selected, onSelect, onOpen, height = 560, ariaLabel, interactive = true, svgRef, canvasRef, decorations }: StateMapProps) {
  const clipId = useId().replace(/:/g, '');
  const wrapper = useRef<HTMLDivElement>(null);
  const overlay = useRef<SVGRectElement>(null);
  const brushLayer = useRef<SVGGElement>(null);
  const localCanvas = useRef<HTMLCanvasElement>(null);
  const canvas = canvasRef ?? localCanvas;
  const [width, setWidth] = useState(800);
  const [hovered, setHovered] = useState<{ point: MapPoint; x: number; y: number } | null>(null);
  const [selecting, setSelecting] = useState(false);
  const zoomBehaviour = useRef<ZoomBehavior<SVGRectElement, unknown> | null>(null);

  useLayoutEffect(() => {
    const element = wrapper.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => setWidth(Math.max(320, Math.floor(entry.contentRect.width))));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  const frame: MapFrame = { width, height, margin: MARGIN };
  const full: Viewport = { x: drawing.xDomain, y: drawing.yDomain };
  const view = zoom ?? full;
  const scales = useMemo(() => mapScales(frame, view), [width, height, view.x[0], view.x[1], view.y[0], view.y[1]]);
  const baseScales = useMemo(() => mapScales(frame, full), [width, height, full.x[0], full.x[1], full.y[0], full.y[1]]);
  // Regions are traced once per drawing over the whole domain; zooming only re-projects them.
  const regions = useMemo(() => gridRegions(drawing.regionGrid, full), [drawing]);
  // The hit index (a quadtree of every point in pixels) is built when the pointer first needs it
  // after the view changed, not on every frame of a pan.
  const hitCache = useRef<{ points: MapPoint[]; scales: typeof scales; index: ReturnType<typeof createHitIndex> } | null>(null);
  const hits = useMemo(
    () => ({
      index: () => {
        const cached = hitCache.current;
        if (cached && cached.points === points && cached.scales === scales) return cached.index;
        const index = createHitIndex(points, scales);
        hitCache.current = { points, scales, index };
        return index;
      },
    }),
    [points, scales],
  );

  // Paint the points whenever they, the view or the selection change.
  useEffect(() => {
    const element = canvas.current;
    if (!element) return;
    const ratio = window.devicePixelRatio || 1;
    element.width = Math.round(scales.inner.width * ratio);
    element.height = Math.round(scales.inner.height * ratio);
    const started = performance.now();
    paintPoints(element.getContext('2d')!, points, scales, { selected, highlight: hovered?.point.key ?? null, showMismatches: layers.has('mismatches'), pixelRatio: ratio });
    (window.__gelwrightMapPaints ??= []).push(performance.now() - started);
    if (window.__gelwrightMapPaints.length > 500) window.__gelwrightMapPaints.splice(0, 250);
    const zoomAt = window.__gelwrightZoomAt;
    if (zoomAt !== undefined) {
      window.__gelwrightZoomAt = undefined;
      // After the next frame: React's commit, the SVG and the canvas are then on screen.
      requestAnimationFrame(() => setTimeout(() => (window.__gelwrightMapRedraws ??= []).push(performance.now() - zoomAt), 0));
    }
  }, [points, scales, selected, hovered, layers, canvas]);

  // Zoom and pan: d3-zoom's transform rescales the full-domain scales to the visible domain.
  useEffect(() => {
    if (!interactive || !overlay.current) return;
    const behaviour = d3zoom<SVGRectElement, unknown>()
      .scaleExtent([1, 60])
      .translateExtent([[0, 0], [baseScales.inner.width, baseScales.inner.height]])
      .extent([[0, 0], [baseScales.inner.width, baseScales.inner.height]])
      .on('zoom', (event: { transform: ZoomTransform; sourceEvent: Event | null }) => {
        if (!event.sourceEvent) return;
        window.__gelwrightZoomAt ??= performance.now();
        const t = event.transform;
        const next = t.k === 1 && t.x === 0 && t.y === 0 ? null : { x: t.rescaleX(baseScales.x).domain() as [number, number], y: t.rescaleY(baseScales.y).domain() as [number, number] };
        onZoomChange(next);
      });
    zoomBehaviour.current = behaviour;
    const selection = select(overlay.current);
    selection.call(behaviour);
    return () => void selection.on('.zoom', null);
  }, [interactive, baseScales, onZoomChange]);

  // Keep d3-zoom's own transform in step with a view that came from the URL or the buttons.
  useEffect(() => {
    if (!zoomBehaviour.current || !overlay.current) return;
    const k = (full.x[1] - full.x[0]) / (view.x[1] - view.x[0]);
    const transform = zoom ? zoomIdentity.translate(-baseScales.x(view.x[0]) * k, -baseScales.y(view.y[1]) * k).scale(k) : zoomIdentity;
    select(overlay.current).property('__zoom', transform);
  }, [zoom, baseScales]);

  // Brush to select: only while "Select points" is on, so it never fights the pan.
  useEffect(() => {
    if (!interactive || !brushLayer.current) return;
    const layer = select(brushLayer.current);
    if (!selecting) {
      layer.selectAll('*').remove();
      layer.on('.brush', null);
      return;
    }
    const behaviour = d3brush<unknown>()
      .extent([[0, 0], [scales.inner.width, scales.inner.height]])
      .on('end', (event: { selection: [[number, number], [number, number]] | null }) => {
        if (!event.selection) return;
        onSelect(hits.index().within(event.selection));
        layer.call(behaviour.move as never, null);
      });
    layer.call(behaviour as never);
    return () => void layer.on('.brush', null);
  }, [selecting, interactive, scales, hits, onSelect]);

  const pointerAt = (event: React.PointerEvent | React.MouseEvent) => {
    const box = (event.currentTarget as Element).getBoundingClientRect();
    return [event.clientX - box.left, event.clientY - box.top] as const;
  };
  const zoomBy = (factor: number) => {
    if (!zoomBehaviour.current || !overlay.current) return;
    const selection = select(overlay.current);
    zoomBehaviour.current.scaleBy(selection, factor);
    const t = (overlay.current as unknown as { __zoom: ZoomTransform }).__zoom;
    onZoomChange(t.k <= 1.0001 ? null : { x: t.rescaleX(baseScales.x).domain() as [number, number], y: t.rescaleY(baseScales.y).domain() as [number, number] });
  };

  return (
    <div ref={wrapper} className="relative w-full">
      {interactive && (
        <div className="mb-2 flex flex-wrap items-center gap-2" role="toolbar" aria-label="Map view">
          <Button size="sm" variant="secondary" onClick={() => zoomBy(1.6)}>
            Zoom in
          </Button>
          <Button size="sm" variant="secondary" onClick={() => zoomBy(1 / 1.6)} disabled={!zoom}>
            Zoom out
          </Button>
          <Button size="sm" variant="secondary" onClick={() => onZoomChange(null)} disabled={!zoom}>
            Whole map
          </Button>
          <Button size="sm" variant={selecting ? 'primary' : 'secondary'} aria-pressed={selecting} onClick={() => setSelecting((s) => !s)}>
            {selecting ? 'Selecting: drag a box' : 'Select points'}
          </Button>
          <span className="text-xs text-ink-faint">Scroll to zoom, drag to pan.</span>
        </div>
      )}
      <div className="relative" style={{ height }}>
        <svg ref={svgRef} role="img" aria-label={ariaLabel} width={width} height={height} viewBox={`0 0 ${width} ${height}`} className="absolute inset-0 select-none" data-testid="state-map">
          <title>{ariaLabel}</title>
          <g transform={`translate(${MARGIN.left},${MARGIN.top})`}>
            <MapLayers drawing={drawing} regions={regions} scales={scales} layers={layers} clipId={clipId} />
            {decorations && <g clipPath={`url(#${clipId})`}>{decorations(scales)}</g>}
            <MapAxes scales={scales} xLabel={drawing.xLabel} yLabel={drawing.yLabel} displayY={drawing.displayY} />
            <g data-points-layer />
          </g>
        </svg>
        <canvas
          ref={canvas}
          className="pointer-events-none absolute"
          data-offset-x={MARGIN.left}
          data-offset-y={MARGIN.top}
          style={{ left: MARGIN.left, top: MARGIN.top, width: scales.inner.width, height: scales.inner.height }}
          aria-hidden
        />
        <svg className="absolute" style={{ left: MARGIN.left, top: MARGIN.top }} width={scales.inner.width} height={scales.inner.height} aria-hidden={!interactive}>
          <rect
            ref={overlay}
            width={scales.inner.width}
            height={scales.inner.height}
            fill="transparent"
            style={{ cursor: hovered ? 'pointer' : interactive ? 'grab' : 'default' }}
            onPointerMove={(event) => {
              // While a button is held the map is being dragged: no hover card, no hit testing.
              if (event.buttons !== 0) {
                if (hovered) setHovered(null);
                return;
              }
              const [x, y] = pointerAt(event);
              const point = hits.index().nearest(x, y);
              setHovered((current) => (point ? (current?.point === point ? current : { point, x: scales.x(point.x), y: scales.y(point.y) }) : null));
            }}
            onPointerLeave={() => setHovered(null)}
            onClick={(event) => {
              const [x, y] = pointerAt(event);
              const point = hits.index().nearest(x, y);
              if (point) onOpen(point);
            }}
          />
          <g ref={brushLayer} />
        </svg>
        {hovered && <HoverCard point={hovered.point} x={hovered.x + MARGIN.left} y={hovered.y + MARGIN.top} width={width} yLabel={drawing.yLabel.split(' — ')[0]} displayY={drawing.displayY} />}
      </div>
    </div>
  );
}

const NO_SELECTION = new Set<string>();
const ignore = () => {};

/** A map to look at, not to work with: no zoom, pan, brush or click (small maps, print). */
export function StaticStateMap(props: Pick<StateMapProps, 'drawing' | 'points' | 'layers' | 'height' | 'ariaLabel' | 'decorations'>) {
  return <StateMap {...props} zoom={null} onZoomChange={ignore} selected={NO_SELECTION} onSelect={ignore} onOpen={ignore} interactive={false} />;
}
