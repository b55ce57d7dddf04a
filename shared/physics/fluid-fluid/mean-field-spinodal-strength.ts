/**
 * Mean-field strength on the spinodal at φ: dp̃/dφ = 0 for p̃ = φZ_CS − Aφ² gives
 * A_s(φ) = (β∂P/∂ρ)_CS / (2φ) = (1 + 4φ + 4φ² − 4φ³ + φ⁴) / (2φ(1 − φ)⁴), i.e.
 * B2*_s(φ) = 1 − A_s(φ)/4. Its minimum over φ is the critical point. Internal, unchecked.
 *
 * @example meanFieldSpinodalStrength(0.13044388) // 10.60122705... (B2* = −1.6503)
 */
export function meanFieldSpinodalStrength(phi: number): number {
  const phi2 = phi * phi;
  return (1 + 4 * phi + 4 * phi2 - 4 * phi2 * phi + phi2 * phi2) / (2 * phi * (1 - phi) ** 4);
}

/** d A_s/dφ, used to find the critical point (where it vanishes). Internal. */
export function meanFieldSpinodalStrengthSlope(phi: number): number {
  const phi2 = phi * phi;
  const numerator = 1 + 4 * phi + 4 * phi2 - 4 * phi2 * phi + phi2 * phi2;
  const numeratorSlope = 4 + 8 * phi - 12 * phi2 + 4 * phi2 * phi;
  const denominator = 2 * phi * (1 - phi) ** 4;
  const denominatorSlope = 2 * (1 - phi) ** 4 - 8 * phi * (1 - phi) ** 3;
  return (numeratorSlope * denominator - numerator * denominatorSlope) / (denominator * denominator);
}
