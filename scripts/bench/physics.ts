/**
 * Physics benchmark (issue 3): median times of repeated runs for
 * - a full state map per model (200 attraction levels, every boundary, regions, tables), and
 * - classifying 100 000 points against one prebuilt map,
 * printed next to the targets (generic map < 20 ms, depletion map < 100 ms, 100 000
 * classifications < 100 ms). It only prints; it never fails.
 *
 * Run: ./node_modules/.bin/tsx scripts/bench/physics.ts   (or npm run bench:physics)
 */
import {
  buildStateMap,
  DEFAULT_SQUARE_WELL_RANGE,
  classifyPoint,
  clearModeCouplingGlassLines,
  modeCouplingGlassLine,
  modeCouplingGlassTransition,
  type AttractionInput,
  type MapModel,
  type StateMap,
} from '../../shared/physics';
import { median } from 'simple-statistics';

const WARM_UP = 3;
const BUILD_RUNS = 11;
const CLASSIFY_RUNS = 7;
const POINTS = 100_000;

const GENERIC_TARGET_MS = 20;
const DEPLETION_TARGET_MS = 100;
const CLASSIFY_TARGET_MS = 100;

const MODELS: MapModel[] = [
  { kind: 'generic', theory: 'meanField', axis: 'b2' },
  { kind: 'generic', theory: 'meanField', axis: 'inverseTau' },
  { kind: 'generic', theory: 'baxterPY', axis: 'b2' },
  { kind: 'generic', theory: 'baxterPY', axis: 'squareWellDepth', lambda: 1.1 },
  { kind: 'depletion', q: 0.1 },
  { kind: 'depletion', q: 0.35 },
  { kind: 'depletion', q: 0.6 },
];

function time(run: () => void): number {
  const start = performance.now();
  run();
  return performance.now() - start;
}

function describeModel(model: MapModel): string {
  if (model.kind === 'depletion') return `depletion q=${model.q}`;
  return `generic ${model.theory} / ${model.axis}${model.axis === 'squareWellDepth' ? ` λ=${model.lambda ?? DEFAULT_SQUARE_WELL_RANGE}` : ''}`;
}

/** Deterministic pseudo-random points spread over the whole map (a linear congruential generator). */
function pointsFor(map: StateMap, count: number): Array<{ phi: number; attraction: AttractionInput }> {
  let seed = 20240601;
  const next = () => {
    seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
    return seed / 2 ** 32;
  };
  const points: Array<{ phi: number; attraction: AttractionInput }> = [];
  for (let i = 0; i < count; i++) {
    const phi = 0.001 + 0.735 * next();
    const y = map.y.weakest + next() * (map.y.strongest - map.y.weakest);
    const attraction: AttractionInput = map.model.kind === 'depletion'
      ? { kind: 'depletion', q: map.model.q, polymerReservoir: y }
      : { kind: 'b2', value: map.model.axis === 'b2' ? y : 1 - y / 4 };
    points.push({ phi, attraction });
  }
  return points;
}

function verdict(value: number, target: number): string {
  return value < target ? 'within target' : 'ABOVE target';
}

function benchBuilds(): void {
  console.log(`Full map build (200 levels, every boundary, region grid, classifier tables); median of ${BUILD_RUNS} runs after ${WARM_UP} warm-up runs`);
  for (const model of MODELS) {
    try {
      for (let i = 0; i < WARM_UP; i++) buildStateMap(model);
      const times = Array.from({ length: BUILD_RUNS }, () => time(() => buildStateMap(model)));
      const target = model.kind === 'generic' ? GENERIC_TARGET_MS : DEPLETION_TARGET_MS;
      console.log(`  ${describeModel(model).padEnd(36)} median ${median(times).toFixed(1).padStart(6)} ms  (min ${Math.min(...times).toFixed(1)}, max ${Math.max(...times).toFixed(1)})  target < ${target} ms: ${verdict(median(times), target)}`);
    } catch (error) {
      console.log(`  ${describeModel(model).padEnd(36)} failed: ${(error as Error).message}`);
    }
  }
}

function benchClassification(model: MapModel): void {
  try {
    const map = buildStateMap(model);
    const points = pointsFor(map, POINTS);
    let sink = 0;
    const classifyAll = () => {
      for (const point of points) sink += classifyPoint(map, point).margin;
    };
    // The first pass also builds the map's nearest-boundary index and warms the JIT.
    const first = time(classifyAll);
    const times = Array.from({ length: CLASSIFY_RUNS }, () => time(classifyAll));
    const states: Record<string, number> = {};
    for (const point of points.slice(0, 10_000)) {
      const state = classifyPoint(map, point).state;
      states[state] = (states[state] ?? 0) + 1;
    }
    console.log(`  ${describeModel(model).padEnd(36)} median ${median(times).toFixed(1).padStart(6)} ms  (first pass incl. index ${first.toFixed(1)} ms; min ${Math.min(...times).toFixed(1)})  target < ${CLASSIFY_TARGET_MS} ms: ${verdict(median(times), CLASSIFY_TARGET_MS)}`);
    console.log(`  ${''.padEnd(36)} states of the first 10 000: ${JSON.stringify(states)}${sink === -1 ? '' : ''}`);
  } catch (error) {
    console.log(`  ${describeModel(model).padEnd(36)} failed: ${(error as Error).message}`);
  }
}

const GLASS_LINE_TARGET_MS = 300;
const MEAN_FIELD_MAP_TARGET_MS = 5;
const FREE_VOLUME_MAP_TARGET_MS = 10;

/** Mode-coupling theory: the hard-sphere transition on a few grids and the map's glass line. */
function benchModeCoupling(): void {
  console.log('Mode-coupling glass transition of hard spheres (Percus–Yevick S(k), k_max σ = 40; bisection to 1e-5)');
  for (const points of [50, 100, 200]) {
    let phi: number | null = null;
    const elapsed = time(() => (phi = modeCouplingGlassTransition(Infinity, { points, tolerance: 1e-5 }).phi));
    console.log(`  M = ${String(points).padStart(3)}: φ_c = ${phi!.toFixed(6)}  (${elapsed.toFixed(0)} ms)${points === 100 ? '   published 0.515912 (Franosch et al. 1997)' : ''}`);
  }
  const times: number[] = [];
  let iterations = 0;
  for (let run = 0; run < 5; run++) {
    clearModeCouplingGlassLines();
    times.push(time(() => (iterations = modeCouplingGlassLine().iterations)));
  }
  const line = modeCouplingGlassLine();
  console.log(`Glass line for a map (40 stickiness levels, M = 100, cold: no cache); median of 5 runs`);
  console.log(`  median ${median(times).toFixed(0)} ms (min ${Math.min(...times).toFixed(0)}, max ${Math.max(...times).toFixed(0)}; ${iterations} fixed-point iterations)  target < ${GLASS_LINE_TARGET_MS} ms: ${verdict(median(times), GLASS_LINE_TARGET_MS)}`);
  console.log(`  cached afterwards: ${time(() => modeCouplingGlassLine()).toFixed(3)} ms; nose at τ = ${line.tau[line.nose].toFixed(3)}, φ_c = ${line.phi[line.nose].toFixed(4)}; hard spheres ${line.hardSpherePhi.toFixed(4)}`);
}

/** The two map builds the arrest issue sets targets for (the glass line is cached by then). */
function benchArrestMapTargets(): void {
  console.log('Map build without the glass line (cached), against the arrest issue\'s targets; median of 11 runs');
  for (const [model, target] of [[{ kind: 'generic', theory: 'meanField', axis: 'b2' }, MEAN_FIELD_MAP_TARGET_MS], [{ kind: 'depletion', q: 0.5 }, FREE_VOLUME_MAP_TARGET_MS]] as Array<[MapModel, number]>) {
    for (let i = 0; i < WARM_UP; i++) buildStateMap(model);
    const builds = Array.from({ length: BUILD_RUNS }, () => time(() => buildStateMap(model)));
    console.log(`  ${describeModel(model).padEnd(36)} median ${median(builds).toFixed(1).padStart(6)} ms  target < ${target} ms: ${verdict(median(builds), target)}`);
  }
}

console.log(`Gelwright physics benchmark — Node ${process.version}, ${new Date().toISOString()}`);
benchBuilds();
benchArrestMapTargets();
benchModeCoupling();
console.log(`Classification of ${POINTS.toLocaleString('en')} points against one prebuilt map; median of ${CLASSIFY_RUNS} runs after one first pass`);
benchClassification({ kind: 'generic', theory: 'meanField', axis: 'b2' });
benchClassification({ kind: 'depletion', q: 0.35 });
