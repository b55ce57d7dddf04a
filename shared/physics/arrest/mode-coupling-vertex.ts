import { structureFactorUnchecked } from './baxter-sticky-structure-factor';
import type { ModeCouplingGrid } from './mode-coupling-grid';

/**
 * What the memory functional of one state needs on the grid: S(k), the direct correlation
 * function c(k) = (1 − 1/S(k))/ρ (σ = 1, ρ = 6φ/π) and the prefactor ρS(q)/(32π²q⁵) Δk².
 */
export interface ModeCouplingVertex {
  readonly phi: number;
  readonly grid: ModeCouplingGrid;
  readonly structure: Float64Array;
  readonly direct: Float64Array;
  readonly prefactor: Float64Array;
}

/**
 * The vertex of a Percus–Yevick adhesive-sphere state (λ = 0: hard spheres). Internal: φ in
 * (0, 1) and λ ≥ 0 are the caller's to check.
 */
export function modeCouplingVertex(phi: number, lambda: number, grid: ModeCouplingGrid): ModeCouplingVertex {
  const density = (6 * phi) / Math.PI;
  const n = grid.points;
  const structure = new Float64Array(n);
  const direct = new Float64Array(n);
  const prefactor = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const q = grid.k[i];
    const s = structureFactorUnchecked(phi, lambda, q);
    structure[i] = s;
    direct[i] = (1 - 1 / s) / density;
    prefactor[i] = (density * s * grid.step * grid.step) / (32 * Math.PI * Math.PI * q ** 5);
  }
  return { phi, grid, structure, direct, prefactor };
}
