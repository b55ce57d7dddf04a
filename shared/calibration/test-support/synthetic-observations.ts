import { classifyPoint, type ClassifierParameters, type StateMap } from '../../physics';
import { seededRandom } from '../../seeded-random';
import type { CalibrationObservation } from '../types';

/**
 * Invented bench observations for the calibration tests: compositions spread over a box of
 * (φ, B2*), each "observed" in the state the classifier gives with the true parameters at
 * B2* + ε, where ε is logistic noise of the given scale — so that P(gel side) follows exactly
 * the logistic model the calibration fits, with slope 1/scale. Test support, not product code.
 */
export function syntheticObservations(input: {
  map: StateMap;
  count: number;
  seed: number;
  truth: Partial<ClassifierParameters>;
  noiseScale: number;
  phi?: [number, number];
  b2?: [number, number];
  firstId?: number;
}): CalibrationObservation[] {
  const random = seededRandom(input.seed);
  // Below the attractive-glass line (φ_g ≈ 0.40 at strong attraction), where gels can form.
  const [phiLow, phiHigh] = input.phi ?? [0.03, 0.38];
  const [b2Low, b2High] = input.b2 ?? [-6, 0];
  return Array.from({ length: input.count }, (_, i) => {
    const phi = phiLow + (phiHigh - phiLow) * random();
    const reducedB2 = b2Low + (b2High - b2Low) * random();
    const u = Math.min(Math.max(random(), 1e-12), 1 - 1e-12);
    const noise = input.noiseScale * Math.log(u / (1 - u));
    const observedState = classifyPoint(input.map, { phi, attraction: { kind: 'b2', value: reducedB2 + noise } }, input.truth).state;
    return { id: (input.firstId ?? 1) + i, phi, reducedB2, observedState, map: input.map };
  });
}
