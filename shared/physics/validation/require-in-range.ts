import { PhysicsArgumentError } from './physics-argument-error';

/** How an interval end is treated: 'open' excludes the end value, 'closed' includes it. */
export type IntervalEnd = 'open' | 'closed';

export interface IntervalOptions {
  lowEnd?: IntervalEnd;
  highEnd?: IntervalEnd;
  /** Words placed before the interval in the message, e.g. 'a volume fraction'. */
  what?: string;
}

/**
 * Check that `value` is finite and lies in the interval from `low` to `high` (either may be
 * ±Infinity for a half-line). Ends are open unless stated.
 *
 * @throws PhysicsArgumentError whose message names the argument and the interval, e.g.
 *   `q must be a size ratio in (0, Infinity); got -1`.
 * @example requireInRange('phi', 0.3, 0, 0.74, { what: 'a volume fraction' }) // 0.3
 */
export function requireInRange(
  argument: string,
  value: number,
  low: number,
  high: number,
  options: IntervalOptions = {},
): number {
  const lowEnd = options.lowEnd ?? 'open';
  const highEnd = options.highEnd ?? 'open';
  const valid =
    typeof value === 'number' &&
    Number.isFinite(value) &&
    (lowEnd === 'open' ? value > low : value >= low) &&
    (highEnd === 'open' ? value < high : value <= high);
  if (valid) return value;
  // The message is only built on failure: checks sit in hot loops.
  const interval = `${lowEnd === 'open' ? '(' : '['}${formatBound(low)}, ${formatBound(high)}${highEnd === 'open' ? ')' : ']'}`;
  const validRange = options.what ? `${options.what} in ${interval}` : `a finite number in ${interval}`;
  throw new PhysicsArgumentError(argument, validRange, value);
}

function formatBound(bound: number): string {
  if (bound === Infinity) return 'Infinity';
  if (bound === -Infinity) return '-Infinity';
  return String(Number(bound.toPrecision(8)));
}
