import { highestGlassPhi, type StateMap } from '../physics';
import { gelOnset } from './gel-onset';
import type { GelOnset } from './types';

/**
 * gelOnset at evenly spaced volume fractions from near zero to just below the glass line: the
 * expensive part of drawing a gel boundary, computed once and reused for every shift and
 * threshold (gelBoundaryLine); onsets to 1e-4 in B2* by default, far below what a map shows.
 * @example gelOnsetProfile(map, 100).length // 100
 */
export function gelOnsetProfile(map: StateMap, samples = 120, tolerance = 1e-4): { phi: number; onset: GelOnset }[] {
  if (!Number.isInteger(samples) || samples < 2) throw new Error(`gelOnsetProfile: samples must be a whole number of 2 or more, got ${samples}`);
  const first = 0.002;
  const last = highestGlassPhi(map) - 1e-4;
  return Array.from({ length: samples }, (_, i) => {
    const phi = first + ((last - first) * i) / (samples - 1);
    return { phi, onset: gelOnset(map, phi, tolerance) };
  });
}
