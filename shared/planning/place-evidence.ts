import { attractionToMapY, PhysicsArgumentError, type StateMap } from '../physics';
import { mapPosition } from './map-position';
import type { EvidenceInput } from './types';

export interface PlacedEvidence extends EvidenceInput {
  x: number;
  u: number;
}

/**
 * Bench observations placed on a plan's map in normalised coordinates (mapPosition): one at the
 * map's own size ratio by its polymer fraction, any other through its B2* (extended law of
 * corresponding states, Noro & Frenkel 2000) — as the state map screen places them. Observations
 * the physics cannot place are left out.
 */
export function placeEvidence(map: StateMap, evidence: EvidenceInput[]): PlacedEvidence[] {
  const placed: PlacedEvidence[] = [];
  for (const item of evidence) {
    try {
      const y = attractionToMapY(map, item.attraction);
      if (!Number.isFinite(y) || !(item.phi > 0)) continue;
      placed.push({ ...item, ...mapPosition(map, item.phi, y) });
    } catch (error) {
      if (!(error instanceof PhysicsArgumentError)) throw error;
    }
  }
  return placed;
}
