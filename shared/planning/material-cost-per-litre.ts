import type { CostPerLitre } from './types';

export interface CostInputs {
  /** Particle density ρ_p and solvent density ρ_s in g/cm³ (= kg/L). */
  particleDensity: number;
  solventDensity: number;
  /** Molar mass of the salt in g/mol, when the plan uses salt. */
  saltMolarMass?: number | null;
  /** Price per kg of each material (the library's, or the plan's override); null when unknown. */
  prices: { particles: number | null; solvent: number | null; polymer?: number | null; salt?: number | null };
}

/**
 * Material cost of one litre of sample at volume fraction φ with a dose of polymer (g per litre
 * of solvent) or salt (mM, mol per m³ of solvent):
 *   particles  m_p = φ·ρ_p            kg
 *   solvent    m_s = (1 − φ)·ρ_s      kg
 *   polymer    m_poly = c·(1 − φ)/1000 kg       (c in g/L of solvent)
 *   salt       m_salt = c·(1 − φ)·M/10⁶ kg      (c in mM, M in g/mol)
 *   cost = Σ m·(price per kg)
 * Assumptions: volumes add (no volume change on mixing); the polymer's and the salt's own volumes
 * are neglected, as in the recipe derivation's concentration conversion; doses are per litre of
 * solvent, the recipe's basis. A material without a price counts 0 and is listed in `unpriced`
 * (so is salt without a molar mass). Currency: that of the library's prices.
 *
 * @param phi particle volume fraction, 0 ≤ φ < 1.
 * @param dose polymer g/L or salt mM (≥ 0); `kind` says which.
 * @throws RangeError for φ outside [0, 1), a negative dose, or non-positive densities.
 * @example materialCostPerLitre(0.2, 10, 'polymer', { particleDensity: 2, solventDensity: 0.997, prices: { particles: 120, solvent: 0.01, polymer: 40 } }).total // 48.327976
 */
export function materialCostPerLitre(phi: number, dose: number, kind: 'polymer' | 'salt', inputs: CostInputs): CostPerLitre {
  if (!(phi >= 0 && phi < 1)) throw new RangeError(`materialCostPerLitre: φ must be in [0, 1); got ${phi}`);
  if (!(dose >= 0) || !Number.isFinite(dose)) throw new RangeError(`materialCostPerLitre: the dose must be a finite number ≥ 0; got ${dose}`);
  if (!(inputs.particleDensity > 0) || !(inputs.solventDensity > 0)) throw new RangeError('materialCostPerLitre: densities must be positive');
  // Written without inner closures: this runs for every composition that meets a plan.
  const unpriced: string[] = [];
  const { prices } = inputs;
  const solventShare = 1 - phi;
  const particleKg = phi * inputs.particleDensity;
  const solventKg = solventShare * inputs.solventDensity;
  const polymerKg = kind === 'polymer' ? (dose * solventShare) / 1000 : 0;
  const saltKg = kind === 'salt' && inputs.saltMolarMass != null ? (dose * solventShare * inputs.saltMolarMass) / 1e6 : 0;
  if (prices.particles == null && particleKg > 0) unpriced.push('particles');
  if (prices.solvent == null && solventKg > 0) unpriced.push('solvent');
  if (prices.polymer == null && polymerKg > 0) unpriced.push('polymer');
  if (kind === 'salt' && dose > 0) {
    if (inputs.saltMolarMass == null) unpriced.push('salt (no molar mass)');
    else if (prices.salt == null) unpriced.push('salt');
  }
  const particles = particleKg * (prices.particles ?? 0);
  const solvent = solventKg * (prices.solvent ?? 0);
  const polymer = polymerKg * (prices.polymer ?? 0);
  const salt = saltKg * (prices.salt ?? 0);
  return { total: particles + solvent + polymer + salt, parts: { particles, solvent, polymer, salt }, unpriced };
}
