import type { MaterialKind } from '@shared/schemas/materials';
import { STABILISATIONS, type Stabilisation } from '@shared/states';

/** One entry field: how the form asks for it and how the table shows it. Units live in the label. */
export interface MaterialField {
  name: string;
  label: string;
  type: 'text' | 'number' | 'select' | 'textarea';
  required: boolean;
  options?: { value: string | number; label: string }[];
  hint?: string;
  /** Shown as a table column (notes and the like only in the form). */
  inTable: boolean;
  /** Wide fields take the form's full row. */
  wide?: boolean;
}

export const STABILISATION_LABELS: Record<Stabilisation, string> = {
  charge: 'Charge',
  steric: 'Steric (polymer layer)',
  electrosteric: 'Charge and polymer layer',
  none: 'None',
};

const name: MaterialField = { name: 'name', label: 'Name', type: 'text', required: true, inTable: true };
const price: MaterialField = { name: 'pricePerKg', label: 'Price (/kg)', type: 'number', required: false, inTable: true, hint: 'In your purchasing currency' };
const notes: MaterialField = { name: 'notes', label: 'Notes', type: 'textarea', required: false, inTable: false, wide: true };

export interface KindSpec {
  tab: string;
  singular: string;
  fields: MaterialField[];
}

export const KIND_SPECS: Record<MaterialKind, KindSpec> = {
  particles: {
    tab: 'Particles',
    singular: 'particle system',
    fields: [
      name,
      { name: 'coreMaterial', label: 'Core material', type: 'text', required: true, inTable: true },
      { name: 'radiusNm', label: 'Radius (nm)', type: 'number', required: true, inTable: true },
      { name: 'polydispersityPct', label: 'Polydispersity (%)', type: 'number', required: true, inTable: true },
      { name: 'densityGcm3', label: 'Density (g/cm³)', type: 'number', required: true, inTable: true },
      { name: 'stabilisation', label: 'Kept apart by', type: 'select', required: true, inTable: true, options: STABILISATIONS.map((s) => ({ value: s, label: STABILISATION_LABELS[s] })) },
      { name: 'surfacePotentialMv', label: 'Surface potential (mV)', type: 'number', required: false, inTable: true, hint: 'For charged particles' },
      { name: 'hamakerZj', label: 'Hamaker constant (zJ)', type: 'number', required: false, inTable: true, hint: '1 zJ = 10⁻²¹ J' },
      price,
      notes,
    ],
  },
  depletants: {
    tab: 'Depletants',
    singular: 'depletant',
    fields: [
      name,
      { name: 'molarMassKgMol', label: 'Molar mass (kg/mol)', type: 'number', required: true, inTable: true },
      { name: 'rgNm', label: 'Radius of gyration Rg (nm)', type: 'number', required: false, inTable: true, hint: 'Or leave empty and give k and ν of Rg = k·M^ν' },
      { name: 'rgPrefactorNm', label: 'Rg prefactor k (nm)', type: 'number', required: false, inTable: true, hint: 'With M in g/mol' },
      { name: 'rgExponent', label: 'Rg exponent ν', type: 'number', required: false, inTable: true, hint: 'About 0.5 in a theta solvent, 0.59 in a good one' },
      price,
      notes,
    ],
  },
  solvents: {
    tab: 'Solvents',
    singular: 'solvent',
    fields: [
      name,
      { name: 'viscosityMPas', label: 'Viscosity (mPa·s)', type: 'number', required: true, inTable: true },
      { name: 'densityGcm3', label: 'Density (g/cm³)', type: 'number', required: true, inTable: true },
      { name: 'temperatureC', label: 'Measured at (°C)', type: 'number', required: true, inTable: true, hint: 'The temperature of the viscosity and density above' },
      { name: 'relativePermittivity', label: 'Relative permittivity', type: 'number', required: false, inTable: true, hint: 'Needed for charged particles' },
      price,
      notes,
    ],
  },
  salts: {
    tab: 'Salts',
    singular: 'salt',
    fields: [
      name,
      { name: 'valence', label: 'Valence', type: 'select', required: true, inTable: true, options: [1, 2, 3].map((v) => ({ value: v, label: String(v) })), hint: 'Charge number of the ions: 1 for sodium chloride' },
      { name: 'molarMassGMol', label: 'Molar mass (g/mol)', type: 'number', required: false, inTable: true },
      price,
      notes,
    ],
  },
};
