import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { attractionOnMap } from './attraction-on-map';
import { resolveClassifierParameters } from './classifier-parameters';
import { framesOfMap } from './frames-of-map';
import { PointClassification } from './point-classification';
import { nearestActiveSegment, segmentIndexOf } from './segment-index';
import { decideCause, emptyRow, stateOfCause } from './state-rule';
import type { AttractionInput, ClassifierParameters, StateMap } from './types';

// Imported bindings read once: under some loaders (tsx) each read of an import is an accessor
// call, and everything below runs per point.
const CLOSE_PACKING = FCC_CLOSE_PACKING;
const frames = framesOfMap;
const placeAttraction = attractionOnMap;
const decide = decideCause;
const indexOf = segmentIndexOf;
const nearestTo = nearestActiveSegment;
const stateOf = stateOfCause;
const Classification = PointClassification;
const checkVolumeFraction = requireVolumeFraction;

/**
 * Predicted state of a composition on a prebuilt map, its nearest state-changing boundary and
 * the margin to it (physics.md §5).
 *
 * Steps: the attraction (any AttractionInput) becomes B2* and the map's y; the effective
 * B2*_eff = B2* − attractionShift fixes the theory-frame level u₀; the rule (see causeOnRow) is
 * applied with the map's precomputed tables (interval lookup and linear interpolation — no
 * coexistence is solved per point).
 *
 * Margin: the Euclidean distance, in normalised map coordinates (x = φ/φ_cp, u = (y − y.weakest)/
 * (y.strongest − y.weakest), so the whole map is a unit square), from the point to the nearest
 * boundary segment across which the predicted state changes (lines that do not change the state
 * there, such as percolation, are skipped). The boundaries are indexed after Douglas–Peucker
 * simplification to 1e-4, so the margin is exact to 1e-4 of the map's size. `marginDescription`
 * also gives Δφ and Δy (map units) from the point to that boundary point. Points off the map are
 * allowed (their margin can exceed 1).
 *
 * The result's `reason` and `marginDescription` are computed on first read; see
 * PointClassification (use `toJSON()` for a plain copy).
 *
 * @param map a StateMap from buildStateMap (used as is; JSON round trips are fine).
 * @param point `{ phi, attraction }` with 0 < φ < φ_cp.
 * @param parameters optional overrides of the map's parameters. A different attractionShift
 *   moves the point relative to the drawn boundaries; other thresholds change the rule but not the
 *   drawn lines or which segments count for the margin (rebuild the map for that).
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), a bad attraction or bad parameters.
 * @example classifyPoint(map, { phi: 0.2, attraction: { kind: 'b2', value: -4 } }).state // 'gel'
 */
export function classifyPoint(map: StateMap, point: { phi: number; attraction: AttractionInput }, parameters?: Partial<ClassifierParameters>): PointClassification {
  const context = frames(map);
  const { theory, drawn } = context;
  if (point === null || typeof point !== 'object') throw new PhysicsArgumentError('point', '{ phi, attraction }', point);
  const phi = point.phi > 0 && point.phi < CLOSE_PACKING ? point.phi : checkVolumeFraction('phi', point.phi);
  const used = parameters ? resolveClassifierParameters({ ...map.parameters, ...parameters }) : map.parameters;
  const crystalSuppressed = map.polydispersity !== null && map.polydispersity > used.polydispersityCrystalThreshold;
  const { b2, y } = placeAttraction(map, drawn, point.attraction, placed);
  const effectiveB2 = b2 - used.attractionShift;
  // Theory-frame level, and the drawn position (the map's lines carry the map's own shift).
  const u0 = used.attractionShift === 0 ? theory.uFromY(y) : theory.uFromY(theory.yFromB2(effectiveB2));
  const yDrawn = used.attractionShift === map.parameters.attractionShift ? y : drawn.yFromB2(effectiveB2 + map.parameters.attractionShift);
  const cause = decide(map.tables, used, crystalSuppressed, phi, u0, effectiveB2, row);

  const index = context.index ?? (context.index = indexOf(map));
  const nearest = nearestTo(index, phi / CLOSE_PACKING, drawn.uFromY(yDrawn));
  if (nearest === null) {
    return new Classification(stateOf(cause), NO_BOUNDARY, 1, cause, row, phi, used, map.polydispersity, map.y.label, NaN, NaN);
  }
  return new Classification(
    stateOf(cause),
    index.boundaries[nearest.curveIndex],
    nearest.distance,
    cause,
    row,
    phi,
    used,
    map.polydispersity,
    map.y.label,
    nearest.x * CLOSE_PACKING - phi,
    drawn.yFromU(nearest.u) - yDrawn,
  );
}

/** Scratch thresholds of the rule (copied into each result) and scratch placement. */
const row = emptyRow();
const placed = { b2: 0, y: 0 };

const NO_BOUNDARY = Object.freeze({ id: 'binodal' as const, label: 'none' });
