import { describe, expect, it } from 'vitest';
import { expectArgumentError, expectRelative } from '../test-support/expect-relative';
import { baxterStickyStructureFactor } from './baxter-sticky-structure-factor';
import { modeCouplingGlassLine } from './mode-coupling-glass-line';
import { modeCouplingGlassTransition } from './mode-coupling-glass-transition';
import { modeCouplingGrid } from './mode-coupling-grid';
import { memoryScratch, modeCouplingMemory } from './mode-coupling-memory';
import { modeCouplingNonergodicity } from './mode-coupling-nonergodicity';
import { modeCouplingVertex } from './mode-coupling-vertex';
import { percusYevickHardSphereStructureFactor } from './percus-yevick-hard-sphere-structure-factor';

/**
 * Percus–Yevick hard-sphere S(k) by an independent route: Wertheim's direct correlation function
 * c(r) = −α − βr − γr³ (r < 1), α = (1 + 2φ)²/(1 − φ)⁴, β = −6φ(1 + φ/2)²/(1 − φ)⁴, γ = φα/2
 * (M. S. Wertheim, Phys. Rev. Lett. 10, 321 (1963); N. W. Ashcroft & J. Lekner, Phys. Rev. 145,
 * 83 (1966)), Fourier transformed by Simpson's rule: S = 1/(1 − ρĉ(k)),
 * ĉ(k) = 4π∫₀¹ c(r) r² sin(kr)/(kr) dr.
 */
function wertheimStructureFactor(phi: number, k: number): number {
  const alpha = (1 + 2 * phi) ** 2 / (1 - phi) ** 4;
  const beta = (-6 * phi * (1 + phi / 2) ** 2) / (1 - phi) ** 4;
  const gamma = (phi * alpha) / 2;
  const n = 4000;
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const r = i / n;
    const c = -(alpha + beta * r + gamma * r ** 3);
    const kernel = k === 0 ? r * r : r * r * (r === 0 ? 1 : Math.sin(k * r) / (k * r));
    const weight = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
    sum += weight * c * kernel;
  }
  const transform = (4 * Math.PI * sum) / (3 * n);
  return 1 / (1 - ((6 * phi) / Math.PI) * transform);
}

describe('percusYevickHardSphereStructureFactor', () => {
  it('matches Wertheim\'s c(r) transformed independently (derived) at k = 0 … 30', () => {
    for (const phi of [0.1, 0.3, 0.5]) {
      for (const k of [0, 0.05, 0.3, 1, 4.2, 7, 7.5, 12, 30]) expectRelative(percusYevickHardSphereStructureFactor(phi, k), wertheimStructureFactor(phi, k), 1e-7);
    }
  });

  it('gives the Percus–Yevick compressibility S(0) = (1 − φ)⁴/(1 + 2φ)² (Wertheim 1963; derived: 1/64 at φ = 0.5)', () => {
    expectRelative(percusYevickHardSphereStructureFactor(0.5, 0), 1 / 64, 1e-13);
    expectRelative(percusYevickHardSphereStructureFactor(0.2, 1e-3), 0.8 ** 4 / 1.4 ** 2, 1e-6);
  });

  it('peaks near kσ ≈ 2π with S_max ≈ 2.9 at φ = 0.5 (common practice: the cage peak)', () => {
    let best = 0;
    let at = 0;
    for (let k = 5; k < 9; k += 0.01) {
      const s = percusYevickHardSphereStructureFactor(0.5, k);
      if (s > best) [best, at] = [s, k];
    }
    expect(at).toBeGreaterThan(6.6);
    expect(at).toBeLessThan(7.4);
    expect(best).toBeGreaterThan(2.5);
    expect(best).toBeLessThan(3.3);
  });

  it('rejects bad φ and k, naming them', () => {
    expectArgumentError(() => percusYevickHardSphereStructureFactor(1, 2), 'phi');
    expectArgumentError(() => percusYevickHardSphereStructureFactor(0.3, -1), 'k');
    expectArgumentError(() => percusYevickHardSphereStructureFactor(0.3, Number.NaN), 'k');
  });
});

describe('baxterStickyStructureFactor', () => {
  it('has S(0) = 1/(β∂P/∂ρ) of Percus–Yevick adhesive spheres (physics.md §3 checks, derived)', () => {
    expectRelative(baxterStickyStructureFactor(0.1, 0.2, 0)!, 1 / 0.903579, 2e-6);
    expectRelative(baxterStickyStructureFactor(0.3, 0.5, 0)!, 1 / 4.394251, 2e-6);
  });

  it('equals |Q̂(k)|⁻² with Baxter\'s integral done by quadrature instead of closed forms (derived)', () => {
    const phi = 0.35;
    const tau = 0.3;
    // λ from Baxter's quadratic (smaller root), then Q̂(k) = 1 − 12φ∫₀¹ Q(r)e^{ikr}dr by Simpson.
    const a12 = phi / 12;
    const b = -(tau + phi / (1 - phi));
    const c = (1 + phi / 2) / (1 - phi) ** 2;
    const lambda = (-b - Math.sqrt(b * b - 4 * a12 * c)) / (2 * a12);
    const mu = lambda * phi * (1 - phi);
    const qa = (1 + 2 * phi - mu) / (1 - phi) ** 2;
    const qb = (mu - 3 * phi) / (2 * (1 - phi) ** 2);
    for (const k of [0.2, 0.49, 0.51, 3, 7, 20]) {
      const n = 2000;
      let re = 0;
      let im = 0;
      for (let i = 0; i <= n; i++) {
        const r = i / n;
        const q = (qa * (r * r - 1)) / 2 + qb * (r - 1) + lambda / 12;
        const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
        re += w * q * Math.cos(k * r);
        im += w * q * Math.sin(k * r);
      }
      re = 1 - (12 * phi * re) / (3 * n);
      im = (-12 * phi * im) / (3 * n);
      expectRelative(baxterStickyStructureFactor(phi, tau, k)!, 1 / (re * re + im * im), 1e-9);
    }
  });

  it('reduces to hard spheres at τ = Infinity and approaches them as τ grows', () => {
    expect(baxterStickyStructureFactor(0.4, Infinity, 7)).toBe(percusYevickHardSphereStructureFactor(0.4, 7));
    expectRelative(baxterStickyStructureFactor(0.4, 1e6, 7)!, percusYevickHardSphereStructureFactor(0.4, 7), 1e-5);
  });

  it('is null inside the no-solution band (τ = 0.09, φ = 0.1: physics.md §3)', () => {
    expect(baxterStickyStructureFactor(0.1, 0.09, 1)).toBeNull();
    expectArgumentError(() => baxterStickyStructureFactor(0.1, 0, 1), 'tau');
  });
});

describe('modeCouplingMemory', () => {
  it('equals the bipolar double sum done term by term (O(M³), derived)', () => {
    const grid = modeCouplingGrid(40, 20);
    const vertex = modeCouplingVertex(0.45, 2, grid);
    const f = Float64Array.from(grid.k, (k) => Math.exp(-((k - 7) ** 2) / 30));
    const fast = modeCouplingMemory(vertex, f, new Float64Array(40), memoryScratch(40));
    const rho = (6 * 0.45) / Math.PI;
    for (const i of [0, 5, 17, 39]) {
      const q = grid.k[i];
      let total = 0;
      for (let j = 0; j < 40; j++) {
        for (let l = Math.abs(i - j); l <= Math.min(i + j, 39); l++) {
          const k = grid.k[j];
          const p = grid.k[l];
          const v = (q * q + k * k - p * p) * vertex.direct[j] + (q * q - k * k + p * p) * vertex.direct[l];
          total += k * p * vertex.structure[j] * vertex.structure[l] * v * v * f[j] * f[l];
        }
      }
      const slow = ((rho * vertex.structure[i]) / (32 * Math.PI ** 2 * q ** 5)) * total * grid.step ** 2;
      // The expanded polynomial loses a few digits to cancellation at large q and k.
      expectRelative(fast[i], slow, 1e-8);
    }
  });
});

describe('modeCouplingNonergodicity', () => {
  it('is ergodic below and arrested above the hard-sphere transition', () => {
    expect(modeCouplingNonergodicity(0.51, Infinity)!.arrested).toBe(false);
    expect(modeCouplingNonergodicity(0.51, Infinity)!.f.every((f) => f === 0)).toBe(true);
    expect(modeCouplingNonergodicity(0.53, Infinity)!.arrested).toBe(true);
  });

  it('peaks at the main peak of S(q) with f ≈ 0.8–0.9 just above φ_c (from memory: Franosch et al. 1997, Fig. of f_q^c)', () => {
    const result = modeCouplingNonergodicity(0.5161, Infinity)!;
    const peakOfF = result.f.indexOf(Math.max(...result.f));
    const peakOfS = result.structureFactor.indexOf(Math.max(...result.structureFactor));
    expect(Math.abs(result.k[peakOfF] - result.k[peakOfS])).toBeLessThanOrEqual(0.8);
    expect(result.f[peakOfF]).toBeGreaterThan(0.8);
    expect(result.f[peakOfF]).toBeLessThan(0.9);
  });

  it('is null where Percus–Yevick has no solution and names bad arguments', () => {
    expect(modeCouplingNonergodicity(0.1, 0.09)).toBeNull();
    expectArgumentError(() => modeCouplingNonergodicity(0.5, -1), 'tau');
    expectArgumentError(() => modeCouplingNonergodicity(0.5, Infinity, { points: 10 }), 'points');
  });
});

describe('modeCouplingGlassTransition', () => {
  it('places hard spheres at φ_c = 0.515912 on M = 100, k_max σ = 40 (Franosch et al., Phys. Rev. E 55, 7153 (1997), published)', () => {
    const transition = modeCouplingGlassTransition(Infinity, { tolerance: 1e-5 });
    expect(Math.abs(transition.phi! - 0.515912)).toBeLessThan(2e-5);
    expect(transition).toMatchObject({ points: 100, cutoff: 40 });
  });

  it('maps a short-range square well to the adhesive spheres of equal B2*, and long-range depletion to hard spheres (the stated mapping)', () => {
    // λ = 1.03, U = 2.5 kT: B2* = 1 − (1.03³ − 1)(e^2.5 − 1) = −0.0368… (square-well closed form), τ = 0.2411.
    const well = modeCouplingGlassTransition({ kind: 'squareWell', depth: 2.5, lambda: 1.03 });
    const b2 = 1 - (1.03 ** 3 - 1) * (Math.exp(2.5) - 1);
    expect(well.mapping).toBe('sticky');
    expect(well.tau).toBeCloseTo(1 / (4 * (1 - b2)), 12);
    expect(well.phi).toBeCloseTo(modeCouplingGlassTransition(1 / (4 * (1 - b2))).phi!, 10);
    const longRange = modeCouplingGlassTransition({ kind: 'depletion', q: 1, polymerReservoir: 0.3 });
    expect(longRange).toMatchObject({ mapping: 'hardSphere', tau: Infinity });
    expect(Math.abs(longRange.phi! - 0.5159)).toBeLessThan(2e-4);
  });

  it('is re-entrant for adhesive spheres: weak stickiness melts the glass, strong stickiness arrests lower (Bergenholtz & Fuchs 1999; Dawson et al. 2000; shape only)', () => {
    const hardSpheres = 0.5159;
    expect(modeCouplingGlassTransition(1).phi!).toBeGreaterThan(hardSpheres + 0.02);
    expect(modeCouplingGlassTransition(0.15).phi!).toBeLessThan(hardSpheres - 0.05);
  });
});

describe('modeCouplingGlassLine', () => {
  const line = modeCouplingGlassLine();

  it('has 40 levels from hard spheres to τ = 0.005, a nose above the hard-sphere value and a falling attractive branch', () => {
    expect(line.tau.length).toBe(40);
    expect(line.tau[0]).toBe(Infinity);
    expect(Math.abs(line.hardSpherePhi - 0.5159)).toBeLessThan(1.5e-3);
    expect(line.nose).toBeGreaterThan(0);
    expect(line.phi[line.nose]).toBeGreaterThan(line.hardSpherePhi + 0.02);
    for (let i = line.nose + 1; i < line.phi.length; i++) expect(line.phi[i]).toBeLessThanOrEqual(line.phi[i - 1]);
    expect(line.phi[39]).toBeLessThan(0.45);
    expect(line.phi.every(Number.isFinite)).toBe(true);
  });

  it('agrees with the bisected transition within 2e-3 at a weak and a strong level', () => {
    for (const level of [5, 20]) {
      const exact = modeCouplingGlassTransition(line.tau[level], { tolerance: 2e-4 }).phi!;
      expect(Math.abs(line.computedPhi[level] - exact)).toBeLessThan(2e-3);
    }
  });

  it('is computed once per grid', () => {
    expect(modeCouplingGlassLine()).toBe(line);
  });
});
