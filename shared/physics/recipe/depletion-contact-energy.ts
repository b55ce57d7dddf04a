/** Where the polymer's concentration is counted: per litre of sample or per litre of solvent. */
export type ConcentrationBasis = 'sample' | 'solvent';

/**
 * Natural logarithm of the Asakura–Oosawa contact attraction (in kT, as a positive depth) of a
 * recipe at particle fraction φ, computed in logs so that it stays finite where the free volume
 * α(φ) underflows:
 * ln U = ln(c_s/c*) − ln α(φ) + ln(1 + 3/(2q)), with ln α = ln(1 − φ) − (Ay + By² + Cy³),
 * y = φ/(1 − φ), A = 3q + 3q² + q³, B = 9q²/2 + 3q³, C = 3q³ (scaled-particle theory), and
 * c_s = c·(1 − φ) for a per-solvent concentration, c for a per-sample one.
 * Returns −Infinity for no polymer.
 *
 * Sources: free volume, Lekkerkerker et al., Europhys. Lett. 20, 559 (1992); contact value
 * φ_p^R(1 + 3/(2q)), Asakura & Oosawa, J. Chem. Phys. 22, 1255 (1954). Internal, unchecked
 * (0 < φ < 1, q > 0, c ≥ 0, c* > 0).
 *
 * @example Math.exp(logDepletionContactEnergy(0.3, 0.1, 3, 24, 'sample')) // 3.3225… = (3/24)/α(0.3, 0.1)·16
 */
export function logDepletionContactEnergy(phi: number, q: number, concentrationGL: number, overlapGL: number, basis: ConcentrationBasis): number {
  if (concentrationGL === 0) return -Infinity;
  const logFreeVolume = logFreeVolumeFraction(phi, q);
  const logSamplePolymer = Math.log(concentrationGL / overlapGL) + (basis === 'solvent' ? Math.log1p(-phi) : 0);
  return logSamplePolymer - logFreeVolume + Math.log1p(3 / (2 * q));
}

/**
 * ln α(φ) of scaled-particle theory, ln α = ln(1 − φ) − (Ay + By² + Cy³) with y = φ/(1 − φ),
 * A = 3q + 3q² + q³, B = 9q²/2 + 3q³, C = 3q³: finite where α itself underflows.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992). Internal, unchecked.
 *
 * @example logFreeVolumeFraction(0.3, 0.1) // −0.50758… = ln 0.6019478
 */
export function logFreeVolumeFraction(phi: number, q: number): number {
  const y = phi / (1 - phi);
  const q2 = q * q;
  const q3 = q2 * q;
  return Math.log1p(-phi) - ((3 * q + 3 * q2 + q3) * y + (4.5 * q2 + 3 * q3) * y * y + 3 * q3 * y * y * y);
}
