import { requirePositive } from '../validation/require-positive';

/**
 * Van der Waals energy between two equal spheres of radius a at surface separation h (full
 * Hamaker form), in J, with r = 2a + h:
 * U = −(A_H/6)[2a²/(r² − 4a²) + 2a²/r² + ln((r² − 4a²)/r²)]; r² − 4a² is written h(4a + h) to
 * keep precision when h ≪ a (where U → −A_H a/(12h)).
 *
 * Source: H. C. Hamaker, Physica 4, 1058 (1937).
 *
 * @param separation surface separation h in m, > 0.
 * @param radius sphere radius a in m, > 0.
 * @param hamaker Hamaker constant A_H in J, > 0.
 * @throws PhysicsArgumentError for non-positive, NaN or infinite arguments.
 * @example hamakerSphereEnergy(1e-9, 100e-9, 1e-20) // -7.6263e-20 J (−A_H a/(12h) = −8.33e-20 is the h ≪ a limit)
 */
export function hamakerSphereEnergy(separation: number, radius: number, hamaker: number): number {
  requirePositive('separation', separation, 'a surface separation in m');
  requirePositive('radius', radius, 'a radius in m');
  requirePositive('hamaker', hamaker, 'a Hamaker constant in J');
  return hamakerEnergyUnchecked(separation, radius, hamaker);
}

/** The same without checks (internal, for quadrature). */
export function hamakerEnergyUnchecked(separation: number, radius: number, hamaker: number): number {
  const centre = 2 * radius + separation;
  const gap = separation * (4 * radius + separation);
  const a2 = radius * radius;
  return -(hamaker / 6) * ((2 * a2) / gap + (2 * a2) / (centre * centre) + Math.log(gap / (centre * centre)));
}
