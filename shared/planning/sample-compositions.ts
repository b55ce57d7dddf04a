import { classifyPoint, PhysicsArgumentError, type BoundaryId, type PredictedState } from '../physics';
import { haltonPoints } from './halton-points';
import { roundComposition } from './round-composition';
import type { CompositionSpace, ValueRange } from './types';

export interface SampledComposition {
  phi: number;
  level: number;
  state: PredictedState;
  margin: number;
  nearestBoundary: { id: BoundaryId; label: string };
}

/**
 * Classifies `count` compositions spread over φ × dose by the Halton sequence (haltonPoints,
 * bases 2 and 3 mapped linearly onto the ranges), each rounded to bench precision
 * (roundComposition) and kept inside the ranges, on the space's map with classifyPoint. Compositions the space cannot place,
 * or the physics refuses, are counted in `unplaced`.
 * @example sampleCompositions(space, { min: 0.05, max: 0.4 }, { min: 0, max: 12 }, 4096).samples.length
 */
export function sampleCompositions(space: CompositionSpace, phi: ValueRange, level: ValueRange, count: number): { samples: SampledComposition[]; unplaced: number } {
  const unit = haltonPoints(count);
  const samples: SampledComposition[] = [];
  let unplaced = 0;
  for (let i = 0; i < count; i++) {
    const [roundedPhi, roundedLevel] = roundComposition(phi.min + (phi.max - phi.min) * unit[2 * i], level.min + (level.max - level.min) * unit[2 * i + 1]);
    // Rounding may step just past a limit; the limits asked for win.
    const p = Math.min(phi.max, Math.max(phi.min, roundedPhi));
    const c = Math.min(level.max, Math.max(level.min, roundedLevel));
    const attraction = p > 0 ? space.place(p, c) : null;
    if (!attraction) {
      unplaced += 1;
      continue;
    }
    try {
      const classified = classifyPoint(space.map, { phi: p, attraction });
      samples.push({ phi: p, level: c, state: classified.state, margin: classified.margin, nearestBoundary: classified.nearestBoundary });
    } catch (error) {
      if (!(error instanceof PhysicsArgumentError)) throw error;
      unplaced += 1;
    }
  }
  return { samples, unplaced };
}
