/**
 * Radical inverse φ_b(i): the digits of i in base b mirrored about the radix point,
 * i = Σ d_k b^k  ↦  φ_b(i) = Σ d_k b^(−k−1), a number in [0, 1).
 * In base 2 it is the van der Corput sequence; one base per coordinate makes a Halton point.
 *
 * Source: J. G. van der Corput, Proc. Kon. Ned. Akad. Wetensch. 38, 813 (1935); J. H. Halton,
 * Numerische Mathematik 2, 84 (1960).
 *
 * @param index i, a whole number ≥ 0.
 * @param base b, a whole number ≥ 2 (a prime for Halton points).
 * @throws RangeError for a negative or fractional index or a base below 2.
 * @example radicalInverse(6, 2) // 0.375 (6 = 110₂ → 0.011₂)
 */
export function radicalInverse(index: number, base: number): number {
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`radicalInverse: index must be a whole number ≥ 0; got ${index}`);
  if (!Number.isInteger(base) || base < 2) throw new RangeError(`radicalInverse: base must be a whole number ≥ 2; got ${base}`);
  let remaining = index;
  let digitWeight = 1 / base;
  let value = 0;
  while (remaining > 0) {
    const digit = remaining % base;
    value += digit * digitWeight;
    remaining = (remaining - digit) / base;
    digitWeight /= base;
  }
  return value;
}
