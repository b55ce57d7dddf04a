/**
 * The one error every physics function throws for bad input.
 *
 * The message always reads `<argument> must be <valid range>; got <value>`, so a caller (or a
 * form) can show it as is. `argument` and `validRange` are kept as fields for programmatic use.
 *
 * @example
 * new PhysicsArgumentError('phi', 'a volume fraction in (0, 0.7404805)', 0.9).message
 * // 'phi must be a volume fraction in (0, 0.7404805); got 0.9'
 */
export class PhysicsArgumentError extends RangeError {
  readonly argument: string;
  readonly validRange: string;

  constructor(argument: string, validRange: string, value: unknown) {
    super(`${argument} must be ${validRange}; got ${describeValue(value)}`);
    this.name = 'PhysicsArgumentError';
    this.argument = argument;
    this.validRange = validRange;
  }
}

function describeValue(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (value === undefined) return 'undefined';
  try {
    return JSON.stringify(value);
  } catch {
    return String(value);
  }
}
