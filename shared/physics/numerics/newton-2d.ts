/**
 * Residual and Jacobian of a two-equation system at (x, y), written into `out` as
 * [f₁, f₂, ∂f₁/∂x, ∂f₁/∂y, ∂f₂/∂x, ∂f₂/∂y] (no allocation per evaluation).
 */
export type System2d = (x: number, y: number, out: Float64Array) => void;

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
 * newton2d((x, y, out) => out.set([x * x - 2, y - x, 2 * x, 0, -1, 1]), 1, 1)
 * // [1.4142135623730951, 1.4142135623730951]
 */
export function newton2d(system: System2d, x0: number, y0: number, options: Newton2dOptions = {}): [number, number] | null {
  const tolerance = options.residualTolerance ?? 1e-13;
  const maxIterations = options.maxIterations ?? 30;
  const inDomain = options.inDomain;
  const current = new Float64Array(6);
  const next = new Float64Array(6);
  let x = x0;
  let y = y0;
  system(x, y, current);
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    const f1 = current[0];
    const f2 = current[1];
    if (!Number.isFinite(f1) || !Number.isFinite(f2)) return null;
    const size = Math.max(Math.abs(f1), Math.abs(f2));
    if (size <= tolerance) return [x, y];
    const a = current[2];
    const b = current[3];
    const c = current[4];
    const d = current[5];
    const determinant = a * d - b * c;
    if (!Number.isFinite(determinant) || determinant === 0) return null;
    let dx = (-f1 * d + f2 * b) / determinant;
    let dy = (-a * f2 + c * f1) / determinant;
    let accepted = false;
    for (let halving = 0; halving < 40; halving++) {
      const nx = x + dx;
      const ny = y + dy;
      if (!inDomain || inDomain(nx, ny)) {
        system(nx, ny, next);
        const nextSize = Math.max(Math.abs(next[0]), Math.abs(next[1]));
        if (Number.isFinite(nextSize) && (nextSize < size || halving > 8)) {
          x = nx;
          y = ny;
          current.set(next);
          accepted = true;
          break;
        }
      }
      dx *= 0.5;
      dy *= 0.5;
    }
    if (!accepted) return null;
  }
  return Math.max(Math.abs(current[0]), Math.abs(current[1])) <= tolerance * 100 ? [x, y] : null;
}
