import { describe, expect, it } from 'vitest';
import { seededRandom } from '../seeded-random';
import { CoxFitRefused } from './cox-fit-refused';
import { coxProportionalHazards, type CoxCovariate, type CoxRecord } from './cox-proportional-hazards';
import { hazardReading } from './hazard-reading';

// Leukaemia remission trial (Freireich et al., Blood 21, 699 (1963)), weeks; * = censored.
// 6-MP arm and placebo arm as tabulated in Kleinbaum & Klein, *Survival Analysis: A Self-Learning
// Text*, and Klein & Moeschberger, *Survival Analysis*, 2nd ed. (2003).
const SIX_MP = '6,6,6,6*,7,9*,10,10*,11*,13,16,17*,19*,20*,22,23,25*,32*,32*,34*,35*';
const PLACEBO = '1,1,2,2,3,4,4,5,5,8,8,8,8,11,11,12,12,15,17,22,23';
function arm(spec: string, placebo: number): CoxRecord[] {
  return spec.split(',').map((item) => ({ timeDays: Number(item.replace('*', '')), collapsed: !item.endsWith('*'), values: { placebo } }));
}
const REMISSIONS = [...arm(SIX_MP, 0), ...arm(PLACEBO, 1)];

/** Invented shelf-life programme for the comparisons: three covariates, whole-day times (ties). */
function inventedProgramme(seed: number, n: number): CoxRecord[] {
  const random = seededRandom(seed);
  return Array.from({ length: n }, () => {
    const attractionKt = 2 + 6 * random();
    const heightMm = 10 + 40 * random();
    const phi = 0.05 + 0.25 * random();
    const hazard = 0.05 * Math.exp(-0.45 * attractionKt + 0.04 * heightMm + 4 * phi);
    const collapseDay = -Math.log(1 - random()) / hazard;
    const lastCheck = 5 + 60 * random();
    const collapsed = collapseDay <= lastCheck;
    return { timeDays: Math.ceil(collapsed ? collapseDay : lastCheck), collapsed, values: { attractionKt, heightMm, phi } };
  });
}
const COVARIATES: CoxCovariate[] = [
  { key: 'attractionKt', label: 'attraction', unit: 'kT' },
  { key: 'heightMm', label: 'sample height', unit: 'mm', step: 10 },
  { key: 'phi', label: 'φ', unit: '', step: 0.01 },
];

/** Reference: the Breslow partial log-likelihood written out naively, O(n²), on the original scale. */
function naiveLogLikelihood(records: CoxRecord[], keys: string[], beta: number[]): number {
  const eta = records.map((r) => keys.reduce((s, k, j) => s + r.values[k] * beta[j], 0));
  let total = 0;
  records.forEach((i, index) => {
    if (!i.collapsed) return;
    let riskSum = 0;
    records.forEach((j, other) => {
      if (j.timeDays >= i.timeDays) riskSum += Math.exp(eta[other]);
    });
    total += eta[index] - Math.log(riskSum);
  });
  return total;
}

/** Reference maximiser: coordinate-wise golden-section search, sweeping until nothing moves. */
function goldenSectionMaximum(f: (beta: number[]) => number, start: number[], initialWidths: number[]): number[] {
  const beta = [...start];
  // Each sweep searches ±width around the current value; the width follows the last move, so the
  // bracket keeps holding the maximum while the search closes in on it.
  const widths = [...initialWidths];
  const ratio = (Math.sqrt(5) - 1) / 2;
  for (let sweep = 0; sweep < 500; sweep++) {
    let moved = 0;
    for (let j = 0; j < beta.length; j++) {
      const at = (value: number) => f(beta.map((b, k) => (k === j ? value : b)));
      let [a, b] = [beta[j] - widths[j], beta[j] + widths[j]];
      let c = b - ratio * (b - a);
      let d = a + ratio * (b - a);
      let [fc, fd] = [at(c), at(d)];
      while (b - a > 1e-11 * initialWidths[j]) {
        if (fc > fd) {
          b = d;
          d = c;
          fd = fc;
          c = b - ratio * (b - a);
          fc = at(c);
        } else {
          a = c;
          c = d;
          fc = fd;
          d = a + ratio * (b - a);
          fd = at(d);
        }
      }
      const best = (a + b) / 2;
      const move = Math.abs(best - beta[j]);
      moved = Math.max(moved, move / initialWidths[j]);
      beta[j] = best;
      widths[j] = Math.max(4 * move, 1e-7 * initialWidths[j]);
    }
    if (moved < 1e-10) break;
  }
  return beta;
}

describe('coxProportionalHazards', () => {
  it('reproduces the remission trial fit, placebo vs 6-MP, Breslow ties: β = 1.509, SE 0.410, HR 4.523 (2.027–10.094) (published, from memory: Kleinbaum & Klein)', () => {
    const fit = coxProportionalHazards(REMISSIONS, [{ key: 'placebo', label: 'placebo', unit: '' }]);
    const [term] = fit.terms;
    expect(term.coefficient).toBeCloseTo(1.509, 3);
    expect(term.standardError).toBeCloseTo(0.41, 3);
    expect(term.hazardRatio).toBeCloseTo(4.523, 3);
    expect(term.hazardRatioLow).toBeCloseTo(2.027, 3);
    expect(term.hazardRatioHigh).toBeCloseTo(10.094, 3);
    expect(fit.eventCount).toBe(30);
  });

  it('agrees to 1e-4 with a coordinate-wise golden-section maximisation of a naive partial likelihood (derived: independent implementation)', () => {
    const records = inventedProgramme(2024, 90);
    const fit = coxProportionalHazards(records, COVARIATES);
    const keys = COVARIATES.map((c) => c.key);
    const reference = goldenSectionMaximum((beta) => naiveLogLikelihood(records, keys, beta), [0, 0, 0], [3, 0.5, 30]);
    fit.terms.forEach((term, j) => expect(Math.abs(term.coefficient - reference[j])).toBeLessThan(1e-4));
    expect(fit.logPartialLikelihood).toBeCloseTo(naiveLogLikelihood(records, keys, reference), 8);
    expect(fit.nullLogPartialLikelihood).toBeCloseTo(naiveLogLikelihood(records, keys, [0, 0, 0]), 8);
  }, 30_000);

  it('gives standard errors from the inverse of a finite-difference Hessian of the naive likelihood to 0.1 % (derived: independent implementation)', () => {
    const records = inventedProgramme(7, 120);
    const fit = coxProportionalHazards(records, COVARIATES);
    const keys = COVARIATES.map((c) => c.key);
    const beta = fit.terms.map((t) => t.coefficient);
    // Steps of about 1e-3 of each coefficient's standard error: small against the curvature's change, large against rounding.
    const h = [5e-4, 1e-4, 1e-2];
    const f = (shift: number[]) => naiveLogLikelihood(records, keys, beta.map((b, k) => b + shift[k]));
    const hessian = keys.map((_, a) =>
      keys.map((_, b) => {
        const e = (i: number, s: number) => keys.map((__, k) => (k === i ? s * h[i] : 0));
        const add = (x: number[], y: number[]) => x.map((v, k) => v + y[k]);
        return (f(add(e(a, 1), e(b, 1))) - f(add(e(a, 1), e(b, -1))) - f(add(e(a, -1), e(b, 1))) + f(add(e(a, -1), e(b, -1)))) / (4 * h[a] * h[b]);
      }),
    );
    const covariance = invert(hessian.map((row) => row.map((v) => -v)));
    fit.terms.forEach((term, j) => expect(term.standardError / Math.sqrt(covariance[j][j])).toBeCloseTo(1, 3));
  });

  it('reports on the covariates own scale: rescaling a covariate rescales its coefficient and leaves the hazard ratio per step alone', () => {
    const records = inventedProgramme(11, 80);
    const inCm = records.map((r) => ({ ...r, values: { ...r.values, heightMm: r.values.heightMm / 10 } }));
    const a = coxProportionalHazards(records, COVARIATES);
    const b = coxProportionalHazards(inCm, [COVARIATES[0], { key: 'heightMm', label: 'sample height', unit: 'cm', step: 1 }, COVARIATES[2]]);
    expect(b.terms[1].coefficient).toBeCloseTo(a.terms[1].coefficient * 10, 8);
    expect(b.terms[1].hazardRatio).toBeCloseTo(a.terms[1].hazardRatio, 8);
    expect(a.terms[1].hazardRatio).toBeCloseTo(Math.exp(10 * a.terms[1].coefficient), 12);
  });

  it('reads each covariate in plain words', () => {
    const fit = coxProportionalHazards(inventedProgramme(2024, 90), COVARIATES);
    expect(fit.terms[0].reading).toMatch(/^each \+1 kT of attraction multiplies the collapse hazard by \d\.\d\d \(\d\.\d\d–\d\.\d\d\)/);
    expect(fit.terms[2].reading).toMatch(/^each \+0\.01 of φ multiplies the collapse hazard by /);
    expect(hazardReading({ label: 'attraction', unit: 'kT', step: 1 }, 0.62, 0.48, 0.8)).toBe('each +1 kT of attraction multiplies the collapse hazard by 0.62 (0.48–0.80)');
    expect(hazardReading({ label: 'φ', unit: '', step: 0.01 }, 1.1, 0.9, 1.3)).toBe('each +0.01 of φ multiplies the collapse hazard by 1.10 (0.90–1.30); the data cannot tell this from no effect');
  });

  it('refuses with fewer than 10 collapses, saying how many there are and how many are needed', () => {
    const records = [...arm('1,2,3,4,5,6,7,8,9', 1), ...arm('3*,4*,9*,10*', 0)];
    const attempt = () => coxProportionalHazards(records, [{ key: 'placebo', label: 'placebo', unit: '' }]);
    expect(attempt).toThrow(CoxFitRefused);
    expect(attempt).toThrow('Cannot fit what drives collapse: 9 collapses seen; at least 10 are needed.');
    try {
      attempt();
    } catch (error) {
      expect((error as CoxFitRefused).reason).toBe('too-few-events');
      expect((error as CoxFitRefused).counts).toEqual({ events: 9, needed: 10 });
    }
  });

  it('refuses a covariate with no variation, naming it', () => {
    const records = inventedProgramme(3, 60).map((r) => ({ ...r, values: { ...r.values, heightMm: 25 } }));
    expect(() => coxProportionalHazards(records, COVARIATES)).toThrow(/sample height is 25 in every sample/);
    try {
      coxProportionalHazards(records, COVARIATES);
    } catch (error) {
      expect(error).toBeInstanceOf(CoxFitRefused);
      expect((error as CoxFitRefused).reason).toBe('no-variation');
      expect((error as CoxFitRefused).covariate).toBe('heightMm');
    }
  });

  it('refuses when a covariate separates the collapses (the partial likelihood has no maximum)', () => {
    // Every placebo sample collapses before any 6-MP sample is seen at all.
    const records = [...arm('1,2,3,4,5,6,7,8,9,10,11', 1), ...arm('12,13,14*,15', 0)];
    expect(() => coxProportionalHazards(records, [{ key: 'placebo', label: 'placebo', unit: '' }])).toThrow(/placebo separates the samples/);
  });

  it('refuses bad input with a RangeError naming the record and key', () => {
    expect(() => coxProportionalHazards(REMISSIONS, [])).toThrow(/at least one covariate/);
    expect(() => coxProportionalHazards([{ timeDays: 1, collapsed: true, values: {} }], [{ key: 'phi', label: 'φ', unit: '' }])).toThrow(/record 0 has phi = undefined/);
    expect(() => coxProportionalHazards(REMISSIONS, [{ key: 'placebo', label: 'p', unit: '' }, { key: 'placebo', label: 'p', unit: '' }])).toThrow(/listed twice/);
  });
});

function invert(matrix: number[][]): number[][] {
  const n = matrix.length;
  const a = matrix.map((row, i) => [...row, ...row.map((_, j) => (i === j ? 1 : 0))]);
  for (let col = 0; col < n; col++) {
    const pivot = a.reduce((best, row, r) => (r >= col && Math.abs(row[col]) > Math.abs(a[best][col]) ? r : best), col);
    [a[col], a[pivot]] = [a[pivot], a[col]];
    const scale = a[col][col];
    a[col] = a[col].map((v) => v / scale);
    for (let r = 0; r < n; r++) if (r !== col) a[r] = a[r].map((v, k) => v - a[r][col] * a[col][k]);
  }
  return a.map((row) => row.slice(n));
}
