import { describe, expect, it } from 'vitest';
import { buildStateMap, DEFAULT_CLASSIFIER_PARAMETERS } from '../physics';
import { CalibrationRefused } from './calibration-refused';
import { fitCalibration } from './fit-calibration';
import { syntheticObservations } from './test-support/synthetic-observations';
import type { CalibrationObservation } from './types';

// Method under test: maximum-likelihood logistic regression of "gel side observed" on the B2*
// distance to the rule's gel boundary (McCullagh & Nelder, *Generalized Linear Models*, 2nd ed.
// (1989), §4.4; Agresti, *Categorical Data Analysis*, 3rd ed. (2013), ch. 5), standard errors
// from the inverse information with the delta method for the shift β₀/β₁, a profile-likelihood
// interval for the gel threshold (Venzon & Moolgavkar, Applied Statistics 37, 87 (1988)), and
// stratified k-fold cross-validation (Hastie, Tibshirani & Friedman, *The Elements of
// Statistical Learning*, 2nd ed. (2009), §7.10).
// Expected values are the parameters the synthetic observations were generated with (derived:
// Monte-Carlo data from the classifier itself), checked against the uncertainty the fit reports.

const meanField = buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });

describe('fitCalibration', () => {
  it('recovers a known attraction shift from noisy synthetic observations, within its reported 95 % interval', () => {
    const observations = syntheticObservations({ map: meanField, count: 240, seed: 11, truth: { attractionShift: 0.8 }, noiseScale: 0.25 });
    const result = fitCalibration(observations, { parameters: ['attractionShift'], folds: 5 });
    const shift = result.fit.attractionShift;
    expect(shift.low!).toBeLessThan(0.8);
    expect(shift.high!).toBeGreaterThan(0.8);
    expect(shift.standardError).toBeGreaterThan(0.01);
    expect(shift.standardError).toBeLessThan(0.15);
    expect(result.parameters.gelB2Threshold).toBe(DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold);
    expect(Math.abs(result.parameters.attractionShift - shift.value)).toBeLessThanOrEqual(0.0005);
    expect(Math.round(result.parameters.attractionShift * 1000)).toBe(result.parameters.attractionShift * 1000);
    expect(result.fit.method).toBe('maximum-likelihood');
    // The generating slope is 1/noiseScale = 4 per unit B2*.
    expect(Math.abs(result.fit.sharpness.value - 4)).toBeLessThan(3 * result.fit.sharpness.standardError);
    expect(result.observations.used).toBe(240);
  });

  it('reports a standard error that matches the spread of repeated fits (Monte-Carlo check of the delta method)', () => {
    const estimates: number[] = [];
    const reported: number[] = [];
    for (let seed = 1; seed <= 24; seed++) {
      const observations = syntheticObservations({ map: meanField, count: 150, seed: 1000 + seed, truth: { attractionShift: -0.5 }, noiseScale: 0.3 });
      const fit = fitCalibration(observations, { parameters: ['attractionShift'], folds: 2 }).fit;
      estimates.push(fit.attractionShift.value);
      reported.push(fit.attractionShift.standardError);
    }
    const mean = estimates.reduce((s, v) => s + v, 0) / estimates.length;
    const spread = Math.sqrt(estimates.reduce((s, v) => s + (v - mean) ** 2, 0) / (estimates.length - 1));
    const typical = reported.reduce((s, v) => s + v, 0) / reported.length;
    expect(Math.abs(mean + 0.5)).toBeLessThan(3 * spread / Math.sqrt(estimates.length));
    // With 24 repetitions the sample spread is within about ±30 % of the true one.
    expect(spread / typical).toBeGreaterThan(0.65);
    expect(spread / typical).toBeLessThan(1.45);
  });

  it('recovers a shift and a gel threshold together, the threshold inside its profile-likelihood interval', () => {
    const observations = syntheticObservations({ map: meanField, count: 400, seed: 5, truth: { attractionShift: 0.8, gelB2Threshold: -2.6 }, noiseScale: 0.25 });
    const result = fitCalibration(observations, { parameters: ['attractionShift', 'gelB2Threshold'], folds: 5 });
    const { attractionShift, gelB2Threshold } = result.fit;
    expect(Math.abs(attractionShift.value - 0.8)).toBeLessThan(3 * attractionShift.standardError);
    expect(gelB2Threshold).not.toBeNull();
    expect(gelB2Threshold!.low!).toBeLessThan(-2.6);
    expect(gelB2Threshold!.high!).toBeGreaterThan(-2.6);
    expect(Math.abs(result.parameters.gelB2Threshold - gelB2Threshold!.value)).toBeLessThanOrEqual(0.0005);
    expect(result.fit.thresholdDecides).toBeGreaterThan(10);
  });

  it('pools observations from maps of different models through B2*', () => {
    const depletion = buildStateMap({ kind: 'depletion', q: 0.5 });
    const observations = [
      ...syntheticObservations({ map: meanField, count: 120, seed: 21, truth: { attractionShift: 0.6 }, noiseScale: 0.2 }),
      ...syntheticObservations({ map: depletion, count: 120, seed: 22, truth: { attractionShift: 0.6 }, noiseScale: 0.2, b2: [-6, -0.5], firstId: 500 }),
    ];
    const shift = fitCalibration(observations, { parameters: ['attractionShift'], folds: 5 }).fit.attractionShift;
    expect(Math.abs(shift.value - 0.6)).toBeLessThan(3 * shift.standardError);
  });

  it('generalises when the theory is off: cross-validated accuracy after the fit beats the theory', () => {
    const observations = syntheticObservations({ map: meanField, count: 200, seed: 31, truth: { attractionShift: 1.2 }, noiseScale: 0.2 });
    const result = fitCalibration(observations, { parameters: ['attractionShift'], folds: 5 });
    expect(result.crossValidation.folds).toBe(5);
    expect(result.crossValidation.perFold.reduce((s, f) => s + f.held, 0)).toBe(200);
    expect(result.crossValidation.after).toBeGreaterThan(result.crossValidation.before);
    expect(result.agreement.after.accuracy).toBeGreaterThan(result.agreement.before.accuracy);
    expect(result.verdict.kind).toBe('generalises');
    expect(result.verdict.text).toContain('more attractive than computed');
    // Every observation lands in exactly one cell of each table.
    for (const table of [result.agreement.before, result.agreement.after]) expect(table.counts.flat().reduce((s, n) => s + n, 0)).toBe(200);
  });

  it('leaves unclear observations out and counts collapsed gels on the gel side', () => {
    const base = syntheticObservations({ map: meanField, count: 60, seed: 41, truth: { attractionShift: 0.4 }, noiseScale: 0.3 });
    const marked: CalibrationObservation[] = base.map((o, i) => (i < 5 ? { ...o, observedState: 'unclear' } : o.observedState === 'gel' && i % 2 === 0 ? { ...o, observedState: 'collapsed' } : o));
    const gelSide = marked.filter((o) => o.observedState === 'gel' || o.observedState === 'collapsed').length;
    const result = fitCalibration(marked, { parameters: ['attractionShift'], folds: 5 });
    expect(result.observations.leftOut.unclear).toBe(5);
    expect(result.observations.used).toBe(55);
    expect(result.observations.gelSide).toBe(gelSide);
    expect(result.observations.usedIds).not.toContain(marked[0].id);
    const collapsedColumn = result.agreement.before.observed.indexOf('collapsed');
    expect(result.agreement.before.counts.reduce((s, row) => s + row[collapsedColumn], 0)).toBe(marked.filter((o) => o.observedState === 'collapsed').length);
  });

  it('refuses too few observations on either side and says how many are needed', () => {
    const few = syntheticObservations({ map: meanField, count: 200, seed: 51, truth: {}, noiseScale: 0.2 });
    const gels = few.filter((o) => o.observedState === 'gel').slice(0, 3);
    const others = few.filter((o) => o.observedState !== 'gel').slice(0, 11);
    let refusal: unknown;
    try {
      fitCalibration([...gels, ...others], { parameters: ['attractionShift'], folds: 5 });
    } catch (error) {
      refusal = error;
    }
    expect(refusal).toBeInstanceOf(CalibrationRefused);
    expect((refusal as CalibrationRefused).reason).toBe('too-few-observations');
    expect((refusal as CalibrationRefused).message).toBe('A fit needs at least 8 observations on each side of the gel boundary; this programme has 3 on the gel side (gel or collapsed) and 11 not gel.');
    expect((refusal as CalibrationRefused).counts).toMatchObject({ gelSide: 3, notGelSide: 11, neededPerSide: 8 });
  });

  it('refuses to fit the gel threshold without observations between the binodal and the spinodal', () => {
    // Far from the domes' band: deep inside the spinodal (B2* ≤ −7 at φ 0.1–0.3) or weakly attractive (B2* ≥ 0).
    const deep = syntheticObservations({ map: meanField, count: 20, seed: 61, truth: {}, noiseScale: 0.01, phi: [0.1, 0.3], b2: [-9, -7] });
    const weak = syntheticObservations({ map: meanField, count: 20, seed: 62, truth: {}, noiseScale: 0.01, phi: [0.1, 0.3], b2: [0, 0.8], firstId: 100 });
    expect(() => fitCalibration([...deep, ...weak], { parameters: ['attractionShift', 'gelB2Threshold'], folds: 5 })).toThrow(/needs at least 5 observations inside the binodal but outside the spinodal.*has 0/);
    // The shift alone is fitted from the same observations (perfectly separated: Firth's penalised likelihood).
    const shiftOnly = fitCalibration([...deep, ...weak], { parameters: ['attractionShift'], folds: 5 });
    expect(shiftOnly.fit.method).toBe('firth');
    expect(Number.isFinite(shiftOnly.fit.attractionShift.standardError)).toBe(true);
  });

  it('refuses observations that show gels at weaker attraction', () => {
    const observations = syntheticObservations({ map: meanField, count: 120, seed: 71, truth: { attractionShift: 0.5 }, noiseScale: 0.3 });
    const flipped = observations.map((o) => ({ ...o, observedState: o.observedState === 'gel' ? ('fluid' as const) : ('gel' as const) }));
    expect(() => fitCalibration(flipped, { parameters: ['attractionShift'], folds: 5 })).toThrow(/do not show gels becoming more likely at stronger attraction/);
  });
});
