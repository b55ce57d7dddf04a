import type { Estimate } from '@shared/calibration/types';

/** A number with its sign and a fixed count of decimals, with a true minus sign. */
export function formatSigned(value: number, decimals = 2): string {
  const text = Math.abs(value).toFixed(decimals);
  return `${value < 0 && Number(text) !== 0 ? '−' : '+'}${text}`;
}

/** "+0.62 ± 0.08" */
export function formatEstimate(estimate: Estimate, decimals = 2): string {
  return `${formatSigned(estimate.value, decimals)} ± ${estimate.standardError.toFixed(decimals)}`;
}

/** "+0.46 to +0.78", with open ends said in words. */
export function formatInterval(estimate: Estimate, decimals = 2): string {
  const low = estimate.low === null ? 'unbounded' : formatSigned(estimate.low, decimals);
  const high = estimate.high === null ? 'unbounded' : formatSigned(estimate.high, decimals);
  return `${low} to ${high}`;
}

export const formatShare = (share: number) => `${Math.round(share * 100)} %`;
