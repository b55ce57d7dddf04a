import type { Depletant, ParticleSystem, Salt, Solvent } from '../models';
import type { DepletantView, ParticleView, SaltView, SolventView } from '../../shared/views/materials';

const base = (m: { id: number; name: string; pricePerKg: number | null; notes: string | null; archivedAt: Date | null; updatedAt: Date }) => ({
  id: m.id,
  name: m.name,
  pricePerKg: m.pricePerKg ?? null,
  notes: m.notes ?? null,
  archived: m.archivedAt != null,
  updatedAt: m.updatedAt.toISOString(),
});

export const presentParticle = (m: ParticleSystem): ParticleView => ({
  ...base(m),
  coreMaterial: m.coreMaterial,
  radiusNm: m.radiusNm,
  polydispersityPct: m.polydispersityPct,
  densityGcm3: m.densityGcm3,
  stabilisation: m.stabilisation,
  surfacePotentialMv: m.surfacePotentialMv ?? null,
  hamakerZj: m.hamakerZj ?? null,
});

export const presentDepletant = (m: Depletant): DepletantView => ({
  ...base(m),
  molarMassKgMol: m.molarMassKgMol,
  rgNm: m.rgNm ?? null,
  rgPrefactorNm: m.rgPrefactorNm ?? null,
  rgExponent: m.rgExponent ?? null,
});

export const presentSolvent = (m: Solvent): SolventView => ({
  ...base(m),
  viscosityMPas: m.viscosityMPas,
  densityGcm3: m.densityGcm3,
  temperatureC: m.temperatureC,
  relativePermittivity: m.relativePermittivity ?? null,
});

export const presentSalt = (m: Salt): SaltView => ({ ...base(m), valence: m.valence, molarMassGMol: m.molarMassGMol ?? null });
