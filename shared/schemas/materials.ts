import { z } from 'zod';
import { STABILISATIONS } from '../states';
import { LIMITS } from '../limits';
import { boundedNumber, optionalPrice, optionalText, requiredText } from './common';

const name = requiredText('Name', LIMITS.nameLength);
const notes = optionalText('Notes', LIMITS.notesLength);

/** Colloidal particles as bought or made: size, density, how they are kept apart. */
export const particleInputSchema = z
  .object({
    name,
    coreMaterial: requiredText('Core material', 80),
    radiusNm: boundedNumber('Radius', 1, 50_000, 'nm'),
    polydispersityPct: boundedNumber('Polydispersity', 0, 100, '%'),
    densityGcm3: boundedNumber('Density', 0.5, 25, 'g/cm³'),
    stabilisation: z.enum(STABILISATIONS, { error: `stabilisation must be one of ${STABILISATIONS.join(', ')}` }),
    surfacePotentialMv: boundedNumber('Surface potential', -300, 300, 'mV').nullable().optional(),
    hamakerZj: boundedNumber('Hamaker constant', 0.1, 1000, 'zJ').nullable().optional(),
    pricePerKg: optionalPrice,
    notes,
  })
  .strict();
export type ParticleInput = z.infer<typeof particleInputSchema>;

/** A non-adsorbing polymer: its size is given directly or through Rg = k·M^ν (M in g/mol). */
export const depletantInputSchema = z
  .object({
    name,
    molarMassKgMol: boundedNumber('Molar mass', 0.1, 100_000, 'kg/mol'),
    rgNm: boundedNumber('Radius of gyration', 0.1, 5000, 'nm').nullable().optional(),
    rgPrefactorNm: boundedNumber('Rg prefactor k', 1e-5, 10, 'nm').nullable().optional(),
    rgExponent: boundedNumber('Rg exponent ν', 0.3, 1, '').nullable().optional(),
    pricePerKg: optionalPrice,
    notes,
  })
  .strict()
  .refine((v) => v.rgNm != null || (v.rgPrefactorNm != null && v.rgExponent != null), {
    path: ['rgNm'],
    message: 'Give the radius of gyration, or both k and ν of Rg = k·M^ν',
  });
export type DepletantInput = z.infer<typeof depletantInputSchema>;

export const solventInputSchema = z
  .object({
    name,
    viscosityMPas: boundedNumber('Viscosity', 0.01, 100_000, 'mPa·s'),
    densityGcm3: boundedNumber('Density', 0.5, 3, 'g/cm³'),
    temperatureC: boundedNumber('Temperature', -50, 200, '°C'),
    relativePermittivity: boundedNumber('Relative permittivity', 1, 200, '').nullable().optional(),
    pricePerKg: optionalPrice,
    notes,
  })
  .strict();
export type SolventInput = z.infer<typeof solventInputSchema>;

export const saltInputSchema = z
  .object({
    name,
    valence: z.number({ error: 'valence must be 1, 2 or 3' }).int().min(1, 'valence must be 1, 2 or 3').max(3, 'valence must be 1, 2 or 3'),
    molarMassGMol: boundedNumber('Molar mass', 1, 2000, 'g/mol').nullable().optional(),
    pricePerKg: optionalPrice,
    notes,
  })
  .strict();
export type SaltInput = z.infer<typeof saltInputSchema>;

export const MATERIAL_KINDS = ['particles', 'depletants', 'solvents', 'salts'] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];

export const MATERIAL_SCHEMAS = {
  particles: particleInputSchema,
  depletants: depletantInputSchema,
  solvents: solventInputSchema,
  salts: saltInputSchema,
} as const;
