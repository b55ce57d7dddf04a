import type { Stabilisation } from '../states';

interface MaterialBase {
  id: number;
  name: string;
  pricePerKg: number | null;
  notes: string | null;
  archived: boolean;
  updatedAt: string;
}
export interface ParticleView extends MaterialBase {
  coreMaterial: string;
  radiusNm: number;
  polydispersityPct: number;
  densityGcm3: number;
  stabilisation: Stabilisation;
  surfacePotentialMv: number | null;
  hamakerZj: number | null;
}
export interface DepletantView extends MaterialBase {
  molarMassKgMol: number;
  rgNm: number | null;
  rgPrefactorNm: number | null;
  rgExponent: number | null;
}
export interface SolventView extends MaterialBase {
  viscosityMPas: number;
  densityGcm3: number;
  temperatureC: number;
  relativePermittivity: number | null;
}
export interface SaltView extends MaterialBase {
  valence: number;
  molarMassGMol: number | null;
}
export interface MaterialViews {
  particles: ParticleView;
  depletants: DepletantView;
  solvents: SolventView;
  salts: SaltView;
}
