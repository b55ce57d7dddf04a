import { brentRoot } from './brent-root';
import { newton2d } from './newton-2d';
import { safeguardedNewton } from './safeguarded-newton';

/**
 * One thermodynamic branch of a phase, restricted to a volume-fraction interval on which the
 * reduced pressure p̃ = βPv₀ rises with φ (so the chemical potential rises too, dμ = dp̃/φ).
 * Every coexistence problem in this module (hard-sphere freezing, mean-field and Baxter
 * gas–liquid, free-volume theory) is phrased with such branches.
 */
export interface PhaseBranch {
  low: number;
  high: number;
  pressure(phi: number): number;
  chemicalPotential(phi: number): number;
  /** dp̃/dφ, ≥ 0 on [low, high]. */
  pressureDerivative(phi: number): number;
}

export interface CoexistencePoint {
  /** φ of the first (usually dilute) branch and of the second branch. */
  first: number;
  second: number;
  pressure: number;
  chemicalPotential: number;
  /** Index of the branch of `firstBranches` that won (see {@link envelopeCoexistence}). */
  firstBranchIndex: number;
}

/**
 * Volume fraction on a branch at which βμ equals `mu`, by safeguarded Newton in ln φ
 * (dμ/d ln φ = dp̃/dφ), or `null` if μ is outside the branch's range.
 */
export function branchAtChemicalPotential(branch: PhaseBranch, mu: number, guess?: number): number | null {
  const logLow = Math.log(branch.low);
  const logHigh = Math.log(branch.high);
  // A μ equal to an end value up to rounding belongs to that end.
  const slack = 1e-13 * (1 + Math.abs(mu));
  const muAtLow = branch.chemicalPotential(branch.low);
  const muAtHigh = branch.chemicalPotential(branch.high);
  if (Math.abs(mu - muAtLow) <= slack) return branch.low;
  if (Math.abs(mu - muAtHigh) <= slack) return branch.high;
  const root = safeguardedNewton(
    (t) => branch.chemicalPotential(Math.exp(t)) - mu,
    (t) => branch.pressureDerivative(Math.exp(t)),
    logLow,
    logHigh,
    guess !== undefined ? Math.log(guess) : undefined,
    1e-14,
    1e-15,
  );
  return root === null ? null : Math.exp(root);
}

/**
 * Coexistence between the most stable of several branches of one phase (`firstBranches`, e.g. the
 * gas and liquid pieces of a fluid with a van der Waals loop) and a second branch: the chemical
 * potential at which the second branch's pressure equals the highest pressure the first phase
 * reaches at that chemical potential. Bracketing is on μ with Brent's method (the pressure
 * difference is monotone in μ, d(p₂ − p₁)/dμ = φ₂ − φ₁), then the pair (φ₁, φ₂) is polished by
 * Newton in (ln φ₁, ln φ₂) so that |Δp̃| and |Δβμ| fall below ~1e-13.
 *
 * @returns the coexisting pair, or `null` if the chemical-potential ranges do not overlap or the
 *   pressure difference does not change sign in the overlap (no coexistence).
 */
export function envelopeCoexistence(firstBranches: PhaseBranch[], second: PhaseBranch): CoexistencePoint | null {
  const secondLowMu = second.chemicalPotential(second.low);
  const secondHighMu = second.chemicalPotential(second.high);
  let muLow = Infinity;
  let muHigh = -Infinity;
  for (const branch of firstBranches) {
    muLow = Math.min(muLow, branch.chemicalPotential(branch.low));
    muHigh = Math.max(muHigh, branch.chemicalPotential(branch.high));
  }
  muLow = Math.max(muLow, secondLowMu);
  muHigh = Math.min(muHigh, secondHighMu);
  if (!(muLow < muHigh)) return null;
  const firstAt = (mu: number): { phi: number; pressure: number; index: number } | null => {
    let best: { phi: number; pressure: number; index: number } | null = null;
    firstBranches.forEach((branch, index) => {
      const phi = branchAtChemicalPotential(branch, mu);
      if (phi === null) return;
      const pressure = branch.pressure(phi);
      if (best === null || pressure > best.pressure) best = { phi, pressure, index };
    });
    return best;
  };
  const difference = (mu: number): number => {
    const first = firstAt(mu);
    const phiSecond = branchAtChemicalPotential(second, mu);
    if (first === null || phiSecond === null) return NaN;
    return second.pressure(phiSecond) - first.pressure;
  };
  // Shrink the ends slightly so both inversions exist (the ends are branch limits).
  const span = muHigh - muLow;
  const mu = brentRoot(difference, muLow + 1e-12 * span, muHigh - 1e-12 * span, { absoluteTolerance: 1e-13 });
  if (mu === null) return null;
  const first = firstAt(mu);
  const phiSecond = branchAtChemicalPotential(second, mu);
  if (first === null || phiSecond === null) return null;
  const polished = polishCoexistence(firstBranches[first.index], second, first.phi, phiSecond);
  const [phiA, phiB] = polished ?? [first.phi, phiSecond];
  return {
    first: phiA,
    second: phiB,
    pressure: second.pressure(phiB),
    chemicalPotential: second.chemicalPotential(phiB),
    firstBranchIndex: first.index,
  };
}

/** Coexistence of exactly two branches (see {@link envelopeCoexistence}). */
export function twoBranchCoexistence(first: PhaseBranch, second: PhaseBranch): CoexistencePoint | null {
  return envelopeCoexistence([first], second);
}

/**
 * Newton polish of a coexisting pair in (ln φ₁, ln φ₂): equal p̃ and equal βμ.
 * Returns `null` if it fails (the caller keeps the bracketed pair).
 */
export function polishCoexistence(first: PhaseBranch, second: PhaseBranch, phiFirst: number, phiSecond: number): [number, number] | null {
  const result = newton2d(
    (u, v, out) => {
      const a = Math.exp(u);
      const b = Math.exp(v);
      const dpa = first.pressureDerivative(a);
      const dpb = second.pressureDerivative(b);
      out[0] = first.pressure(a) - second.pressure(b);
      out[1] = first.chemicalPotential(a) - second.chemicalPotential(b);
      // d/d ln φ of p̃ is φ·p̃′; of βμ it is p̃′ (dμ = dp̃/φ).
      out[2] = a * dpa;
      out[3] = -b * dpb;
      out[4] = dpa;
      out[5] = -dpb;
    },
    Math.log(phiFirst),
    Math.log(phiSecond),
    {
      residualTolerance: 1e-13,
      inDomain: (u, v) => {
        const a = Math.exp(u);
        const b = Math.exp(v);
        return a >= first.low && a <= first.high && b >= second.low && b <= second.high;
      },
    },
  );
  return result === null ? null : [Math.exp(result[0]), Math.exp(result[1])];
}

/**
 * Coexistence by continuation: Newton from the previous (neighbouring) solution on the branch
 * that contains it, accepted only if no other branch of the first phase is more stable at the
 * resulting chemical potential; otherwise the full bracketing solve. Used while a map steps
 * through attraction levels (a few evaluations per level instead of hundreds).
 */
export function continuedEnvelopeCoexistence(
  firstBranches: PhaseBranch[],
  second: PhaseBranch,
  previous: CoexistencePoint | null,
): CoexistencePoint | null {
  if (previous !== null && firstBranches.length > 0) {
    const index = branchIndexNearest(firstBranches, previous.first);
    const branch = firstBranches[index];
    const start = clamp(previous.first, branch.low, branch.high);
    const startSecond = clamp(previous.second, second.low, second.high);
    const polished = polishCoexistence(branch, second, start, startSecond);
    if (polished !== null && Math.abs(polished[1] - polished[0]) > 1e-6) {
      const [phiFirst, phiSecond] = polished;
      const mu = branch.chemicalPotential(phiFirst);
      const pressure = branch.pressure(phiFirst);
      const beaten = firstBranches.some((other, otherIndex) => {
        if (otherIndex === index) return false;
        const phiOther = branchAtChemicalPotential(other, mu);
        return phiOther !== null && other.pressure(phiOther) > pressure + 1e-12 * (1 + Math.abs(pressure));
      });
      if (!beaten) {
        return { first: phiFirst, second: phiSecond, pressure, chemicalPotential: mu, firstBranchIndex: index };
      }
    }
  }
  return envelopeCoexistence(firstBranches, second);
}

function branchIndexNearest(branches: PhaseBranch[], phi: number): number {
  let best = 0;
  let bestDistance = Infinity;
  branches.forEach((branch, index) => {
    const distance = phi < branch.low ? branch.low - phi : phi > branch.high ? phi - branch.high : 0;
    if (distance < bestDistance) { best = index; bestDistance = distance; }
  });
  return best;
}

function clamp(value: number, low: number, high: number): number {
  return Math.min(Math.max(value, low), high);
}
