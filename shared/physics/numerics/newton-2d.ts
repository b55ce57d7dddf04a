/** Residual and Jacobian of a two-equation system at (x, y). */
export interface System2d {
  (x: number, y: number): { f: [number, number]; jacobian: [[number, number], [number, number]] };
}

export interface Newton2dOptions {
  /** Converged when max |f_i| ≤ residualTolerance (default 1e-13). */
  residualTolerance?: number;
  maxIterations?: number;
  /** Keeps the iterate inside the physical domain; a step that leaves it is halved. */
  inDomain?: (x: number, y: number) => boolean;
}

/**
 * Newton–Raphson for two equations in two unknowns with an analytic Jacobian and step halving
 * (a damped Newton method; e.g. Press et al., *Numerical Recipes*, 3rd ed., §9.6–9.7).
 * Used to polish coexistence points found by bracketing, so equal pressure and equal chemical
 * potential hold to ~1e-13.
 *
 * @returns the converged point, or `null` if the Jacobian is singular, a step cannot be kept in
 *   the domain, or it does not converge within maxIterations (default 30).
 * @example
 * newton2d((x, y) => ({ f: [x * x - 2, y - x], jacobian: [[2 * x, 0], [-1, 1]] }), 1, 1)
 * // [1.4142135623730951, 1.4142135623730951]
 */
export function newton2d(system: System2d, x0: number, y0: number, options: Newton2dOptions = {}): [number, number] | null {
  const tolerance = options.residualTolerance ?? 1e-13;
  const maxIterations = options.maxIterations ?? 30;
  const inDomain = options.inDomain ?? (() => true);
  let x = x0;
  let y = y0;
  let current = system(x, y);
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    const [f1, f2] = current.f;
    if (!Number.isFinite(f1) || !Number.isFinite(f2)) return null;
    const size = Math.max(Math.abs(f1), Math.abs(f2));
    if (size <= tolerance) return [x, y];
    const [[a, b], [c, d]] = current.jacobian;
    const determinant = a * d - b * c;
    if (!Number.isFinite(determinant) || determinant === 0) return null;
    let dx = (-f1 * d + f2 * b) / determinant;
    let dy = (-a * f2 + c * f1) / determinant;
    let accepted = false;
    for (let halving = 0; halving < 40; halving++) {
      const nx = x + dx;
      const ny = y + dy;
      if (inDomain(nx, ny)) {
        const next = system(nx, ny);
        const nextSize = Math.max(Math.abs(next.f[0]), Math.abs(next.f[1]));
        if (Number.isFinite(nextSize) && (nextSize < size || halving > 8)) {
          x = nx; y = ny; current = next; accepted = true;
          break;
        }
      }
      dx *= 0.5; dy *= 0.5;
    }
    if (!accepted) return null;
  }
  const [f1, f2] = current.f;
  return Math.max(Math.abs(f1), Math.abs(f2)) <= tolerance * 100 ? [x, y] : null;
}
