import type { AttractionSource } from '@shared/states';

/** How each programme makes its particles stick, in words for the form and the page. */
export const ATTRACTION_SOURCE_LABELS: Record<AttractionSource, string> = {
  depletion: 'Depletion by a non-adsorbing polymer',
  salt: 'Salt screening the surface charge',
  direct: 'Attraction given directly (U/kT and range)',
};
