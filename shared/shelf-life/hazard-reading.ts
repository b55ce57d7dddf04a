/**
 * One covariate's hazard ratio in plain words:
 * "each +1 kT of attraction multiplies the collapse hazard by 0.62 (0.48–0.80)", with
 * "; the data cannot tell this from no effect" appended when the 95 % interval holds 1.
 * Numbers: two decimals below 10, one below 100, else three significant figures.
 * @example hazardReading({ label: 'φ', unit: '', step: 0.01 }, 1.3, 1.1, 1.6)
 *   // "each +0.01 of φ multiplies the collapse hazard by 1.30 (1.10–1.60)"
 */
export function hazardReading(covariate: { label: string; unit: string; step: number }, hazardRatio: number, low: number, high: number): string {
  const change = `+${covariate.step}${covariate.unit ? ` ${covariate.unit}` : ''}`;
  const unclear = low <= 1 && high >= 1 ? '; the data cannot tell this from no effect' : '';
  return `each ${change} of ${covariate.label} multiplies the collapse hazard by ${formatRatio(hazardRatio)} (${formatRatio(low)}–${formatRatio(high)})${unclear}`;
}

function formatRatio(value: number): string {
  if (value < 10) return value.toFixed(2);
  if (value < 100) return value.toFixed(1);
  return String(Number(value.toPrecision(3)));
}
