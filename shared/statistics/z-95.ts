/**
 * z for a two-sided 95 % interval: the 0.975 quantile of the standard normal distribution,
 * Φ⁻¹(0.975) = 1.959963984540054 (published tables give 1.95996: Abramowitz & Stegun, *Handbook
 * of Mathematical Functions* (1964), ch. 26; freely readable as the NIST Digital Library of
 * Mathematical Functions §7.17 via Φ⁻¹(p) = √2·erf⁻¹(2p − 1)).
 *
 * The one definition every 95 % interval in Gelwright uses. Written out rather than computed
 * with simple-statistics' `probit`, whose approximation of the inverse error function gives
 * 1.95716 at 0.975 (off in the third decimal).
 * @example Z_95 // 1.959963984540054
 */
export const Z_95 = 1.959963984540054;
