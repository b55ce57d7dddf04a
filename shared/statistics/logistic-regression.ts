/**
 * Logistic regression by maximum likelihood, fitted with iteratively reweighted least
 * squares (Newton–Raphson on the log-likelihood).
 *
 * Model: P(y = 1 | x) = 1 / (1 + exp(−(β₀ + β₁x₁ + … + βₖxₖ))).
 * Each step solves (XᵀWX) Δ = Xᵀ(y − p) with W = diag(p(1 − p)); standard errors are the
 * square roots of the diagonal of (XᵀWX)⁻¹ at the optimum (the inverse Fisher information).
 * Source: McCullagh & Nelder, *Generalized Linear Models*, 2nd ed. (1989), §4.4; Agresti,
 * *Categorical Data Analysis*, 3rd ed. (2013), §5.5 and §4.6.1.
 *
 * @param rows feature vectors (without the intercept column; it is added)
 * @param outcomes 0 or 1 per row
 * @throws Error when the data are empty, ragged, not 0/1, or perfectly separated (the
 *   maximum-likelihood estimate does not exist: coefficients run off to infinity)
 * @example logisticRegression([[53], [57], …], [1, 1, …]) // Challenger data → β ≈ [15.0429, −0.2322]
 */
export interface LogisticFit {
  coefficients: number[];
  standardErrors: number[];
  covariance: number[][];
  logLikelihood: number;
  iterations: number;
}

export function logisticRegression(rows: number[][], outcomes: number[], options: { maxIterations?: number; tolerance?: number } = {}): LogisticFit {
  const n = rows.length;
  if (n === 0) throw new Error('logisticRegression: no data');
  if (outcomes.length !== n) throw new Error('logisticRegression: rows and outcomes differ in length');
  if (!outcomes.every((y) => y === 0 || y === 1)) throw new Error('logisticRegression: outcomes must be 0 or 1');
  const k = rows[0].length + 1;
  if (!rows.every((r) => r.length === k - 1 && r.every(Number.isFinite))) throw new Error('logisticRegression: every row needs the same number of finite features');
  const design = rows.map((r) => [1, ...r]);
  const maxIterations = options.maxIterations ?? 100;
  const tolerance = options.tolerance ?? 1e-10;
  let beta = new Array(k).fill(0);
  let previous = -Infinity;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const { information, score, logLikelihood } = likelihoodTerms(design, outcomes, beta);
    let step: number[];
    try {
      step = solveSymmetric(information, score);
    } catch (error) {
      // At β = 0 every weight is 1/4, so a singular matrix there means a constant feature;
      // later it means the weights collapsed because the fit is running off to infinity.
      if (iteration > 1) throw new Error('logisticRegression: the two outcomes are perfectly separated; the fit does not exist');
      throw error;
    }
    beta = beta.map((b, i) => b + step[i]);
    const largest = Math.max(...beta.map(Math.abs));
    if (largest > 1e6) throw new Error('logisticRegression: the two outcomes are perfectly separated; the fit does not exist');
    if (Math.abs(logLikelihood - previous) < tolerance * (1 + Math.abs(logLikelihood)) && Math.max(...step.map(Math.abs)) < 1e-8 * (1 + largest)) {
      return finish(design, outcomes, beta, iteration);
    }
    previous = logLikelihood;
  }
  throw new Error(`logisticRegression: no convergence in ${maxIterations} iterations (the outcomes may be separated)`);
}

function finish(design: number[][], outcomes: number[], beta: number[], iterations: number): LogisticFit {
  const { information, logLikelihood } = likelihoodTerms(design, outcomes, beta);
  const covariance = invertSymmetric(information);
  return { coefficients: beta, standardErrors: covariance.map((row, i) => Math.sqrt(row[i])), covariance, logLikelihood, iterations };
}

/** Log-likelihood, its gradient Xᵀ(y − p) and the information matrix XᵀWX. */
function likelihoodTerms(design: number[][], outcomes: number[], beta: number[]) {
  const k = beta.length;
  const information = Array.from({ length: k }, () => new Array(k).fill(0));
  const score = new Array(k).fill(0);
  let logLikelihood = 0;
  design.forEach((x, row) => {
    const eta = x.reduce((sum, xi, i) => sum + xi * beta[i], 0);
    const p = 1 / (1 + Math.exp(-eta));
    const weight = Math.max(p * (1 - p), 1e-300);
    // log(1 + e^η) computed without overflow.
    logLikelihood += outcomes[row] * eta - (eta > 0 ? eta + Math.log1p(Math.exp(-eta)) : Math.log1p(Math.exp(eta)));
    for (let i = 0; i < k; i++) {
      score[i] += x[i] * (outcomes[row] - p);
      for (let j = 0; j < k; j++) information[i][j] += weight * x[i] * x[j];
    }
  });
  return { information, score, logLikelihood };
}

/** Solves A z = b for a symmetric positive-definite A by Cholesky factorisation. */
export function solveSymmetric(a: number[][], b: number[]): number[] {
  const n = a.length;
  const l = cholesky(a);
  const y = new Array(n).fill(0);
  for (let i = 0; i < n; i++) y[i] = (b[i] - l[i].slice(0, i).reduce((s, lij, j) => s + lij * y[j], 0)) / l[i][i];
  const z = new Array(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let s = y[i];
    for (let j = i + 1; j < n; j++) s -= l[j][i] * z[j];
    z[i] = s / l[i][i];
  }
  return z;
}

export function invertSymmetric(a: number[][]): number[][] {
  const n = a.length;
  const columns = Array.from({ length: n }, (_, j) => solveSymmetric(a, Array.from({ length: n }, (_, i) => (i === j ? 1 : 0))));
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => columns[j][i]));
}

function cholesky(a: number[][]): number[][] {
  const n = a.length;
  const l = Array.from({ length: n }, () => new Array(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = a[i][j];
      for (let m = 0; m < j; m++) sum -= l[i][m] * l[j][m];
      if (i === j) {
        if (!(sum > 0)) throw new Error('logisticRegression: the information matrix is singular (a feature does not vary)');
        l[i][i] = Math.sqrt(sum);
      } else {
        l[i][j] = sum / l[j][j];
      }
    }
  }
  return l;
}
