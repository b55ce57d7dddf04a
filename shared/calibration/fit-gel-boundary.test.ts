import { describe, expect, it } from 'vitest';
import { buildStateMap } from '../physics';
import { seededRandom } from '../seeded-random';
import { fitGelBoundary } from './fit-gel-boundary';
import type { CalibrationPoint } from './types';

// Method: maximum likelihood logistic regression of the gel side on the B2* distance to the gel
// boundary (McCullagh & Nelder, Generalized Linear Models, 1989), with Firth's penalised
// likelihood under separation (Firth, Biometrika 80, 27 (1993)).
const map = buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });
// The onset is held fixed here (spinodal and binodal entered at B2* = −3 and −2), so the gel
// boundary at the default threshold −3 sits at B2* = −3 for every point.
const onset = { spinodalB2: -3, binodalB2: -2 };
const point = (id: number, reducedB2: number, outcome: 0 | 1): CalibrationPoint => ({ id, phi: 0.2, reducedB2, observedState: outcome ? 'gel' : 'fluid', outcome, map, onset, inBand: false });

describe('fitGelBoundary with samples far past the boundary', () => {
  it('keeps the fitted boundary in the gap between fluids near it and gels far beyond it (distances winsorised at ±20 B2*)', () => {
    const random = seededRandom(3);
    const points: CalibrationPoint[] = [];
    // Fluids between B2* = 1 and −2.5, gels far past the boundary, B2* −40 to −250: separated.
    for (let i = 0; i < 20; i++) points.push(point(i, 1 - 3.5 * random(), 0));
    for (let i = 0; i < 20; i++) points.push(point(100 + i, -40 - 210 * random(), 1));
    const fit = fitGelBoundary(points, { fitThreshold: false, threshold: -3 });
    expect(fit.method).toBe('firth');
    // Predicted gel side when B2* − s ≤ −3: the fluids (B2* ≥ −2.5) must stay off it and the
    // gels (B2* ≤ −40) on it, i.e. −37 ≤ s < 0.5 — a shift that keeps both groups as they were.
    expect(fit.attractionShift.value).toBeGreaterThan(-37);
    expect(fit.attractionShift.value).toBeLessThan(0.5);
  });
});
