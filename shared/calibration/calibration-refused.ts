/** Why a calibration was not fitted. */
export type RefusalReason = 'too-few-observations' | 'threshold-not-identified' | 'no-trend' | 'shift-out-of-range';

/**
 * Thrown when the observations cannot support the fit asked for. The message says, in plain
 * words, what is missing and how much would be enough; `counts` carries the numbers.
 */
export class CalibrationRefused extends Error {
  constructor(
    readonly reason: RefusalReason,
    message: string,
    readonly counts: Record<string, number> = {},
  ) {
    super(message);
    this.name = 'CalibrationRefused';
  }
}
