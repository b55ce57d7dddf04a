/**
 * Planner benchmark (issue 7): the median time to plan 10,000 candidate compositions — Halton
 * sampling, classification on the programme's map, ranking, exact re-derivation of the chosen
 * ones, the feasible window and the next experiments — against a target of 200 ms, for
 * - a depletion programme without calibration (invented titania-like particles, PEG 20 kg/mol),
 * - the same with an accepted calibration (shift 0.4 ± 0.15, slope 4), and
 * - a salt programme (DLVO B2*, invented silica-like particles),
 * each with 300 invented bench observations as evidence. Also the first (cold) run, which builds
 * the map and its extended table. It only prints; it never fails.
 *
 * Run: ./node_modules/.bin/tsx scripts/bench/planner.ts
 */
import {
  compositionSpace,
  DEFAULT_BOUNDARY_UNCERTAINTY,
  DEFAULT_RANKING_WEIGHTS,
  materialCostPerLitre,
  planCompositions,
  plannedRecipeInput,
  type BoundaryUncertainty,
  type EvidenceInput,
  type PlanTemplate,
  type ValueRange,
} from '../../shared/planning';
import { deriveRecipe, type RecipeMaterials } from '../../shared/recipe-derivation';
import { seededRandom } from '../../shared/seeded-random';
import { median } from 'simple-statistics';

const SAMPLES = 10_000;
const RUNS = 9;
const TARGET_MS = 200;

const materials: RecipeMaterials = {
  particle: { radiusNm: 90, densityGcm3: 4.0, polydispersityPct: 9, surfacePotentialMv: -35, hamakerZj: 10 },
  solvent: { viscosityMPas: 0.89002, densityGcm3: 0.99705, relativePermittivity: 78.4 },
  depletant: { molarMassKgMol: 20, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583 },
  salt: { valence: 1 },
};

interface Case {
  name: string;
  template: PlanTemplate;
  phi: ValueRange;
  level: ValueRange;
  parameters?: { attractionShift: number };
  uncertainty: BoundaryUncertainty;
}

const depletion: PlanTemplate = { programmeId: 1, particleId: 1, solventId: 1, temperatureC: 25, attraction: { source: 'depletion', depletantId: 1 } };
const CASES: Case[] = [
  { name: 'depletion, theory', template: depletion, phi: { min: 0.05, max: 0.45 }, level: { min: 0, max: 12 }, uncertainty: DEFAULT_BOUNDARY_UNCERTAINTY },
  { name: 'depletion, calibrated', template: depletion, phi: { min: 0.05, max: 0.45 }, level: { min: 0, max: 12 }, parameters: { attractionShift: 0.4 }, uncertainty: { shift: 0.4, standardError: 0.15, sharpness: 4, source: 'calibration' } },
  { name: 'salt, theory', template: { ...depletion, attraction: { source: 'salt', saltId: 1 } }, phi: { min: 0.05, max: 0.4 }, level: { min: 20, max: 1500 }, uncertainty: DEFAULT_BOUNDARY_UNCERTAINTY },
];

/** 300 invented observations spread over the ranges, placed like the server places them. */
function evidenceFor(c: Case): EvidenceInput[] {
  const random = seededRandom(11);
  const space = compositionSpace(c.template, materials, c.parameters, c.phi, c.level);
  const states = ['fluid', 'gel', 'separated', 'crystal'] as const;
  return Array.from({ length: 300 }, (_, i) => {
    const phi = c.phi.min + (c.phi.max - c.phi.min) * random();
    const level = c.level.min + (c.level.max - c.level.min) * random();
    return { id: i + 1, label: `BENCH-${i + 1}`, phi, attraction: space.place(phi, level)!, observedState: states[i % 4], ageDays: 7 };
  });
}

function planOnce(c: Case, evidence: EvidenceInput[]) {
  const kind = c.template.attraction.source === 'depletion' ? 'polymer' : 'salt';
  const started = performance.now();
  const outcome = planCompositions({
    space: (levels) => compositionSpace(c.template, materials, c.parameters, c.phi, levels),
    phi: c.phi, level: c.level, target: 'gel', minMargin: 0.1, count: 10, experimentCount: 4, samples: SAMPLES,
    weights: DEFAULT_RANKING_WEIGHTS,
    cost: (p, l) => materialCostPerLitre(p, l, kind, { particleDensity: 4, solventDensity: 0.99705, saltMolarMass: 58.44, prices: { particles: 6.5, solvent: 0.002, polymer: 9, salt: 0.3 } }),
    evidence, uncertainty: c.uncertainty,
    verify: (p, l) => {
      const recipe = plannedRecipeInput(c.template, p, l, 'bench');
      const d = deriveRecipe(recipe, materials, { parameters: c.parameters }).derived;
      return { state: d.predictedState, margin: d.margin, detail: d };
    },
  });
  return { ms: performance.now() - started, outcome };
}

console.log(`Planner: ${SAMPLES.toLocaleString('en')} candidate compositions per plan, median of ${RUNS} runs (target < ${TARGET_MS} ms)`);
for (const c of CASES) {
  const evidence = evidenceFor(c);
  const cold = planOnce(c, evidence);
  const times = Array.from({ length: RUNS }, () => planOnce(c, evidence).ms);
  const m = median(times);
  const o = cold.outcome;
  console.log(
    `  ${c.name.padEnd(24)} median ${m.toFixed(1).padStart(6)} ms  ${m < TARGET_MS ? 'within' : 'OVER'} target` +
      `   (first run ${cold.ms.toFixed(0)} ms; ${o.counts.feasible} of ${o.counts.placed} meet the request, ${o.candidates.length} listed, ${o.experiments.items.length} next experiments)`,
  );
}
