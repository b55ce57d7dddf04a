/** Why a proportional-hazards fit was refused. */
export type CoxRefusalReason = 'too-few-events' | 'no-variation' | 'no-convergence';

/** Fewest collapses a proportional-hazards fit accepts. */
export const MIN_COX_EVENTS = 10;

/**
 * Thrown when the shelf-life records cannot support a proportional-hazards fit. The message says in
 * plain words what is missing (e.g. "4 collapses seen; at least 10 are needed"); `counts` carries
 * the numbers and `covariate` the key of the covariate at fault, if one is.
 */
export class CoxFitRefused extends Error {
  constructor(
    readonly reason: CoxRefusalReason,
    message: string,
    readonly counts: Record<string, number> = {},
    readonly covariate: string | null = null,
  ) {
    super(message);
    this.name = 'CoxFitRefused';
  }
}
