import { modeCouplingGlassLine } from '../arrest/mode-coupling-glass-line';
import { SHORT_RANGE_LIMIT } from '../arrest/short-range-limit';
import { reducedB2FromStickiness } from '../attraction/reduced-b2-from-stickiness';
import type { MapFrame } from './map-frame';
import type { ClassifierParameters, GlassLineMapping, GlassLineSource, LevelCurve, MapModel } from './types';

export { SHORT_RANGE_LIMIT };

/**
 * The highest φ of a map's glass line (its nose): no gel can form at or above it, whatever the
 * attraction. Used where a whole map is scanned for gels (calibration).
 */
export function highestGlassPhi(map: { tables: { glass: { phi: number[] } } }): number {
  return Math.max(...map.tables.glass.phi);
}

/**
 * The range of a map model's attraction in σ (depletion: q), or null for the generic models,
 * which place every attraction by its B2* as a short-range one (their U/kT axis is only a way of
 * reading B2*).
 */
export function attractionRangeOfModel(model: MapModel): number | null {
  return model.kind === 'depletion' ? model.q : null;
}

/**
 * The glass line of a map in its theory frame: φ_g against u₀, and the u₀ of the nose past which
 * the glass is attractive. Short-range models take the adhesive-sphere MCT line
 * (modeCouplingGlassLine): each stickiness level τ is placed at B2* = 1 − 1/(4τ) on the map's
 * axis. Longer ranges take the hard-sphere value at every level (no attractive glass). With the
 * 'rescaled' mapping every φ is multiplied by glassPhi/φ_c(hard spheres). Levels stop at the
 * theory frame's top `topU` (the line's value there interpolated in B2*). Internal.
 */
export function glassLineTable(model: MapModel, theory: MapFrame, parameters: ClassifierParameters, mapping: GlassLineMapping, topU = 1): { curve: LevelCurve; attractiveFrom: number | null; source: GlassLineSource } {
  const line = modeCouplingGlassLine();
  const scale = mapping === 'rescaled' ? parameters.glassPhi / line.hardSpherePhi : 1;
  const range = attractionRangeOfModel(model);
  const base = { mapping, computedHardSpherePhi: line.hardSpherePhi, scale, points: line.points, cutoff: line.cutoff, range };
  if (range !== null && range > SHORT_RANGE_LIMIT) {
    const phi = line.hardSpherePhi * scale;
    return { curve: { u: [0, 1], phi: [phi, phi] }, attractiveFrom: null, source: { ...base, kind: 'hardSphere' } };
  }
  const u: number[] = [];
  const phi: number[] = [];
  let attractiveFrom: number | null = null;
  // Levels stronger than the theory's top are not needed (lookups clamp there); the line ends on
  // the top, interpolated in B2* — placing a level far beyond it would cost a root solve of the
  // depletion B2* per level.
  const topB2 = theory.b2FromY(theory.yFromU(topU));
  let previousB2 = NaN;
  for (let i = 0; i < line.tau.length; i++) {
    const b2 = line.tau[i] === Infinity ? 1 : reducedB2FromStickiness(line.tau[i]);
    if (b2 < topB2 && i > 0) {
      const t = (previousB2 - topB2) / (previousB2 - b2);
      if (topU > u[u.length - 1]) {
        u.push(topU);
        phi.push((line.phi[i - 1] + t * (line.phi[i] - line.phi[i - 1])) * scale);
        if (i === line.nose) attractiveFrom = topU;
      }
      break;
    }
    previousB2 = b2;
    const level = theory.uFromY(theory.yFromB2(b2));
    if (u.length > 0 && !(level > u[u.length - 1])) continue;
    u.push(level + 0); // + 0 turns −0 into 0 (JSON has no −0)
    phi.push(line.phi[i] * scale);
    if (i === line.nose) attractiveFrom = level;
  }
  return { curve: { u, phi }, attractiveFrom, source: { ...base, kind: 'mct' } };
}
