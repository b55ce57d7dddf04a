import { adaptiveGaussKronrod } from '../numerics/adaptive-gauss-kronrod';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import { MAX_WELL_DEPTH } from './square-well-reduced-b2';

export interface ReducedB2Options {
  /** Points inside (1, xMax) where βu has a kink or jump; the quadrature splits there. */
  breakpoints?: number[];
  /** Relative tolerance of the adaptive quadrature (default 1e-11). */
  relativeTolerance?: number;
  /**
   * Scan towards contact for a narrow well's edges (default true). A caller whose potential is
   * smooth over the whole range (Asakura–Oosawa) turns it off: the scan then only adds cuts
   * where a steep smooth well changes fast, which costs time and gains no accuracy.
   */
  contactScan?: boolean;
}

/**
 * Reduced second virial coefficient of hard spheres plus any pair energy beyond contact, by
 * quadrature of the Mayer function:
 * B2* = 1 − 3 ∫₁^xMax (e^{−βu(x)} − 1) x² dx, x = r/σ (dimensionless).
 *
 * Source: the virial route (e.g. Hansen & McDonald, *Theory of Simple Liquids*, 4th ed., §3.9),
 * reduced by B2_HS = 2πσ³/3; the square-well closed form 1 − (λ³ − 1)(e^U − 1) is its test.
 * Numerics: adaptive 7/15 Gauss–Kronrod, relative tolerance 1e-11 (absolute 1e-14) unless set,
 * on pieces split at the given breakpoints and at the points where a scan towards contact sees
 * the Mayer function change (contactScanCuts), so a narrow deep well at contact is found even when
 * no breakpoint is given.
 *
 * @param betaU pair energy in kT at x = r/σ ≥ 1; zero beyond xMax. It may return +Infinity (an
 *   extra hard core) but not NaN, and attraction deeper than 700 kT cannot be represented.
 * @param xMax end of the interaction, 1 < xMax < ∞.
 * @throws PhysicsArgumentError if xMax ≤ 1 or not finite, if betaU is not a function, returns
 *   NaN or −Infinity, or is deeper than −700 kT.
 * @example reducedB2FromPotential(() => -1, 1.5) // -3.08077... = 1 − 2.375(e − 1)
 */
export function reducedB2FromPotential(betaU: (x: number) => number, xMax: number, options: ReducedB2Options = {}): number {
  if (typeof betaU !== 'function') throw new PhysicsArgumentError('betaU', 'a function of x = r/σ returning the pair energy in kT', betaU);
  requireInRange('xMax', xMax, 1, Infinity, { what: 'the end of the interaction in units of σ' });
  const mayerTimesShell = (x: number): number => {
    const energy = betaU(x);
    if (Number.isNaN(energy) || energy === -Infinity || (typeof energy !== 'number')) {
      throw new PhysicsArgumentError('betaU', 'a function returning finite energies in kT (or +Infinity for overlap)', energy);
    }
    if (energy < -MAX_WELL_DEPTH) {
      throw new PhysicsArgumentError('betaU', `a pair energy no deeper than -${MAX_WELL_DEPTH} kT (B2* would overflow)`, energy);
    }
    return Math.expm1(-energy) * x * x;
  };
  const given = (options.breakpoints ?? []).filter((x) => x > 1 && x < xMax);
  const scanned = options.contactScan === false ? [] : contactScanCuts(mayerTimesShell, 1, Math.min(xMax, ...given.length ? given : [xMax]));
  const cuts = [...new Set([1, ...given, ...scanned, xMax])].sort((a, b) => a - b);
  let integral = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    integral += adaptiveGaussKronrod(mayerTimesShell, cuts[i], cuts[i + 1], {
      relativeTolerance: options.relativeTolerance ?? 1e-11,
      absoluteTolerance: 1e-14,
    }).value;
  }
  return 1 - 3 * integral;
}

/** Points scanned towards the start of the interval: 1 + (end − 1)·2^−k, k = 1…CONTACT_SCAN_DEPTH. */
const CONTACT_SCAN_DEPTH = 40;

/**
 * Cut points for the quadrature near contact, from a scan at x_k = start + (end − start)·2^−k
 * (k = 0…40, down to ~1e-12 of the range): each pair x_{k−1}, x_k across which the integrand
 * changes by more than half its size (a well's edge). A fixed 15-point rule on [1, xMax] can step over a
 * well only 1e-3 wide entirely (and report B2* = 1); cut there, each piece either contains the
 * well edge, which the adaptive rule then resolves, or lies wholly inside or outside it. Smooth
 * potentials change little between neighbouring scan points and add only a few cuts. Internal.
 */
function contactScanCuts(integrand: (x: number) => number, start: number, end: number): number[] {
  const cuts: number[] = [];
  let outer = integrand(end);
  for (let k = 1; k <= CONTACT_SCAN_DEPTH; k++) {
    const x = start + (end - start) * 2 ** -k;
    if (x <= start) break;
    const inner = integrand(x);
    if (Math.abs(inner - outer) > 0.5 * Math.max(Math.abs(inner), Math.abs(outer))) cuts.push(x, start + (end - start) * 2 ** -(k - 1));
    outer = inner;
  }
  return cuts.filter((x) => x > start && x < end);
}
