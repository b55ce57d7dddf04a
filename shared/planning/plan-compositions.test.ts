import { describe, expect, it } from 'vitest';
import { classifyPoint, deriveRecipeParameters, freeVolumeFraction, type StateMap } from '../physics';
import { cachedMap } from '../physics/test-support/map-builders';
import { physicsInputFor, recipeStateMap, type RecipeMaterials } from '../recipe-derivation';
import type { GoalState } from '../states';
import { compositionSpace } from './composition-space';
import { DEFAULT_BOUNDARY_UNCERTAINTY } from './default-boundary-uncertainty';
import { materialCostPerLitre } from './material-cost-per-litre';
import { planCompositions } from './plan-compositions';
import { plannedRecipeInput, type PlanTemplate } from './planned-recipe-input';
import { BAND_Z } from './propose-experiments';
import { DEFAULT_RANKING_WEIGHTS } from './rank-candidates';
import { screeningMap } from './screening-map';
import type { BoundaryUncertainty, CompositionSpace, PlanProblem, ValueRange } from './types';

/**
 * Invented materials with typical values: 100 nm silica-like spheres (ρ = 2.0 g/cm³), PEG 20 kg/mol
 * with the Devanand–Selser law R_g = 0.0215·M^0.583 nm (physics.md §6, from memory), water at
 * 25 °C (IAPWS viscosity), a 1:1 salt.
 */
const materials: RecipeMaterials = {
  particle: { radiusNm: 100, densityGcm3: 2.0, polydispersityPct: 5, surfacePotentialMv: -40, hamakerZj: 8 },
  solvent: { viscosityMPas: 0.89002, densityGcm3: 0.997, relativePermittivity: 78.4 },
  depletant: { molarMassKgMol: 20, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583 },
  salt: { valence: 1 },
};
const depletion: PlanTemplate = { programmeId: 1, particleId: 1, solventId: 1, temperatureC: 25, attraction: { source: 'depletion', depletantId: 1 } };
const salt: PlanTemplate = { ...depletion, attraction: { source: 'salt', saltId: 1 } };
const prices = { particles: 120, solvent: 0.01, polymer: 40, salt: 1 };

function problem(template: PlanTemplate, overrides: Partial<PlanProblem> & { phi: ValueRange; level: ValueRange }, parameters?: { attractionShift: number }): PlanProblem {
  return {
    space: (levels) => compositionSpace(template, materials, parameters, overrides.phi, levels),
    target: 'gel',
    minMargin: 0.1,
    count: 6,
    experimentCount: 4,
    samples: 2000,
    weights: DEFAULT_RANKING_WEIGHTS,
    cost: (p, c) => materialCostPerLitre(p, c, template.attraction.source === 'depletion' ? 'polymer' : 'salt', { particleDensity: 2, solventDensity: 0.997, saltMolarMass: 58.44, prices }),
    evidence: [],
    uncertainty: DEFAULT_BOUNDARY_UNCERTAINTY,
    ...overrides,
  };
}

/** The recipe's own derivation (shared/physics), independent of the planner's fast placement. */
function derive(template: PlanTemplate, phi: number, level: number, parameters?: { attractionShift: number }) {
  const recipe = plannedRecipeInput(template, phi, level, 'check');
  return deriveRecipeParameters(physicsInputFor(recipe, materials, parameters), { mapFor: () => recipeStateMap(recipe, materials, parameters) });
}

/** A space whose attraction is B2* = 1 − level on the mean-field map: the boundary is known in closed form. */
function knownBoundarySpace(): CompositionSpace {
  return {
    kind: 'salt',
    map: cachedMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }),
    place: (_phi, level) => ({ kind: 'b2', value: 1 - level }),
    level: { name: 'attraction', unit: 'mM', floor: 0, limit: 5000 },
    notes: [],
  };
}

describe('planCompositions: candidates', () => {
  it('on a map with a known boundary, returns only gels with at least the margin asked, each confirmed by its own classifyPoint call', () => {
    const space = knownBoundarySpace();
    const outcome = planCompositions({ ...problem(salt, { phi: { min: 0.05, max: 0.45 }, level: { min: 0, max: 8 } }), space: () => space, minMargin: 0.08, count: 8 });
    expect(outcome.candidates).toHaveLength(8);
    for (const c of outcome.candidates) {
      const check = classifyPoint(space.map, { phi: c.phi, attraction: { kind: 'b2', value: 1 - c.level } });
      expect(check.state).toBe('gel');
      expect(check.margin).toBeGreaterThanOrEqual(0.08);
      // No gel above the mean-field critical point, B2*_c = −1.6503 (physics.md §3, derived).
      expect(1 - c.level).toBeLessThan(-1.6503);
      expect(c.phi).toBeGreaterThanOrEqual(0.05);
      expect(c.phi).toBeLessThanOrEqual(0.45);
    }
  });

  it('plans depletion gels from materials: each candidate re-derived as a recipe is a gel with the margin asked', () => {
    const outcome = planCompositions(problem(depletion, { phi: { min: 0.05, max: 0.4 }, level: { min: 0, max: 12 }, minMargin: 0.15 }));
    expect(outcome.candidates.length).toBe(6);
    for (const c of outcome.candidates) {
      const derived = derive(depletion, c.phi, c.level);
      expect(derived.predictedState).toBe('gel');
      expect(derived.margin).toBeGreaterThanOrEqual(0.15);
      // Placement by the free-volume steps of physics.md §4/§6: φ_p = c(1 − φ)/c*, φ_p^R = φ_p/α(φ).
      const reservoir = (c.level * (1 - c.phi)) / derived.overlapConcentrationGL! / freeVolumeFraction(c.phi, derived.sizeRatio!);
      expect(derived.polymerReservoir!).toBeCloseTo(reservoir, 12);
      expect(c.margin).toBeCloseTo(derived.margin, 6);
    }
    // The cost is the sum of the parts, recomputed here for the first candidate.
    const first = outcome.candidates[0];
    expect(first.cost.total).toBeCloseTo(first.phi * 2 * 120 + (1 - first.phi) * 0.997 * 0.01 + (first.level * (1 - first.phi) / 1000) * 40, 10);
  });

  it('plans salt gels: B2* screened on an interpolated DLVO table, each candidate exact as a recipe', () => {
    const outcome = planCompositions({
      ...problem(salt, { phi: { min: 0.05, max: 0.35 }, level: { min: 50, max: 1500 }, minMargin: 0.05, count: 4, experimentCount: 0, samples: 1500 }),
      verify: (p, c) => {
        const d = derive(salt, p, c);
        return { state: d.predictedState, margin: d.margin, detail: d };
      },
    });
    expect(outcome.candidates.length).toBeGreaterThan(0);
    for (const c of outcome.candidates) {
      const d = derive(salt, c.phi, c.level);
      expect(d.predictedState).toBe('gel');
      expect(d.margin).toBeGreaterThanOrEqual(0.05);
    }
  });

  it('ranks by the weights: margin alone puts the widest margin first, cost alone the cheapest', () => {
    const base = problem(depletion, { phi: { min: 0.05, max: 0.4 }, level: { min: 0, max: 12 }, count: 3, experimentCount: 0 });
    const byMargin = planCompositions({ ...base, weights: { margin: 1, cost: 0, evidence: 0 } });
    const byCost = planCompositions({ ...base, weights: { margin: 0, cost: 1, evidence: 0 } });
    const widest = byMargin.candidates[0];
    const cheapest = byCost.candidates[0];
    expect(widest.margin).toBeGreaterThan(cheapest.margin);
    expect(cheapest.cost.total).toBeLessThan(widest.cost.total);
    // Brute force over the same Halton sample: the best margin among feasible samples is the first pick.
    expect(widest.scores.margin).toBe(1);
    expect(cheapest.scores.cost).toBe(1);
  });
});

describe('planCompositions: when the target cannot be met', () => {
  const base = problem(depletion, { phi: { min: 0.05, max: 0.4 }, level: { min: 0, max: 3 }, count: 3, experimentCount: 0 });

  it('says how far to raise the polymer, and the advised limit then gives gels', () => {
    const outcome = planCompositions(base);
    expect(outcome.candidates).toEqual([]);
    const raise = outcome.advice.find((a) => a.constraint === 'level.max');
    expect(raise).toBeDefined();
    expect(raise!.to!).toBeGreaterThan(3);
    expect(raise!.message).toMatch(/Raise the polymer limit to [\d.]+ g\/L/);
    const relaxed = planCompositions({ ...base, level: { min: 0, max: raise!.to! } });
    expect(relaxed.candidates.length).toBeGreaterThan(0);
    expect(relaxed.candidates.every((c) => c.margin >= 0.1)).toBe(true);
  });

  it('says which way to widen φ for a glass, and the advised φ then gives glasses', () => {
    const glass = planCompositions({ ...base, target: 'glass', level: { min: 0, max: 1 } });
    const widen = glass.advice.find((a) => a.constraint === 'phi.max');
    expect(widen).toBeDefined();
    // A glass needs φ near the repulsive glass line, 0.58 (Pusey & van Megen 1986, from memory), plus the margin.
    expect(widen!.to!).toBeGreaterThan(0.58);
    const relaxed = planCompositions({ ...base, target: 'glass', level: { min: 0, max: 1 }, phi: { min: 0.05, max: widen!.to! } });
    expect(relaxed.candidates.length).toBeGreaterThan(0);
  });

  it('names the best reachable margin when the margin asked is too large', () => {
    const outcome = planCompositions({ ...base, level: { min: 0, max: 12 }, minMargin: 3 });
    const lower = outcome.advice.find((a) => a.constraint === 'minMargin');
    expect(lower).toBeDefined();
    expect(lower!.to!).toBeLessThanOrEqual(outcome.bestInRange!.margin);
    const relaxed = planCompositions({ ...base, level: { min: 0, max: 12 }, minMargin: lower!.to! });
    expect(relaxed.candidates.length).toBeGreaterThan(0);
  });

  it('asks for other materials when the theory never gives the target: no crystal above 12 % polydispersity', () => {
    const polydisperse = { ...materials, particle: { ...materials.particle, polydispersityPct: 15 } };
    const outcome = planCompositions({ ...base, target: 'crystal', space: (levels) => compositionSpace(depletion, polydisperse, undefined, base.phi, levels) });
    expect(outcome.candidates).toEqual([]);
    expect(outcome.advice.map((a) => a.constraint)).toEqual(['materials']);
  });
});

describe('planCompositions: next experiments', () => {
  /** Whether the state changes somewhere on a fine scan of shifts across ŝ ± 2σ (independent classifyPoint calls). */
  function changesWithinBand(map: StateMap, point: Parameters<typeof classifyPoint>[1], target: GoalState, u: BoundaryUncertainty) {
    const centre = classifyPoint(map, point, { attractionShift: u.shift }).state === target;
    for (let k = -40; k <= 40; k++) {
      const shift = u.shift + (k / 40) * 2 * u.standardError;
      if ((classifyPoint(map, point, { attractionShift: shift }).state === target) !== centre) return true;
    }
    return false;
  }

  it('without a calibration, proposes compositions within the default uncertainty band, spread apart, explained in words', () => {
    const outcome = planCompositions(problem(depletion, { phi: { min: 0.05, max: 0.4 }, level: { min: 0, max: 12 } }));
    const items = outcome.experiments.items;
    expect(items).toHaveLength(4);
    const space = compositionSpace(depletion, materials, undefined, { min: 0.05, max: 0.4 }, { min: 0, max: 12 });
    for (const e of items) {
      const point = { phi: e.phi, attraction: space.place(e.phi, e.level)! };
      expect(changesWithinBand(recipeStateMap(plannedRecipeInput(depletion, e.phi, e.level, 'x'), materials), point, 'gel', DEFAULT_BOUNDARY_UNCERTAINTY)).toBe(true);
      expect(Math.abs(e.boundaryOffset)).toBeLessThanOrEqual(BAND_Z * 0.4 + 1e-9);
      expect(e.probability).toBeGreaterThan(0.02);
      expect(e.probability).toBeLessThan(0.98);
    }
    expect(outcome.experiments.band).toEqual({ low: -BAND_Z * 0.4, high: BAND_Z * 0.4 });
    expect(outcome.experiments.summary[0]).toMatch(/No accepted calibration/);
    expect(outcome.experiments.summary.slice(1).join(' ')).toMatch(/straddle the edge of the gel region .* the bench has no samples within 0\.05/);
  });

  it('with a calibration, stays within the calibrated band ŝ ± 1.96 SE, and avoids compositions the bench has seen', () => {
    const calibrated: BoundaryUncertainty = { shift: 0.3, standardError: 0.12, sharpness: 4, source: 'calibration' };
    const parameters = { attractionShift: 0.3 };
    const first = planCompositions({ ...problem(depletion, { phi: { min: 0.05, max: 0.4 }, level: { min: 0, max: 12 } }, parameters), uncertainty: calibrated });
    const seen = first.experiments.items[0];
    expect(seen).toBeDefined();
    // Put a bench observation on the first proposal; the next plan moves away from it.
    const evidence = [{ id: 1, label: 'BENCH-1', phi: seen.phi, attraction: { kind: 'depletion' as const, q: (compositionSpace(depletion, materials, parameters, { min: 0.05, max: 0.4 }, { min: 0, max: 12 }).map.model as { q: number }).q, polymerReservoir: derive(depletion, seen.phi, seen.level, parameters).polymerReservoir! }, observedState: 'gel' as const, ageDays: 1 }];
    const second = planCompositions({ ...problem(depletion, { phi: { min: 0.05, max: 0.4 }, level: { min: 0, max: 12 } }, parameters), uncertainty: calibrated, evidence });
    const map = recipeStateMap(plannedRecipeInput(depletion, 0.2, 5, 'x'), materials, parameters);
    const space = compositionSpace(depletion, materials, parameters, { min: 0.05, max: 0.4 }, { min: 0, max: 12 });
    // Not vacuous: the second plan proposes experiments to check.
    expect(second.experiments.items.length).toBeGreaterThan(0);
    for (const e of second.experiments.items) {
      expect(changesWithinBand(map, { phi: e.phi, attraction: space.place(e.phi, e.level)! }, 'gel', calibrated)).toBe(true);
      expect(Math.abs(e.boundaryOffset)).toBeLessThanOrEqual(BAND_Z * 0.12 + 1e-9);
      expect(e.phi === seen.phi && e.level === seen.level).toBe(false);
    }
    expect(second.experiments.summary[0]).toMatch(/accepted calibration: attraction shift 0\.3 ± 0\.12/);
  });
});

describe('screeningMap', () => {
  it('classifies exactly as the programme map does, above its drawn top too', () => {
    const recipe = plannedRecipeInput(depletion, 0.2, 5, 'x');
    for (const parameters of [undefined, { attractionShift: 0.4 }]) {
      const map = recipeStateMap(recipe, materials, parameters);
      const q = (map.model as { q: number }).q;
      const fast = screeningMap(map, 3 * map.y.strongest).map;
      expect(fast.tables.reducedB2!.u.length).toBeGreaterThan(map.tables.reducedB2!.u.length);
      for (let i = 0; i < 120; i++) {
        const point = { phi: 0.03 + (i % 12) * 0.04, attraction: { kind: 'depletion' as const, q, polymerReservoir: (i / 120) * 3 * map.y.strongest } };
        const slow = classifyPoint(map, point);
        const quick = classifyPoint(fast, point);
        expect(quick.state).toBe(slow.state);
        expect(quick.margin).toBeCloseTo(slow.margin, 6);
      }
    }
  });
});
