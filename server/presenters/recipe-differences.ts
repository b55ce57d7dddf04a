import type { Recipe } from '../models';
import { snapshotOf } from '../models/recipe-shapes';
import type { RecipeDifference, RecipeSnapshot } from '../../shared/views/recipe';

type Value = string | number | null;
type Reader = [field: string, label: string, read: (s: RecipeSnapshot) => Value];

const attractionValue = (s: RecipeSnapshot, key: string): Value => {
  const value = (s.attraction as Record<string, unknown>)[key];
  return typeof value === 'number' || typeof value === 'string' ? value : null;
};

/** What a reviewer needs to see differ: composition first, then what physics made of it. */
const READERS: Reader[] = [
  ['name', 'Name', (s) => s.name],
  ['particleId', 'Particle system (id)', (s) => s.particleId],
  ['solventId', 'Solvent (id)', (s) => s.solventId],
  ['fraction.kind', 'Fraction given as', (s) => s.fraction.kind],
  ['fraction.value', 'Fraction', (s) => s.fraction.value],
  ['temperatureC', 'Temperature (°C)', (s) => s.temperatureC],
  ['attraction.source', 'Attraction from', (s) => s.attraction.source],
  ['attraction.depletantId', 'Depletant (id)', (s) => attractionValue(s, 'depletantId')],
  ['attraction.concentrationGL', 'Depletant (g/L)', (s) => attractionValue(s, 'concentrationGL')],
  ['attraction.saltId', 'Salt (id)', (s) => attractionValue(s, 'saltId')],
  ['attraction.concentrationMM', 'Salt (mM)', (s) => attractionValue(s, 'concentrationMM')],
  ['attraction.contactEnergyKT', 'U/kT given', (s) => attractionValue(s, 'contactEnergyKT')],
  ['attraction.rangeSigma', 'Range given (σ)', (s) => attractionValue(s, 'rangeSigma')],
  ['derived.phi', 'φ', (s) => s.derived.phi],
  ['derived.contactEnergyKT', 'U/kT', (s) => s.derived.contactEnergyKT],
  ['derived.reducedB2', 'B2*', (s) => s.derived.reducedB2],
  ['derived.predictedState', 'Predicted state', (s) => s.derived.predictedState],
  ['derived.margin', 'Margin', (s) => s.derived.margin],
  ['derived.modelVersion', 'Model version', (s) => s.derived.modelVersion],
  ['derived.calibration', 'Calibration', (s) => (s.derived.calibration ? `#${s.derived.calibration.id}` : 'none')],
];

/** The fields in which the recipe today differs from the version a shortlist keeps. */
export function differencesSince(kept: RecipeSnapshot, current: Recipe): RecipeDifference[] {
  const now = snapshotOf(current);
  return READERS.flatMap(([field, label, read]) => {
    const before = read(kept);
    const after = read(now);
    return before === after ? [] : [{ field, label, before, after }];
  });
}
