import { freeVolumeCriticalPointUnchecked } from '../depletion/free-volume-critical-point';
import { freeVolumeFluidPieces } from '../depletion/free-volume-fluid-pieces';
import { freeVolumeSolidBranch } from '../depletion/free-volume-branches';
import { baxterFluidBranch } from '../fluid-fluid/baxter-py-branch';
import { baxterPYCriticalPoint } from '../fluid-fluid/baxter-py-critical-point';
import { baxterBandUnchecked } from '../fluid-fluid/baxter-py-no-solution-band';
import { BAXTER_SPINODAL_END, baxterSpinodalUnchecked } from '../fluid-fluid/baxter-py-spinodal-stickiness';
import { meanFieldFluidBranch, meanFieldSolidBranch } from '../fluid-fluid/mean-field-branches';
import { meanFieldCriticalPoint } from '../fluid-fluid/mean-field-critical-point';
import { meanFieldSpinodalUnchecked } from '../fluid-fluid/mean-field-spinodal';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { FLUID_BRANCH_LIMIT, LIQUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { brentRoot } from '../numerics/brent-root';
import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import type { MapFrame } from './map-frame';
import type { LevelPhysics } from './theory-curves';
import { stickinessFromReducedB2 } from '../attraction/stickiness-from-reduced-b2';
import { reducedB2FromStickiness } from '../attraction/reduced-b2-from-stickiness';

/**
 * Level physics of a generic map (theory frame): mean-field CS + B2* fluid and crystal for the
 * fluid–crystal lines in both theories; the binodal, spinodal and critical point from the chosen
 * theory. Internal.
 */
export function genericLevelPhysics(theory: 'meanField' | 'baxterPY', frame: MapFrame): LevelPhysics {
  const b2At = (u: number) => frame.b2FromY(frame.yFromU(u));
  const meanField = meanFieldCriticalPoint();
  const fluid = memoizeLast((u: number) => {
    const b2 = b2At(u);
    const spinodal = b2 < meanField.b2 ? meanFieldSpinodalUnchecked(b2) : null;
    if (spinodal === null) return { pieces: [meanFieldFluidBranch(b2, 1e-300, FLUID_BRANCH_LIMIT)], spinodal: null };
    const pieces: PhaseBranch[] = [meanFieldFluidBranch(b2, 1e-300, spinodal.low)];
    if (spinodal.high < FLUID_BRANCH_LIMIT) pieces.push(meanFieldFluidBranch(b2, spinodal.high, FLUID_BRANCH_LIMIT));
    return { pieces, spinodal };
  });
  const solid = memoizeLast((u: number) => {
    const b2 = b2At(u);
    const trial = meanFieldSolidBranch(b2, 0.5);
    if (trial.pressureDerivative(0.5) > 0) return trial;
    const onset = brentRoot((phi) => trial.pressureDerivative(phi), 0.5, FCC_CLOSE_PACKING * (1 - 1e-9), { absoluteTolerance: 1e-14 });
    return meanFieldSolidBranch(b2, (onset ?? 0.5) * (1 + 1e-9));
  });
  if (theory === 'meanField') {
    return {
      critical: { phi: meanField.phi, u: frame.uFromY(frame.yFromB2(meanField.b2)) },
      fluid,
      solid,
      binodalBranches: memoizeLast((u: number): [PhaseBranch, PhaseBranch] | null => {
        const { pieces, spinodal } = fluid(u);
        if (spinodal === null || spinodal.high >= LIQUID_BRANCH_LIMIT) return null;
        const b2 = b2At(u);
        return [pieces[0], meanFieldFluidBranch(b2, spinodal.high, LIQUID_BRANCH_LIMIT)];
      }),
      spinodal: (u) => {
        const limits = fluid(u).spinodal;
        return limits ? [limits.low, limits.high] : null;
      },
      findTriplePoint: true,
    };
  }
  const baxter = baxterPYCriticalPoint();
  // B2* ≥ 1 (possible under a negative attraction shift) has no adhesive-sphere equivalent.
  const tauAt = (u: number) => {
    const b2 = b2At(u);
    return b2 < 1 ? stickinessFromReducedB2(b2) : Infinity;
  };
  const band = memoizeLast((u: number) => baxterBandUnchecked(tauAt(u)));
  return {
    critical: { phi: baxter.phi, u: frame.uFromY(frame.yFromB2(reducedB2FromStickiness(baxter.tau))) },
    fluid,
    solid,
    binodalBranches: memoizeLast((u: number): [PhaseBranch, PhaseBranch] | null => {
      const tau = tauAt(u);
      const edges = band(u);
      if (edges === null) return null;
      return [baxterFluidBranch(tau, 1e-300, edges.low * (1 - 1e-12)), baxterFluidBranch(tau, edges.high * (1 + 1e-12), LIQUID_BRANCH_LIMIT)];
    }),
    spinodal: (u) => {
      const tau = tauAt(u);
      const edges = band(u);
      if (edges === null) return null;
      const dense = brentRoot((phi) => baxterSpinodalUnchecked(phi) - tau, baxter.phi, BAXTER_SPINODAL_END, { absoluteTolerance: 1e-15 });
      return dense === null ? null : [edges.low, dense];
    },
    // The crystal lines come from the mean-field free energy, the binodal from Percus–Yevick:
    // no consistent triple point exists between the two.
    findTriplePoint: false,
  };
}

/** Level physics of a depletion map: free-volume theory at size ratio q (theory frame). Internal. */
export function depletionLevelPhysics(q: number, frame: MapFrame): LevelPhysics {
  const critical = freeVolumeCriticalPointUnchecked(q);
  const polymerAt = (u: number) => Math.max(0, frame.yFromU(u));
  const fluid = memoizeLast((u: number) => freeVolumeFluidPieces(q, polymerAt(u), critical));
  const gasLiquid = memoizeLast((u: number) => freeVolumeFluidPieces(q, polymerAt(u), critical, LIQUID_BRANCH_LIMIT));
  return {
    critical: { phi: critical.phi, u: frame.uFromY(critical.polymerReservoir) },
    fluid,
    solid: memoizeLast((u: number) => freeVolumeSolidBranch(q, polymerAt(u))),
    binodalBranches: (u) => {
      const { pieces, spinodal } = gasLiquid(u);
      return spinodal && pieces.length === 2 ? [pieces[0], pieces[1]] : null;
    },
    spinodal: (u) => {
      const limits = fluid(u).spinodal;
      return limits ? [limits.low, limits.high] : null;
    },
    findTriplePoint: critical.stable,
  };
}

/**
 * Level physics of a short-range depletion map (q ≤ SHORT_RANGE_LIMIT): the fluid–crystal lines
 * from free-volume theory, the fluid–fluid lines (critical point, binodal, spinodal) from the
 * mean-field CS + B2* theory at each level's Asakura–Oosawa B2* — the extended law of
 * corresponding states, as Lu et al. (Nature 453, 499 (2008)) mapped their depletion gels.
 * At small q free-volume theory puts its (metastable) gas–liquid dome at φ ≳ 0.6, where no
 * dilute sample could enter it; short-range attraction is what B2* describes well. No triple
 * point: the two free energies differ. Internal.
 */
export function shortRangeDepletionLevelPhysics(q: number, frame: MapFrame): LevelPhysics {
  const crystal = depletionLevelPhysics(q, frame);
  const fluidFluid = genericLevelPhysics('meanField', frame);
  return {
    critical: fluidFluid.critical,
    fluid: crystal.fluid,
    solid: crystal.solid,
    binodalBranches: fluidFluid.binodalBranches,
    spinodal: fluidFluid.spinodal,
    findTriplePoint: false,
  };
}

/** Remember the result for the last argument: the driver asks several questions per level. */
function memoizeLast<R>(compute: (u: number) => R): (u: number) => R {
  let lastU = NaN;
  let lastResult: R;
  return (u: number) => {
    if (u !== lastU) {
      lastResult = compute(u);
      lastU = u;
    }
    return lastResult;
  };
}
