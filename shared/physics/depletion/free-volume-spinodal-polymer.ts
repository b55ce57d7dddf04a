import { freeVolumeTerms } from './free-volume-fraction';

/**
 * Reservoir polymer fraction on the fluid–fluid spinodal of free-volume theory at φ:
 * dp̃/dφ = 0 gives φ_p^R,s(φ) = q³ (β∂P/∂ρ)_CS / (φ α″(φ)). Its minimum over φ is the critical
 * point. Internal, unchecked (α″ > 0 for the fluid range).
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992).
 */
export function freeVolumeSpinodalPolymer(phi: number, q: number): number {
  const phi2 = phi * phi;
  const hardSphereSlope = (1 + 4 * phi + 4 * phi2 - 4 * phi2 * phi + phi2 * phi2) / (1 - phi) ** 4;
  return (q * q * q * hardSphereSlope) / (phi * freeVolumeTerms(phi, q).curvature);
}
