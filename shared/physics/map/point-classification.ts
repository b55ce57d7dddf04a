import { describeCause } from './describe-cause';
import { formatReasonNumber } from './format-reason-number';
import type { RuleRow, StateCause } from './state-rule';
import type { BoundaryId, ClassifiedPoint, ClassifierParameters, PredictedState } from './types';

/**
 * The result of classifyPoint. `state`, `nearestBoundary` and `margin` are plain fields;
 * `reason` and `marginDescription` are written on first read (formatting numbers for 100 000
 * points would cost more than classifying them). `toJSON()` — used by JSON.stringify and
 * Express's res.json — returns a plain object with all five fields; use it, not object spread
 * (which copies only own fields), when a plain copy is needed.
 */
export class PointClassification implements ClassifiedPoint {
  readonly state: PredictedState;
  readonly nearestBoundary: { readonly id: BoundaryId; readonly label: string };
  readonly margin: number;
  readonly #cause: StateCause;
  // The rule's thresholds that were looked up (NaN for the others), copied from the caller's row.
  readonly #spinodalLow: number;
  readonly #spinodalHigh: number;
  readonly #binodalLow: number;
  readonly #binodalHigh: number;
  readonly #freezing: number;
  readonly #melting: number;
  readonly #glass: number;
  readonly #b2: number;
  readonly #phi: number;
  readonly #parameters: ClassifierParameters;
  readonly #polydispersity: number | null;
  readonly #yLabel: string;
  readonly #deltaPhi: number;
  readonly #deltaY: number;
  #reason: string | undefined;
  #marginDescription: string | undefined;

  /**
   * @param row the thresholds the rule looked up (copied; the caller may reuse it).
   * @param deltaPhi Δφ (map units) from the point to the nearest boundary point, NaN if none.
   * @param deltaY Δy (map units), likewise.
   */
  constructor(
    state: PredictedState,
    nearestBoundary: { readonly id: BoundaryId; readonly label: string },
    margin: number,
    cause: StateCause,
    row: RuleRow,
    phi: number,
    parameters: ClassifierParameters,
    polydispersity: number | null,
    yLabel: string,
    deltaPhi: number,
    deltaY: number,
  ) {
    this.state = state;
    this.nearestBoundary = nearestBoundary;
    this.margin = margin;
    this.#cause = cause;
    this.#spinodalLow = row.spinodalLow;
    this.#spinodalHigh = row.spinodalHigh;
    this.#binodalLow = row.binodalLow;
    this.#binodalHigh = row.binodalHigh;
    this.#freezing = row.freezing;
    this.#melting = row.melting;
    this.#glass = row.glass;
    this.#b2 = row.b2;
    this.#phi = phi;
    this.#parameters = parameters;
    this.#polydispersity = polydispersity;
    this.#yLabel = yLabel;
    this.#deltaPhi = deltaPhi;
    this.#deltaY = deltaY;
  }

  get reason(): string {
    this.#reason ??= describeCause(this.#cause, {
      spinodalLow: this.#spinodalLow,
      spinodalHigh: this.#spinodalHigh,
      binodalLow: this.#binodalLow,
      binodalHigh: this.#binodalHigh,
      freezing: this.#freezing,
      melting: this.#melting,
      glass: this.#glass,
      attractive: this.#cause === 'glass-attractive',
      b2: this.#b2,
    }, this.#phi, this.#parameters, this.#polydispersity);
    return this.#reason;
  }

  get marginDescription(): string {
    this.#marginDescription ??= Number.isNaN(this.#deltaPhi)
      ? 'no state-changing boundary on this map; margin reported as 1 (the whole map)'
      : `${formatReasonNumber(this.margin, 4)} (normalised map units) to ${this.nearestBoundary.label}: Δφ = ${signed(this.#deltaPhi)}, Δ${this.#yLabel} = ${signed(this.#deltaY)}`;
    return this.#marginDescription;
  }

  toJSON(): ClassifiedPoint {
    return {
      state: this.state,
      nearestBoundary: { id: this.nearestBoundary.id, label: this.nearestBoundary.label },
      margin: this.margin,
      marginDescription: this.marginDescription,
      reason: this.reason,
    };
  }
}

function signed(value: number): string {
  const text = formatReasonNumber(value, 4);
  return value > 0 ? `+${text}` : text;
}
