import { memoryScratch, modeCouplingMemory } from './mode-coupling-memory';
import type { ModeCouplingVertex } from './mode-coupling-vertex';

/** Ergodic once every f_q fell below this (the transition is discontinuous: f_c ≳ 0.1 at its peak). */
export const DECAYED = 1e-4;

/**
 * One state's fixed-point iteration f ← m[f]/(1 + m[f]) (idealised MCT; Götze 1991), started from
 * f = 1 or from `start` (an upper bound of the largest solution). Each `step()` updates `f` in
 * place and returns the largest change of any f_q and the largest f_q. Internal.
 */
export function nonergodicityIteration(vertex: ModeCouplingVertex, start?: Float64Array): { f: Float64Array; step(): { change: number; largest: number } } {
  const n = vertex.grid.points;
  const f = start ? Float64Array.from(start) : new Float64Array(n).fill(1);
  const m = new Float64Array(n);
  const scratch = memoryScratch(n);
  const result = { change: 0, largest: 0 };
  return {
    f,
    step() {
      modeCouplingMemory(vertex, f, m, scratch);
      let change = 0;
      let largest = 0;
      for (let i = 0; i < n; i++) {
        const next = m[i] / (1 + m[i]);
        const moved = Math.abs(next - f[i]);
        if (moved > change) change = moved;
        if (next > largest) largest = next;
        f[i] = next;
      }
      result.change = change;
      result.largest = largest;
      return result;
    },
  };
}
