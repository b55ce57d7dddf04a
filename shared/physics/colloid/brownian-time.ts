import { requirePositive } from '../validation/require-positive';

/**
 * Brownian time τ_B = a²/D, in s: the time a particle takes to diffuse its own radius (the
 * natural clock for ageing and for the gravitational Péclet number).
 *
 * Source: e.g. Russel, Saville & Schowalter, *Colloidal Dispersions* (Cambridge, 1989), ch. 2.
 *
 * @param radius particle radius a in m, > 0.
 * @param diffusion diffusion coefficient D in m²/s, > 0.
 * @throws PhysicsArgumentError for non-positive, NaN or infinite arguments.
 * @example brownianTime(100e-9, 2.45368e-12) // 0.0040755 s
 */
export function brownianTime(radius: number, diffusion: number): number {
  requirePositive('radius', radius, 'a radius in m');
  requirePositive('diffusion', diffusion, 'a diffusion coefficient in m²/s');
  return (radius * radius) / diffusion;
}
