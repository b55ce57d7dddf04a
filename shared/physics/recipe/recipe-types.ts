import type { ClassifierParameters, MapModel, PredictedState, BoundaryId } from '../map/types';

/**
 * Material properties and composition of a recipe, in the units the library stores.
 * The particles' share of the sample is `fraction`: a mass fraction or a volume fraction φ, as the
 * recipe form gives it. The attraction comes from
 * `direct` if given, else from `depletant`, else from `salt` (DLVO), else none (hard spheres).
 */
export interface PhysicsRecipeInput {
  particle: {
    radiusNm: number;
    densityGcm3: number;
    /** Size polydispersity, % (standard deviation over mean radius). */
    polydispersityPct?: number;
    /** Surface potential ψ₀ in mV (charged particles, for DLVO with salt). */
    surfacePotentialMv?: number;
    /** Hamaker constant A_H in J (for DLVO with salt). */
    hamakerJ?: number;
  };
  solvent: {
    viscosityMPas: number;
    densityGcm3: number;
    /** Relative permittivity; 78.4 (water, 25 °C) when absent. */
    relativePermittivity?: number;
  };
  temperatureC: number;
  /** The particles' share of the sample: by mass (converted to φ with the two densities) or by volume (φ). */
  fraction: { kind: 'mass' | 'volume'; value: number };
  depletant?: {
    molarMassKgMol: number;
    /** R_g in nm, or else `scaling`: R_g = prefactorNm · M^exponent with M in g/mol. */
    radiusOfGyrationNm?: number;
    scaling?: { prefactorNm: number; exponent: number };
    /** Concentration in g/L. */
    concentrationGL: number;
    /**
     * 'sample' (default): grams per litre of the whole sample; 'solvent': grams per litre of the
     * liquid, converted with the solvent's share of the volume, c_sample = c·(1 − φ).
     */
    concentrationBasis?: 'sample' | 'solvent';
  };
  /** Symmetric z:z salt, concentration in mM. */
  salt?: { concentrationMM: number; valence: number };
  /** Attraction given directly: contact depth U/kT (≥ 0) and well width in units of σ (λ = 1 + range). */
  direct?: { contactEnergyKT: number; range: number };
  /** DLVO closest surface separation h_min in nm (default 0.4). */
  closestApproachNm?: number;
  /** Fluid–fluid theory of the generic map (default 'meanField'). */
  theory?: 'meanField' | 'baxterPY';
  parameters?: Partial<ClassifierParameters>;
}

/** Every derived parameter a recipe stores (SI units unless the name says otherwise). */
export interface RecipeDerivation {
  modelVersion: string;
  attractionSource: 'direct' | 'depletion' | 'salt' | 'none';
  phi: number;
  /** Depletant size ratio q = R_g/a. */
  sizeRatio: number | null;
  radiusOfGyrationNm: number | null;
  overlapConcentrationGL: number | null;
  /** Polymer volume fraction in the sample, φ_p = c/c*. */
  polymerSystem: number | null;
  /** Reservoir polymer fraction φ_p^R = φ_p/α(φ). */
  polymerReservoir: number | null;
  /** Depth of the attraction at contact, U/kT (positive = attractive). */
  contactEnergyKT: number | null;
  /** Width of the attraction beyond contact, in units of σ = 2a. */
  rangeSigma: number | null;
  reducedB2: number | null;
  stickiness: number | null;
  debyeLengthNm: number | null;
  /** DLVO only: the hard-core closest approach used, nm, and any repulsive barrier, kT. */
  closestApproachNm: number | null;
  barrierKT: number | null;
  diffusionM2PerS: number;
  brownianTimeS: number;
  gravitationalPeclet: number;
  settlingSpeedMPerS: number;
  mapModel: MapModel;
  /** The recipe's y on that map (its axis unit). */
  mapY: number;
  predictedState: PredictedState;
  nearestBoundary: { id: BoundaryId; label: string };
  margin: number;
  marginDescription: string;
  reason: string;
  warnings: string[];
}
