import { OutsideModelError } from '../validation/outside-model-error';
import { logDepletionContactEnergy, logFreeVolumeFraction, type ConcentrationBasis } from './depletion-contact-energy';

/**
 * Deepest depletion contact attraction a recipe may reach, in kT. Beyond it the Asakura–Oosawa
 * B2* (which grows like e^U) and the map's placement of the point stop being representable, and
 * the free-volume picture (ideal polymer in a reservoir) has long lost its meaning.
 */
export const DEPLETION_CONTACT_LIMIT_KT = 600;

export interface DepletionRecipeFacts {
  phi: number;
  q: number;
  radiusNm: number;
  radiusOfGyrationNm: number;
  concentrationGL: number;
  overlapGL: number;
  basis: ConcentrationBasis;
  /** The recipe field φ came from, e.g. 'fraction.value' or 'fraction.value (as φ)' (a mass fraction). */
  fractionArgument: string;
}

/**
 * Checks that a depletion recipe stays within free-volume theory: its contact attraction
 * U = φ_p^R(1 + 3/(2q)) with φ_p^R = φ_p/α(φ) must not exceed 600 kT. The reservoir fraction
 * grows without bound as the particles leave the polymer no room (α → 0), so a dense recipe with
 * large coils can ask for any attraction at all. The message names the input to change: the
 * depletant concentration when even dilute particles (α = 1) would exceed the limit, otherwise the
 * particle fraction, with the largest φ that stays inside (bisection on the monotonic ln U(φ))
 * and the largest concentration at the recipe's φ.
 *
 * Sources: as logDepletionContactEnergy (Lekkerkerker et al. 1992; Asakura & Oosawa 1954).
 *
 * @throws OutsideModelError (a PhysicsArgumentError) naming 'depletant.concentrationGL' or the
 *   fraction argument, with a plain-words message.
 * @example requireDepletionWithinModel({ phi: 0.55, q: 0.59, radiusNm: 30, radiusOfGyrationNm: 17.7, concentrationGL: 1, overlapGL: 7.2, basis: 'solvent', fractionArgument: 'fraction.value' })
 * // throws: 'Particle fraction too high for this polymer: …'
 */
export function requireDepletionWithinModel(facts: DepletionRecipeFacts): void {
  const { phi, q, concentrationGL: c, overlapGL, basis } = facts;
  const limit = Math.log(DEPLETION_CONTACT_LIMIT_KT);
  const logContact = logDepletionContactEnergy(phi, q, c, overlapGL, basis);
  if (logContact <= limit) return;
  const contact = describeEnergy(logContact);
  // ln U is linear in ln c, so the largest concentration at this φ follows directly.
  const largestConcentration = c * Math.exp(limit - logContact);
  const diluteContact = Math.log(c / overlapGL) + Math.log1p(3 / (2 * q));
  const coils = `${formatFigure(facts.radiusOfGyrationNm)} nm polymer coils`;
  const particles = `${formatFigure(facts.radiusNm)} nm particles`;
  if (diluteContact > limit) {
    throw new OutsideModelError(
      'depletant.concentrationGL',
      `at most ${formatFigure(largestConcentration)} g/L at this particle fraction`,
      c,
      `Depletant concentration too high: ${formatFigure(c)} g/L of this polymer would pull the ${particles} together with ${contact} at contact, `
        + `beyond the ${DEPLETION_CONTACT_LIMIT_KT} kT the depletion model can describe. Use at most ${formatFigure(largestConcentration)} g/L at this particle fraction.`,
    );
  }
  const largestPhi = largestFractionWithinLimit(q, c, overlapGL, basis, phi, limit);
  const freeVolumePercent = 100 * Math.exp(logFreeVolumeFraction(phi, q));
  throw new OutsideModelError(
    facts.fractionArgument,
    `below ${formatFigure(largestPhi)} with ${formatFigure(c)} g/L of this polymer`,
    phi,
    `Particle fraction too high for this polymer: at φ = ${formatFigure(phi)} the ${coils} hardly fit between the ${particles} `
      + `(free volume ${formatPercent(freeVolumePercent)} of the sample), so ${formatFigure(c)} g/L would pull the particles together with ${contact} at contact, `
      + `beyond the ${DEPLETION_CONTACT_LIMIT_KT} kT the depletion model can describe. Use a particle fraction below φ = ${formatFigure(largestPhi)}, `
      + (largestConcentration >= 0.001 ? `or at most ${formatFigure(largestConcentration)} g/L of polymer.` : 'or a smaller polymer.'),
  );
}

/** Largest φ in (0, phi) with ln U(φ) ≤ limit: ln U rises with φ (α/(1 − φ) falls), so bisection. */
function largestFractionWithinLimit(q: number, c: number, overlap: number, basis: ConcentrationBasis, phi: number, limit: number): number {
  let low = 0;
  let high = phi;
  for (let i = 0; i < 60; i++) {
    const middle = 0.5 * (low + high);
    if (logDepletionContactEnergy(middle, q, c, overlap, basis) <= limit) low = middle; else high = middle;
  }
  return low;
}

/** An energy given by its logarithm, in words that stay finite: '1545 kT' or 'about 10^420 kT'. */
function describeEnergy(logEnergy: number): string {
  if (logEnergy < Math.log(1e6)) return `${Math.round(Math.exp(logEnergy))} kT`;
  return `about 10^${Math.round(logEnergy / Math.LN10)} kT`;
}

function formatFigure(value: number): string {
  return value >= 100 ? value.toFixed(0) : String(Number(value.toPrecision(3)));
}

function formatPercent(percent: number): string {
  return percent >= 0.01 ? `${Number(percent.toPrecision(2))} %` : `less than 0.01 %`;
}
