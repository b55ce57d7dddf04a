import { useMemo } from 'react';
import { line } from 'd3-shape';
import type { ClassifierParameters, MapModel } from '@shared/physics/map/types';
import { cachedStateMap } from '@shared/state-map-cache';
import { drawingFromStateMap, drawnY } from '../geometry/from-state-map';
import { DEFAULT_LAYERS, type Layer } from '../geometry/map-view';
import type { MapScales } from '../geometry/scales';
import { axisTop } from '../hooks/use-map-drawing';
import { StaticStateMap } from './state-map';

const LAYERS = new Set<Layer>(DEFAULT_LAYERS);

/** A numbered composition on the planner's map, at [φ, y in the map's own unit]. */
export interface PlanMapMark {
  number: number;
  phi: number;
  y: number;
  label: string;
  made: boolean;
}

export interface PlanMapProps {
  model: MapModel;
  parameters: ClassifierParameters;
  polydispersity: number | null;
  /** Outline of the searched ranges and rings around the compositions that meet the plan, as [φ, y]. */
  searched: [number, number][];
  feasible: [number, number][][];
  candidates: PlanMapMark[];
  experiments: PlanMapMark[];
  title: string;
  height?: number;
}

/**
 * A plan on the state map it was computed on (same model and classifier parameters): the searched
 * ranges dashed, the feasible window shaded, candidates as numbered ink discs (filled once made
 * into recipes) and next experiments as numbered amber diamonds. The map reaches up to the top of
 * the searched ranges.
 */
export function PlanMap({ model, parameters, polydispersity, searched, feasible, candidates, experiments, title, height = 480 }: PlanMapProps) {
  const built = useMemo(() => {
    const ys = searched.map(([, y]) => y);
    const strongest = model.kind === 'depletion' ? { reducedB2: null, polymerReservoir: Math.max(...ys) } : { reducedB2: Math.min(...ys), polymerReservoir: null };
    const map = cachedStateMap(model, { parameters, polydispersity: polydispersity ?? undefined, yMax: axisTop(model, strongest) });
    return { map, drawing: drawingFromStateMap(map) };
  }, [model, parameters, polydispersity, searched]);
  const { map, drawing } = built;
  const path = (points: [number, number][], scales: MapScales, closed: boolean) =>
    (line<[number, number]>()
      .defined(([x, y]) => Number.isFinite(x) && Number.isFinite(y))
      .x(([x]) => scales.x(x))
      .y(([, y]) => scales.y(drawnY(map, y)))(points) ?? '') + (closed ? 'Z' : '');
  const decorations = (scales: MapScales) => (
    <g data-plan-overlay>
      {feasible.length > 0 && <path d={feasible.map((ring) => path(ring, scales, true)).join(' ')} fill="#2c6e7f" fillOpacity={0.18} fillRule="evenodd" stroke="#235a68" strokeWidth={1.6} data-plan-window />}
      {searched.length > 2 && <path d={path(searched, scales, true)} fill="none" stroke="#1c2630" strokeWidth={1.2} strokeDasharray="5 4" data-plan-searched />}
      {experiments.map((e) => (
        <g key={`e${e.number}`} transform={`translate(${scales.x(e.phi)},${scales.y(drawnY(map, e.y))})`} data-plan-experiment={e.number}>
          <title>{e.label}</title>
          <path d="M0,-9L9,0L0,9L-9,0Z" fill={e.made ? '#b7791f' : '#fbf4e6'} stroke="#7f5313" strokeWidth={1.6} />
          <text y={3.5} textAnchor="middle" fontSize={10} fontWeight={600} fill={e.made ? '#ffffff' : '#7f5313'}>
            {e.number}
          </text>
        </g>
      ))}
      {candidates.map((c) => (
        <g key={`c${c.number}`} transform={`translate(${scales.x(c.phi)},${scales.y(drawnY(map, c.y))})`} data-plan-candidate={c.number}>
          <title>{c.label}</title>
          <circle r={8.5} fill={c.made ? '#1c2630' : '#ffffff'} stroke="#1c2630" strokeWidth={1.6} />
          <text y={3.5} textAnchor="middle" fontSize={10} fontWeight={600} fill={c.made ? '#ffffff' : '#1c2630'}>
            {c.number}
          </text>
        </g>
      ))}
    </g>
  );
  return (
    <StaticStateMap
      drawing={drawing}
      points={[]}
      layers={LAYERS}
      height={height}
      decorations={decorations}
      ariaLabel={`State map of ${title}: ${drawing.modelLabel}; ${candidates.length} candidates, ${experiments.length} next experiments, the feasible window ${feasible.length > 0 ? 'shaded' : 'empty'}`}
    />
  );
}
