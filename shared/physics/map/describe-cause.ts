import { formatReasonNumber } from './format-reason-number';
import type { RuleRow, StateCause } from './state-rule';
import type { ClassifierParameters } from './types';

const fmt = (value: number) => formatReasonNumber(value, 3);

/**
 * A short plain-words reason for a predicted state, with the numbers that decided it. Internal.
 */
export function describeCause(cause: StateCause, row: RuleRow, phi: number, parameters: ClassifierParameters, polydispersity: number | null): string {
  const b2 = `B2* = ${fmt(row.b2)}`;
  switch (cause) {
    case 'gel-spinodal':
      return `Inside the spinodal (unstable between φ = ${fmt(row.spinodalLow)} and ${fmt(row.spinodalHigh)} at ${b2}) and below the glass line (φ_g = ${fmt(row.glass)}): spinodal decomposition arrests into a gel.`;
    case 'gel-binodal':
      return `Inside the binodal (φ = ${fmt(row.binodalLow)}–${fmt(row.binodalHigh)}) with strong attraction (${b2} ≤ ${parameters.gelB2Threshold}): phase separation arrests into a gel.`;
    case 'separated':
      return `Between the binodal (φ = ${fmt(row.binodalLow)}–${fmt(row.binodalHigh)}) and the spinodal at moderate attraction (${b2} > ${parameters.gelB2Threshold}): slow nucleated phase separation.`;
    case 'glass-attractive':
      return `φ = ${fmt(phi)} at or beyond the attractive-glass line (φ_g = ${fmt(row.glass)} at ${b2}, mode-coupling theory, approximate): bonds cage the particles, an attractive glass.`;
    case 'glass-repulsive':
      return `φ = ${fmt(phi)} at or beyond the glass line (φ_g = ${fmt(row.glass)} at ${b2}, mode-coupling theory): crowding cages the particles, a repulsive glass.`;
    case 'crystal-coexistence':
      return `Inside fluid–crystal coexistence (φ = ${fmt(row.freezing)}–${fmt(row.melting)} at ${b2}): crystals nucleate and grow.`;
    case 'crystal':
      return `Above melting (φ > ${fmt(row.melting)}) and below the glass line (φ_g = ${fmt(row.glass)}) with weak attraction: crystal.`;
    case 'fluid-suppressed':
      return `In the crystal region (φ > ${fmt(row.freezing)}) but crystallisation is suppressed by ${polydispersity} % polydispersity (> ${parameters.polydispersityCrystalThreshold} %): stays a (supercooled) fluid.`;
    case 'fluid':
      return `Below freezing (φ < ${fmt(row.freezing)}) and outside fluid–fluid coexistence at ${b2}: a stable fluid.`;
  }
}
