import { reducedB2FromStickiness } from '../attraction/reduced-b2-from-stickiness';
import { stickinessFromReducedB2 } from '../attraction/stickiness-from-reduced-b2';
import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { freeVolumeCriticalEndpoint } from '../depletion/free-volume-critical-endpoint';
import { freeVolumeCriticalPoint } from '../depletion/free-volume-critical-point';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import { buildAxis, depletionPolymerForB2, genericB2FromY, genericYFromB2 } from './build-axis';
import { DEFAULT_CLASSIFIER_PARAMETERS, resolveClassifierParameters } from './classifier-parameters';
import { glassLineTable, SHORT_RANGE_LIMIT } from './glass-line-table';
import { curveAt } from './state-rule';
import { buildDrawnCurves, roundPoint, type DrawnCurve } from './drawn-curves';
import { depletionLevelPhysics, genericLevelPhysics, shortRangeDepletionLevelPhysics } from './level-physics';
import { createMapFrame, type MapFrame, type ReducedB2Table } from './map-frame';
import { stateAtDrawnPoint } from './map-state-at';
import { PHYSICS_MODEL_VERSION } from './model-version';
import { splitByFlag } from './polyline-tools';
import { causeOnRow, emptyRow, ruleRowAt, stateOfCause, type StateCause } from './state-rule';
import { resolveMapModel } from './resolve-map-model';
import { traceTheoryCurves, type TheoryCurves } from './theory-curves';
import type {
  ClassifierParameters,
  ClassifierTables,
  GlassLineSource,
  MapAxis,
  MapBoundary,
  MapMarker,
  MapModel,
  MapVertex,
  StateMap,
  StateMapOptions,
  StateRegions,
} from './types';

/** Sticky-sphere critical point from simulation (Miller & Frenkel, PRL 90, 135702 (2003), from memory). */
export const SIMULATION_CRITICAL_POINT = { phi: 0.266, tau: 0.1133 };

const STATE_CODES: StateRegions['codes'] = ['fluid', 'gel', 'glass', 'crystal', 'separated', 'crystal-suppressed'];
const REGION_LABELS: StateRegions['labels'] = {
  fluid: 'Fluid',
  gel: 'Gel (arrested phase separation)',
  glass: 'Glass (repulsive or attractive)',
  crystal: 'Crystal (or fluid–crystal coexistence)',
  separated: 'Separated (slow nucleated phase separation)',
  'crystal-suppressed': 'Crystal suppressed by polydispersity (classified as fluid)',
};

const CODE_OF_CAUSE: Record<StateCause, number> = {
  fluid: 0,
  'gel-spinodal': 1,
  'gel-binodal': 1,
  'glass-attractive': 2,
  'glass-repulsive': 2,
  crystal: 3,
  'crystal-coexistence': 3,
  separated: 4,
  'fluid-suppressed': 5,
};

/**
 * Build the state map of a model: every boundary as polylines in map coordinates, markers, a
 * region grid for shading, notes and the tables the fast classifier uses. Pure and
 * JSON-serialisable.
 *
 * Coordinates: x is φ on [0, φ_cp = 0.7405]; y is the axis of the model (B2*, 1/τ, U/kT at range
 * λ, or φ_p^R) from the weakest attraction (bottom) to the strongest (top; B2* = −10 unless
 * `yMax`). For the B2* axis larger values are drawn lower: `y.inverted` is true. "Normalised"
 * coordinates, used for margins, are x/φ_cp and u = (y − y.weakest)/(y.strongest − y.weakest).
 *
 * Physics per model (physics.md): generic/meanField — CS + mean-field B2* binodal and spinodal;
 * generic/baxterPY — Percus–Yevick adhesive spheres (compressibility route; the dilute spinodal
 * branch is the edge of the no-solution band); both generic theories take their fluid–crystal
 * lines from the mean-field free energy with the cell-model crystal; depletion — free-volume
 * theory at size ratio q. Percolation is Chiew–Glandt's, placed through B2*; the glass line is
 * idealised mode-coupling theory of adhesive spheres placed through B2* (hard-sphere line for
 * ranges over 0.25 σ; see glassLineTable), rescaled onto glassPhi unless `glassLine: 'computed'`;
 * the gel threshold inside the binodal comes from the classifier parameters. The attraction shift of the parameters moves
 * every theory boundary: a boundary at B2* is drawn at B2* + attractionShift.
 *
 * Numerics: `levels` attraction levels (default 200) uniform in y; coexistence by continuation
 * from the level below (Newton) with a bracketing fallback; residuals |Δp̃|, |Δβμ| ≲ 1e-12.
 *
 * @param model the map model (see MapModel).
 * @param options levels (20–2000), classifier parameters, polydispersity (0–100 %), yMax,
 *   grid size (columns 10–1000, rows 10–1000).
 * @throws PhysicsArgumentError naming the bad field (model.q, model.lambda, options.levels …).
 * @example buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }).markers[0]
 * // { id: 'critical-point', label: 'Critical point (mean field)', x: 0.13044, y: -1.65031 }
 */
export function buildStateMap(model: MapModel, options: StateMapOptions = {}): StateMap {
  const resolved = resolveMapModel(model);
  const levels = requireInteger('options.levels', options.levels ?? 200, 20, 2000);
  const columns = requireInteger('options.gridColumns', options.gridColumns ?? 128, 10, 1000);
  const rows = requireInteger('options.gridRows', options.gridRows ?? 96, 10, 1000);
  const parameters = resolveClassifierParameters(options.parameters);
  if (options.glassLine !== undefined && options.glassLine !== 'rescaled' && options.glassLine !== 'computed') {
    throw new PhysicsArgumentError('options.glassLine', "'rescaled' or 'computed'", options.glassLine);
  }
  const polydispersity = options.polydispersity === undefined ? null : requireInRange('options.polydispersity', options.polydispersity, 0, 100, { what: 'a size polydispersity in %', lowEnd: 'closed', highEnd: 'closed' });
  const crystalSuppressed = polydispersity !== null && polydispersity > parameters.polydispersityCrystalThreshold;

  const axis = buildAxis(resolved, options.yMax);
  const shift = parameters.attractionShift;
  // Theory levels cover the drawn y range seen through the shift: a boundary at B2* is drawn at
  // B2* + shift, so the drawn range [weakest, strongest] needs theory B2* from 1 − shift down to
  // B2*(strongest) − shift.
  const span = theoryLevelSpan(resolved, axis, shift);
  const levelsU = Array.from({ length: levels }, (_, i) => span.start + ((span.end - span.start) * i) / (levels - 1));
  let table: ReducedB2Table | undefined;
  if (resolved.kind === 'depletion') {
    const top = Math.max(1, span.end);
    const u = Array.from({ length: levels }, (_, i) => (top * i) / (levels - 1));
    table = { u, b2: u.map((value) => asakuraOosawaReducedB2(resolved.q, axis.weakest + value * (axis.strongest - axis.weakest))) };
  }
  const theory = createMapFrame(resolved, axis, 0, table);
  const drawn = createMapFrame(resolved, axis, shift, table);
  const physics = resolved.kind === 'generic'
    ? genericLevelPhysics(resolved.theory, theory)
    : resolved.q <= SHORT_RANGE_LIMIT ? shortRangeDepletionLevelPhysics(resolved.q, theory) : depletionLevelPhysics(resolved.q, theory);
  const traced = traceTheoryCurves(physics, levelsU);

  const glass = glassLineTable(resolved, theory, parameters, options.glassLine ?? 'rescaled', Math.max(1, span.end));
  const partial = { binodal: traced.binodal, spinodal: traced.spinodal, freezing: traced.freezing, melting: traced.melting, glass: glass.curve, attractiveGlassFrom: glass.attractiveFrom };
  const names = modelNames(resolved);
  const curves = buildDrawnCurves(partial, theory, drawn, parameters, names, glass.source);
  const tables: ClassifierTables = { ...partial, ...(table ? { reducedB2: table } : {}), curves, active: [] };
  const stateAt = (phi: number, y: number) => stateOfCause(stateAtDrawnPoint(tables, theory, drawn, parameters, crystalSuppressed, phi, y));
  // Percolation never changes the predicted state (the rule does not use it): no need to test it.
  tables.active = curves.map((curve) => (curve.id === 'percolation' ? curve.points.slice(1).map(() => 0) : activeSegments(curve, drawn, stateAt)));

  return {
    modelVersion: PHYSICS_MODEL_VERSION,
    model: resolved,
    modelName: names.model,
    parameters,
    glassLine: glass.source,
    polydispersity,
    crystalSuppressed,
    levels,
    x: { label: 'φ', quantity: 'particle volume fraction', unit: '', domain: [0, FCC_CLOSE_PACKING], inverted: false, weakest: 0, strongest: FCC_CLOSE_PACKING },
    y: axis,
    boundaries: drawnBoundaries(curves, tables, theory, drawn),
    markers: buildMarkers(traced, drawn, names),
    regions: buildRegions(tables, theory, drawn, parameters, crystalSuppressed, columns, rows),
    notes: buildNotes(resolved, traced, theory, parameters, polydispersity, crystalSuppressed, glass.source),
    tables,
  };
}

/** Normalised theory-frame levels [start, end] the map must compute for a given shift. */
function theoryLevelSpan(model: MapModel, axis: MapAxis, shift: number): { start: number; end: number } {
  if (shift === 0) return { start: 0, end: 1 };
  const uOf = (y: number) => (y - axis.weakest) / (axis.strongest - axis.weakest);
  if (model.kind === 'generic') {
    const strongestB2 = genericB2FromY(model, axis.strongest);
    return { start: uOf(genericYFromB2(model, 1 - shift)), end: uOf(genericYFromB2(model, strongestB2 - shift)) };
  }
  const strongestB2 = asakuraOosawaReducedB2(model.q, axis.strongest);
  const start = 1 - shift >= 1 ? 0 : uOf(depletionPolymerForB2(model.q, 1 - shift));
  return { start, end: uOf(depletionPolymerForB2(model.q, strongestB2 - shift)) };
}

function requireInteger(argument: string, value: number, low: number, high: number): number {
  requireInRange(argument, value, low, high, { what: 'an integer', lowEnd: 'closed', highEnd: 'closed' });
  if (!Number.isInteger(value)) throw new PhysicsArgumentError(argument, `an integer in [${low}, ${high}]`, value);
  return value;
}

function modelNames(model: MapModel): { model: string; binodal: string; spinodal: string; critical: string } {
  if (model.kind === 'depletion' && model.q <= SHORT_RANGE_LIMIT) {
    return {
      model: `Colloid + ideal polymer, short range (q = ${Number(model.q.toPrecision(3))}): free-volume crystal lines, fluid–fluid lines by B2*`,
      binodal: 'Fluid–fluid binodal (mean field through B2*, approximate)',
      spinodal: 'Spinodal (mean field through B2*)',
      critical: 'Critical point (mean field through B2*)',
    };
  }
  if (model.kind === 'depletion') {
    return {
      model: `Colloid + ideal polymer, free-volume theory (q = ${Number(model.q.toPrecision(3))})`,
      binodal: 'Gas–liquid binodal (free-volume theory)',
      spinodal: 'Spinodal (free-volume theory)',
      critical: 'Critical point (free-volume theory)',
    };
  }
  if (model.theory === 'meanField') {
    return {
      model: 'Short-range attraction by B2*: Carnahan–Starling + mean-field attraction',
      binodal: 'Fluid–fluid binodal (mean field, approximate)',
      spinodal: 'Spinodal (mean field)',
      critical: 'Critical point (mean field)',
    };
  }
  return {
    model: 'Short-range attraction by B2*: Baxter adhesive spheres, Percus–Yevick',
    binodal: 'Fluid–fluid binodal (Percus–Yevick, compressibility route)',
    spinodal: 'Limit of stability (Percus–Yevick; dilute side: edge of the no-solution band)',
    critical: 'Critical point (Percus–Yevick)',
  };
}

/** 1 for segments across which the predicted state changes, tested just off both sides. */
function activeSegments(curve: DrawnCurve, drawn: MapFrame, stateAt: (phi: number, y: number) => string): number[] {
  const flags: number[] = [];
  const offset = 5e-4;
  const points = curve.points;
  const closePacking = FCC_CLOSE_PACKING;
  for (let i = 0; i + 1 < points.length; i++) {
    const ax = points[i][0] / closePacking;
    const bx = points[i + 1][0] / closePacking;
    const au = drawn.uFromY(points[i][1]);
    const bu = drawn.uFromY(points[i + 1][1]);
    const length = Math.sqrt((bx - ax) * (bx - ax) + (bu - au) * (bu - au));
    if (length === 0) {
      flags.push(0);
      continue;
    }
    // Midpoint, pushed along the unit normal to either side.
    const nx = (-(bu - au) / length) * offset;
    const nu = ((bx - ax) / length) * offset;
    const mx = 0.5 * (ax + bx);
    const mu = 0.5 * (au + bu);
    const plus = stateAt(clampUnit(mx + nx) * closePacking, drawn.yFromU(mu + nu));
    const minus = stateAt(clampUnit(mx - nx) * closePacking, drawn.yFromU(mu - nu));
    flags.push(plus === minus ? 0 : 1);
  }
  return flags;
}

function clampUnit(x: number): number {
  return x < 1e-9 ? 1e-9 : x > 1 - 1e-9 ? 1 - 1e-9 : x;
}

/**
 * Drawn pieces with metastable flags: binodal and spinodal segments where the crystal is more
 * stable than the fluid; percolation segments inside the binodal or where the crystal wins.
 */
function drawnBoundaries(curves: DrawnCurve[], tables: ClassifierTables, theory: MapFrame, drawn: MapFrame): MapBoundary[] {
  const theoryU = (y: number) => (drawn.shift === 0 ? theory.uFromY(y) : theory.uFromY(theory.yFromB2(drawn.b2FromY(y) - drawn.shift)));
  // The fluid is metastable wherever φ lies above the fluid side of fluid–crystal coexistence
  // (inside coexistence or in the crystal itself).
  const crystalMoreStable = (phi: number, u0: number) => phi > curveAt(tables.freezing, u0);
  const binodal = tables.binodal;
  const insideBinodal = (phi: number, u0: number) =>
    binodal !== null && u0 >= binodal.bottom && phi > curveAt(binodal.left, u0) && phi < curveAt(binodal.right, u0);
  const boundaries: MapBoundary[] = [];
  for (const curve of curves) {
    const approximate = curve.id === 'attractive-glass' || curve.id === 'gel';
    const metastableTest = curve.id === 'binodal' || curve.id === 'spinodal'
      ? (a: MapVertex, b: MapVertex) => crystalMoreStable(0.5 * (a[0] + b[0]), theoryU(0.5 * (a[1] + b[1])))
      : curve.id === 'percolation'
        ? (a: MapVertex, b: MapVertex) => {
            const phi = 0.5 * (a[0] + b[0]);
            const u0 = theoryU(0.5 * (a[1] + b[1]));
            return insideBinodal(phi, u0) || crystalMoreStable(phi, u0);
          }
        : () => false;
    for (const run of splitByFlag(curve.points, metastableTest)) {
      boundaries.push({ id: curve.id, label: curve.label, points: run.points.map(roundPoint), metastable: run.flag, approximate });
    }
  }
  return boundaries;
}

function buildMarkers(traced: TheoryCurves, drawn: MapFrame, names: { critical: string }): MapMarker[] {
  const markers: MapMarker[] = [];
  if (traced.binodal) {
    markers.push({ id: 'critical-point', label: names.critical, x: traced.binodal.left.phi[0], y: drawn.drawnYFromTheoryU(traced.binodal.bottom) });
  }
  const simulationB2 = reducedB2FromStickiness(SIMULATION_CRITICAL_POINT.tau);
  const simulationY = drawn.yFromB2(simulationB2 + drawn.shift);
  markers.push({
    id: 'simulation-critical-point',
    label: `Sticky-sphere critical point from simulation (τ = ${SIMULATION_CRITICAL_POINT.tau}, B2* = ${simulationB2.toFixed(3)}; Miller & Frenkel 2003)`,
    x: SIMULATION_CRITICAL_POINT.phi,
    y: simulationY,
  });
  if (traced.triple) {
    const t = traced.triple;
    markers.push({
      id: 'triple-point',
      label: `Gas–liquid–crystal triple point (gas φ = ${t.gas.toPrecision(3)}, liquid ${t.liquid.toPrecision(3)}, crystal ${t.solid.toPrecision(3)})`,
      x: t.liquid,
      y: drawn.drawnYFromTheoryU(t.u),
    });
  }
  return markers;
}

/**
 * The region grid. Along a row the attraction is fixed, so the rule's cause can only change at
 * the row's thresholds (spinodal, binodal, glass line, freezing, melting): the rule is evaluated
 * once per interval between them (at its middle) and the interval's cells filled.
 */
function buildRegions(tables: ClassifierTables, theory: MapFrame, drawn: MapFrame, parameters: ClassifierParameters, crystalSuppressed: boolean, columns: number, rows: number): StateRegions {
  // A plain packed array, filled in order (Array.from on a typed array costs ~1 ms here).
  const cells: number[] = [];
  const row = emptyRow();
  const closePacking = FCC_CLOSE_PACKING;
  const step = closePacking / columns;
  for (let r = 0; r < rows; r++) {
    const y = drawn.yFromU((r + 0.5) / rows);
    const effectiveB2 = drawn.b2FromY(y) - drawn.shift;
    const u0 = drawn.shift === 0 ? theory.uFromY(y) : theory.uFromY(theory.yFromB2(effectiveB2));
    ruleRowAt(tables, u0, effectiveB2, row);
    const cuts = [row.spinodalLow, row.spinodalHigh, row.binodalLow, row.binodalHigh, row.glass, row.freezing, row.melting]
      .filter((phi) => phi > 0 && phi < closePacking)
      .sort((a, b) => a - b);
    cuts.push(closePacking);
    let column = 0;
    let start = 0;
    for (const end of cuts) {
      if (end <= start) continue;
      const code = CODE_OF_CAUSE[causeOnRow(row, parameters, crystalSuppressed, 0.5 * (start + end))];
      // Cells whose centre lies in [start, end).
      while (column < columns && (column + 0.5) * step < end) {
        cells.push(code);
        column++;
      }
      start = end;
    }
  }
  return { codes: STATE_CODES, labels: REGION_LABELS, columns, rows, cells };
}

function buildNotes(model: MapModel, traced: TheoryCurves, theory: MapFrame, parameters: ClassifierParameters, polydispersity: number | null, crystalSuppressed: boolean, glass: GlassLineSource): string[] {
  const notes = [
    'Approximate: predictions come from published theory and the team\'s calibration; they do not replace stability testing.',
  ];
  if (model.kind === 'generic') {
    notes.push('Any short-range attraction is placed by its reduced second virial coefficient B2* (extended law of corresponding states, Noro & Frenkel 2000).');
    notes.push(model.theory === 'meanField'
      ? 'Fluid–fluid lines: Carnahan–Starling fluid with a mean-field attraction fixed by B2* (the approximate binodal).'
      : 'Fluid–fluid lines: Baxter adhesive spheres in the Percus–Yevick approximation (compressibility route); on the dilute side the limit of stability is the edge of the band where the theory has no solution.');
    notes.push('Fluid–crystal lines: the same mean-field attraction applied to the Carnahan–Starling fluid and the cell-model crystal (approximate for short-range attraction, which widens coexistence more).');
    if (model.theory === 'baxterPY' && traced.binodal && traced.binodalTop !== null && traced.binodalTop < 1) {
      const b2 = theory.b2FromY(theory.yFromU(traced.binodalTop));
      notes.push(`The Percus–Yevick binodal has no solution beyond B2* ≈ ${b2.toFixed(2)} (τ ≈ ${stickinessFromReducedB2(b2).toFixed(4)}); it is drawn up to there and the classifier keeps its last width above.`);
    }
  } else {
    const endpoint = freeVolumeCriticalEndpoint();
    notes.push(`Free-volume theory (Lekkerkerker et al. 1992) for colloids with ideal polymer at size ratio q = ${Number(model.q.toPrecision(3))}; attraction is the Asakura–Oosawa depletion potential.`);
    if (model.q <= SHORT_RANGE_LIMIT) {
      notes.push(`Short-range depletion (q ≤ ${SHORT_RANGE_LIMIT}): the fluid–fluid lines (binodal, spinodal, critical point) are the mean-field lines at each level's B2* (extended law of corresponding states, as Lu et al. 2008 placed their depletion gels); free-volume theory gives the fluid–crystal lines. Its own gas–liquid dome lies at φ ≳ 0.6 for such small q, where it says nothing about dilute gels.`);
    } else {
      notes.push(model.q > endpoint
        ? `q above the critical endpoint (${endpoint.toFixed(4)}): a stable gas–liquid region exists up to the triple point.`
        : `q below the critical endpoint (${endpoint.toFixed(4)}): the gas–liquid binodal is metastable inside fluid–crystal coexistence and is drawn dashed.`);
      if (model.q > 0.6) notes.push('Size ratios above about 0.6 stretch the ideal-polymer, free-volume description; treat the lines as indicative.');
      const critical = freeVolumeCriticalPoint(model.q);
      if (critical.beyondClosePacking) notes.push(`The free-volume critical point lies at φ = ${critical.phi.toFixed(3)}, beyond close packing: a formal point, with no real gas–liquid region.`);
      else if (critical.polymerReservoir > theory.axis.strongest) notes.push(`The gas–liquid critical point (φ_p^R = ${critical.polymerReservoir.toFixed(3)}) lies above the top of this map: no fluid–fluid lines are drawn.`);
      else if (critical.phi > 0.6) notes.push(`The gas–liquid critical point lies at φ = ${critical.phi.toFixed(3)}, inside the glass: its binodal is mostly hidden behind the glass line.`);
    }
  }
  notes.push(...glassNotes(glass, parameters));
  notes.push(`Gel: inside the spinodal and below the glass line (arrested spinodal decomposition, Lu et al., Nature 453, 499 (2008)); inside the binodal a sample gels when B2* ≤ ${parameters.gelB2Threshold}${parameters.gelB2Threshold === DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold ? ' (default: the critical B2* ≈ −1.5, since Lu et al. saw every quench into the two-phase region gel)' : ' (calibrated; default −1.5 from Lu et al. 2008)'}, otherwise it separates slowly.`);
  if (parameters.attractionShift !== 0) notes.push(`Attraction scale shifted by ${parameters.attractionShift} in B2* (calibration): every theory boundary is drawn at B2* + ${parameters.attractionShift}.`);
  if (crystalSuppressed) notes.push(`Polydispersity ${polydispersity} % exceeds ${parameters.polydispersityCrystalThreshold} %: crystallisation is suppressed; the crystal region is greyed and classified as fluid (glass beyond the glass line).`);
  return notes;
}

/** Plain words on where the glass line comes from and how far to trust it. */
function glassNotes(glass: GlassLineSource, parameters: ClassifierParameters): string[] {
  const grid = `M = ${glass.points} wave numbers up to k_max σ = ${glass.cutoff}`;
  const placement = glass.mapping === 'rescaled'
    ? `drawn rescaled: every φ × ${glass.scale.toFixed(4)} so that hard spheres sit at the observed φ_g = ${parameters.glassPhi} (MCT computes ${glass.computedHardSpherePhi.toFixed(4)}; the usual practice, as MCT places the transition too low)`
    : `drawn as computed (hard spheres at ${glass.computedHardSpherePhi.toFixed(4)}, below the observed φ_g ≈ 0.58; choose the rescaled line to compare with the bench)`;
  if (glass.kind === 'hardSphere') {
    return [`Glass line: the hard-sphere transition of idealised mode-coupling theory (Percus–Yevick structure, ${grid}), ${placement}. The attraction's range (${glass.range?.toFixed(2)} σ) exceeds ${SHORT_RANGE_LIMIT} σ, too long for the adhesive-sphere glass lines, so no attractive glass is drawn.`];
  }
  return [
    `Glass lines: idealised mode-coupling theory of adhesive hard spheres (Percus–Yevick structure factor, Baxter 1968; ${grid}), each attraction placed through its B2*; ${placement}.`,
    'The line is re-entrant: weak short-range attraction melts the repulsive glass (its φ rises), strong attraction arrests at lower φ into an attractive glass (Bergenholtz & Fuchs 1999; Dawson et al. 2000; Pham et al., Science 2002). The sticky part depends on the cut-off k_max (a stand-in for the range of the attraction) and is approximate; past the nose, where the theory meets near-critical structure, the line holds its last computed φ.',
  ];
}
