import { brentRoot } from '../numerics/brent-root';
import {
  branchAtChemicalPotential,
  continuedEnvelopeCoexistence,
  type CoexistencePoint,
  type PhaseBranch,
} from '../numerics/two-phase-coexistence';
import type { DomeCurve, LevelCurve } from './types';

/**
 * The physics of one map model at a normalised attraction level u (theory frame): what the
 * level-by-level driver below needs. Internal.
 */
export interface LevelPhysics {
  /** Critical point of the fluid–fluid theory, or null. */
  critical: { phi: number; u: number } | null;
  /** The fluid cut into pieces on which p̃ rises, with the spinodal that separates them. */
  fluid(u: number): { pieces: PhaseBranch[]; spinodal: { low: number; high: number } | null };
  solid(u: number): PhaseBranch;
  /** Gas and liquid branches whose coexistence is the binodal (null if none at u). */
  binodalBranches(u: number): [PhaseBranch, PhaseBranch] | null;
  /** The drawn limit of stability at u (left, right), or null. */
  spinodal(u: number): [number, number] | null;
  /** Whether to look for a gas–liquid–crystal triple point (needs consistent fluid and crystal). */
  findTriplePoint: boolean;
}

export interface TheoryCurves {
  binodal: DomeCurve | null;
  spinodal: DomeCurve | null;
  freezing: LevelCurve;
  melting: LevelCurve;
  triple: { u: number; gas: number; liquid: number; solid: number } | null;
  /** Highest u at which the binodal was found (the Percus–Yevick binodal can end: "no solution"). */
  binodalTop: number | null;
}

/**
 * Walk the attraction levels from weak to strong and collect the coexistence curves, continuing
 * each solution from the level below (Newton) and falling back to a full bracketing solve when the
 * continuation fails. Internal.
 */
export function traceTheoryCurves(physics: LevelPhysics, levelsU: number[]): TheoryCurves {
  const freezing: LevelCurve = { u: [], phi: [] };
  const melting: LevelCurve = { u: [], phi: [] };
  const critical = physics.critical;
  const binodal: DomeCurve | null = critical ? { bottom: critical.u, left: { u: [critical.u], phi: [critical.phi] }, right: { u: [critical.u], phi: [critical.phi] } } : null;
  const spinodal: DomeCurve | null = critical ? { bottom: critical.u, left: { u: [critical.u], phi: [critical.phi] }, right: { u: [critical.u], phi: [critical.phi] } } : null;
  let previousSolid: CoexistencePoint | null = null;
  let previousBinodal: CoexistencePoint | null = null;
  let previousFluidIsGas = false;
  let previousU = NaN;
  let binodalEnded = false;
  let binodalTop: number | null = null;
  let triple: TheoryCurves['triple'] = null;

  for (const u of levelsU) {
    const fluid = physics.fluid(u);
    const solid = physics.solid(u);
    const point = continuedEnvelopeCoexistence(fluid.pieces, solid, previousSolid);
    if (point === null) continue;
    const fluidIsGas = fluid.spinodal !== null && point.first <= fluid.spinodal.low;
    if (physics.findTriplePoint && fluidIsGas && !previousFluidIsGas && previousBinodal && !Number.isNaN(previousU)) {
      triple = refineTriplePoint(physics, previousU, u, previousBinodal);
      if (triple) {
        freezing.u.push(triple.u, triple.u);
        freezing.phi.push(triple.liquid, triple.gas);
        melting.u.push(triple.u);
        melting.phi.push(triple.solid);
      }
    }
    freezing.u.push(u);
    freezing.phi.push(point.first);
    melting.u.push(u);
    melting.phi.push(point.second);
    previousSolid = point;
    previousFluidIsGas = fluidIsGas;

    if (critical && binodal && spinodal && u > critical.u) {
      const limits = physics.spinodal(u);
      if (limits) {
        spinodal.left.u.push(u); spinodal.left.phi.push(limits[0]);
        spinodal.right.u.push(u); spinodal.right.phi.push(limits[1]);
      }
      const branches = binodalEnded ? null : physics.binodalBranches(u);
      const pair: CoexistencePoint | null = branches ? continuedEnvelopeCoexistence([branches[0]], branches[1], previousBinodal) : null;
      if (pair) {
        binodal.left.u.push(u); binodal.left.phi.push(pair.first);
        binodal.right.u.push(u); binodal.right.phi.push(pair.second);
        previousBinodal = pair;
        binodalTop = u;
      } else if (previousBinodal) {
        // Once it fails above the critical point it stays failed further up (no solution).
        binodalEnded = true;
      }
    }
    previousU = u;
  }
  return { binodal, spinodal, freezing, melting, triple, binodalTop };
}

/**
 * Triple point between two levels: where the crystal's pressure at the gas–liquid chemical
 * potential equals the gas–liquid pressure (Brent on u, tolerance 1e-12).
 */
function refineTriplePoint(physics: LevelPhysics, uLow: number, uHigh: number, startBinodal: CoexistencePoint): TheoryCurves['triple'] {
  let last: CoexistencePoint | null = startBinodal;
  const gasLiquid = (u: number): CoexistencePoint | null => {
    const branches = physics.binodalBranches(u);
    if (!branches) return null;
    const pair: CoexistencePoint | null = continuedEnvelopeCoexistence([branches[0]], branches[1], last);
    if (pair) last = pair;
    return pair;
  };
  const excess = (u: number) => {
    const pair = gasLiquid(u);
    if (!pair) return NaN;
    const solid = physics.solid(u);
    const phiSolid = branchAtChemicalPotential(solid, pair.chemicalPotential);
    if (phiSolid === null) return solid.chemicalPotential(solid.low) > pair.chemicalPotential ? -1 : 1;
    return solid.pressure(phiSolid) - pair.pressure;
  };
  const u = brentRoot(excess, uLow, uHigh, { absoluteTolerance: 1e-12 });
  if (u === null) return null;
  const pair = gasLiquid(u);
  if (!pair) return null;
  const phiSolid = branchAtChemicalPotential(physics.solid(u), pair.chemicalPotential);
  if (phiSolid === null) return null;
  return { u, gas: pair.first, liquid: pair.second, solid: phiSolid };
}
