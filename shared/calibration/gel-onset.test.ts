import { describe, expect, it } from 'vitest';
import { buildStateMap, classifyPoint, DEFAULT_STRONGEST_B2, meanFieldCriticalPoint, meanFieldSpinodal } from '../physics';
import { seededRandom } from '../seeded-random';
import { gelBoundaryB2 } from './gel-boundary-b2';
import { gelOnset } from './gel-onset';
import { gelSideCall } from './gel-side-call';
import { prepareCalibrationPoints } from './prepare-calibration-points';
import { strongestReducedB2 } from './strongest-reduced-b2';
import { thresholdDecides } from './threshold-decides';

const meanField = buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });

describe('gelOnset', () => {
  it('enters the spinodal where the mean-field spinodal says (physics.md §3: meanFieldSpinodal(−3) = 0.04442…, 0.28545…; derived)', () => {
    const spinodal = meanFieldSpinodal(-3)!;
    // The map interpolates tables on 200 levels between B2* = 1 and −10: a few 1e-3 in B2*.
    expect(gelOnset(meanField, spinodal.low).spinodalB2!).toBeCloseTo(-3, 2);
    expect(gelOnset(meanField, spinodal.high).spinodalB2!).toBeCloseTo(-3, 2);
  });

  it('meets both domes at the critical point (mean field: φ_c = 0.13044, B2*_c = −1.6503; derived)', () => {
    const critical = meanFieldCriticalPoint();
    const onset = gelOnset(meanField, critical.phi);
    expect(onset.spinodalB2!).toBeCloseTo(-1.6503, 2);
    expect(onset.binodalB2!).toBeCloseTo(-1.6503, 2);
  });

  it('searches up to the top of each map: B2* = −10 by default on every axis (shared/physics DEFAULT_STRONGEST_B2)', () => {
    for (const model of [
      { kind: 'generic', theory: 'meanField', axis: 'b2' },
      { kind: 'generic', theory: 'baxterPY', axis: 'inverseTau' },
      { kind: 'generic', theory: 'meanField', axis: 'squareWellDepth', lambda: 1.25 },
    ] as const) {
      expect(strongestReducedB2(buildStateMap(model))).toBeCloseTo(DEFAULT_STRONGEST_B2, 9);
    }
    const depletion = buildStateMap({ kind: 'depletion', q: 0.4 });
    expect(strongestReducedB2(depletion)).toBeLessThan(-1.5);
  });

  it('has the binodal before the spinodal, and no gel at or above the glass line', () => {
    for (const phi of [0.02, 0.08, 0.2, 0.35]) {
      const onset = gelOnset(meanField, phi);
      expect(onset.binodalB2!).toBeGreaterThanOrEqual(onset.spinodalB2 ?? -Infinity);
    }
    // Beyond the attractive-glass line (φ_g ≈ 0.40 once the attraction is strong) and above the
    // line's nose, the glass comes first: no gel onset.
    expect(gelOnset(meanField, 0.45)).toEqual({ spinodalB2: null, binodalB2: null });
    expect(gelOnset(meanField, 0.64)).toEqual({ spinodalB2: null, binodalB2: null });
  });
});

describe('gelSideCall', () => {
  it('makes the same call as classifyPoint with the same shift and threshold (derived from the rule of physics.md §5)', () => {
    const random = seededRandom(2024);
    const observations = Array.from({ length: 300 }, (_, i) => ({ id: i, phi: 0.01 + 0.56 * random(), reducedB2: -8 + 8.5 * random(), observedState: 'fluid' as const, map: meanField }));
    const { points } = prepareCalibrationPoints(observations);
    let checked = 0;
    let gels = 0;
    for (const point of points) {
      const shift = -1.5 + 3 * random();
      const threshold = -5 + 3.5 * random();
      const rule = classifyPoint(meanField, { phi: point.phi, attraction: { kind: 'b2', value: point.reducedB2 } }, { attractionShift: shift, gelB2Threshold: threshold }).state === 'gel';
      // Within the bisection tolerance of a boundary the two may differ; none of these points is that close.
      const boundary = gelBoundaryB2(point.onset, threshold)!;
      if (Math.abs(point.reducedB2 - shift - boundary) < 1e-5) continue;
      expect(gelSideCall(point, shift, threshold)).toBe(rule ? 1 : 0);
      checked++;
      if (rule) gels++;
    }
    expect(checked).toBeGreaterThan(200);
    expect(gels).toBeGreaterThan(30);
  });

  it('lets the threshold decide only between the spinodal and the binodal', () => {
    expect(thresholdDecides({ spinodalB2: -4, binodalB2: -1.8 }, -3)).toBe(true);
    expect(thresholdDecides({ spinodalB2: -2.5, binodalB2: -1.8 }, -3)).toBe(false);
    expect(thresholdDecides({ spinodalB2: null, binodalB2: -5 }, -6)).toBe(true);
    expect(gelBoundaryB2({ spinodalB2: -2.5, binodalB2: -1.8 }, -3)).toBe(-2.5);
    expect(gelBoundaryB2({ spinodalB2: -4, binodalB2: -1.8 }, -1)).toBe(-1.8);
    expect(gelBoundaryB2({ spinodalB2: null, binodalB2: null }, -3)).toBeNull();
  });
});
