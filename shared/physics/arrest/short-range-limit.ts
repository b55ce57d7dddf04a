/**
 * Longest attraction range placed by adhesive-sphere mode-coupling theory through B2*: the
 * depletion size ratio q = R_g/a, or a square well's width λ − 1 (in diameters). The extended law
 * of corresponding states holds for short ranges (Noro & Frenkel, J. Chem. Phys. 113, 2941
 * (2000): a few percent of σ; common practice stretches it to about a quarter), and the re-entrant
 * and attractive glasses are short-range effects (Dawson et al., Phys. Rev. E 63, 011401 (2000)).
 * Longer ranges keep the hard-sphere glass line and are placed by their own fluid–fluid theory.
 */
export const SHORT_RANGE_LIMIT = 0.25;
