/**
 * A composition as a bench would weigh it: φ to 0.001 and the dose to three significant figures
 * (common practice for a laboratory balance and volumetric flask; no source). Arithmetic, not
 * toPrecision: this runs for every sampled composition.
 * @example roundComposition(0.213847, 8.46213) // [0.214, 8.46]
 */
export function roundComposition(phi: number, dose: number): [number, number] {
  if (dose === 0 || !Number.isFinite(dose)) return [Math.round(phi * 1000) / 1000, dose];
  const exponent = 2 - Math.floor(Math.log10(Math.abs(dose)));
  // Divide by a whole power of ten either way, so 8.46 and 1230 come out exact.
  const rounded = exponent >= 0 ? Math.round(dose * 10 ** exponent) / 10 ** exponent : Math.round(dose / 10 ** -exponent) * 10 ** -exponent;
  return [Math.round(phi * 1000) / 1000, rounded];
}
