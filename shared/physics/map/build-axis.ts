import { asakuraOosawaReducedB2 } from '../attraction/asakura-oosawa-reduced-b2';
import { brentRoot } from '../numerics/brent-root';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import { genericB2FromY, genericYFromB2 } from './generic-axis';
import type { MapAxis, MapModel } from './types';

/** B2* at the top of a map unless `yMax` says otherwise. */
export const DEFAULT_STRONGEST_B2 = -10;
/** Strongest attraction a generic map may show (mean-field liquids reach φ ≈ 0.68 there). */
export const STRONGEST_ALLOWED_B2 = -20;
/** Weakest top a map may have: just below the critical points (−1.65 mean field, −1.56 PY). */
export const WEAKEST_ALLOWED_TOP_B2 = -1.7;

/**
 * The y axis of a map: its label, unit, orientation and domain from the weakest attraction
 * (bottom: hard spheres, B2* = 1, U = 0, 1/τ = 0 or φ_p^R = 0) to the strongest (top: B2* = −10
 * unless `yMax` is given in the axis's own unit). Internal.
 *
 * @throws PhysicsArgumentError `options.yMax` outside the allowed attraction range.
 */
export function buildAxis(model: MapModel, yMax: number | undefined): MapAxis {
  if (model.kind === 'generic') {
    const weakest = genericYFromB2(model, 1);
    let strongest = genericYFromB2(model, DEFAULT_STRONGEST_B2);
    if (yMax !== undefined) {
      const lowest = genericYFromB2(model, WEAKEST_ALLOWED_TOP_B2);
      const highest = genericYFromB2(model, STRONGEST_ALLOWED_B2);
      requireInRange('options.yMax', yMax, Math.min(lowest, highest), Math.max(lowest, highest), { what: `the top of the y axis (B2* from ${STRONGEST_ALLOWED_B2} to ${WEAKEST_ALLOWED_TOP_B2})`, lowEnd: 'closed', highEnd: 'closed' });
      strongest = yMax;
    }
    const meta = {
      b2: { label: 'B2*', quantity: 'reduced second virial coefficient (more negative = more attractive)', unit: '' },
      inverseTau: { label: '1/τ', quantity: 'inverse Baxter stickiness', unit: '' },
      squareWellDepth: { label: 'U/kT', quantity: `square-well depth at range λ = ${model.lambda}`, unit: 'kT' },
    }[model.axis];
    return {
      ...meta,
      domain: [Math.min(weakest, strongest), Math.max(weakest, strongest)],
      inverted: strongest < weakest,
      weakest,
      strongest,
    };
  }
  let strongest: number;
  if (yMax !== undefined) {
    requireInRange('options.yMax', yMax, 0, 20, { what: 'the top of the y axis (a reservoir polymer fraction)', highEnd: 'closed' });
    strongest = yMax;
  } else {
    strongest = depletionPolymerForB2(model.q, DEFAULT_STRONGEST_B2);
  }
  return {
    label: 'φ_p^R',
    quantity: `reservoir polymer volume fraction (size ratio q = ${Number(model.q.toPrecision(3))})`,
    unit: '',
    domain: [0, strongest],
    inverted: false,
    weakest: 0,
    strongest,
  };
}

/**
 * Reservoir polymer fraction at which the Asakura–Oosawa B2* reaches `b2` (Brent, 1e-12).
 * Depletion only attracts, so B2* ≤ 1: a target at or above 1 (asked for by a strongly negative
 * attraction shift, e.g. −10 − (−15) = +5) needs no polymer and gives 0, the weakest level.
 * A target beyond a 600 kT contact attraction cannot be reached and is reported against `b2`.
 */
export function depletionPolymerForB2(q: number, b2: number): number {
  if (b2 >= 1) return 0;
  const contactLimit = 600 / (1 + 3 / (2 * q));
  const excess = (polymer: number) => asakuraOosawaReducedB2(q, polymer) - b2;
  let high = 0.1;
  while (excess(high) > 0 && high < contactLimit) high = Math.min(high * 2, contactLimit);
  const root = brentRoot(excess, 0, high, { absoluteTolerance: 1e-12 });
  if (root === null) throw new PhysicsArgumentError('b2', `a reduced second virial coefficient that depletion at q = ${q} reaches within 600 kT at contact`, b2);
  return root;
}

/** The generic axis conversions re-exported for the frame (keeps imports in one place). */
export { genericB2FromY, genericYFromB2 };
