import { describe, expect, it } from 'vitest';
import type { RecipeMaterials } from '../recipe-derivation';
import { recipeStateMap } from '../recipe-derivation';
import type { RecipeInput } from '../schemas/recipes';
import { cachedStateMap } from '../state-map-cache';
import { calibrationObservationsOf, observationColumns, type ObservationRowForFit, type RecipeForFit } from './bench-for-fit';

/** Invented materials with typical values (as shared/planning/plan-compositions.test.ts). */
const materials: RecipeMaterials = {
  particle: { radiusNm: 100, densityGcm3: 2.0, polydispersityPct: 5, surfacePotentialMv: -40, hamakerZj: 8 },
  solvent: { viscosityMPas: 0.89002, densityGcm3: 0.997, relativePermittivity: 78.4 },
  depletant: { molarMassKgMol: 20, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583 },
  salt: null,
};
const input: RecipeInput = {
  programmeId: 1, name: 'PEG-bridged spheres', particleId: 1, solventId: 1, fraction: { kind: 'volume', value: 0.2 }, temperatureC: 25,
  attraction: { source: 'depletion', depletantId: 1, concentrationGL: 8 },
};
const recipes: RecipeForFit[] = [
  { id: 7, input, materials, phi: 0.2, reducedB2: -3.1 },
  { id: 8, input, materials: null, phi: 0.3, reducedB2: -1 },
];
const rows: ObservationRowForFit[] = [
  { id: 1, recipeId: 7, adhocPhi: null, adhocReducedB2: null, observedState: 'gel' },
  { id: 2, recipeId: null, adhocPhi: 0.12, adhocReducedB2: -2.5, observedState: 'fluid' },
  { id: 3, recipeId: 9, adhocPhi: null, adhocReducedB2: null, observedState: 'collapsed' },
  { id: 4, recipeId: 8, adhocPhi: null, adhocReducedB2: null, observedState: 'unclear' },
  { id: 5, recipeId: null, adhocPhi: null, adhocReducedB2: null, observedState: 'glass' },
];

describe('calibrationObservationsOf', () => {
  it('gives back each observation of a live recipe or ad-hoc composition as the request thread read it, with its map', () => {
    const offered = calibrationObservationsOf({ recipes, observations: observationColumns(rows) });
    const adhocMap = cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });
    expect(offered).toEqual([
      { id: 1, phi: 0.2, reducedB2: -3.1, observedState: 'gel', map: recipeStateMap(input, materials) },
      { id: 2, phi: 0.12, reducedB2: -2.5, observedState: 'fluid', map: adhocMap },
      // id 3 belongs to recipe 9, not among the live recipes (archived): not offered.
      { id: 4, phi: 0.3, reducedB2: -1, observedState: 'unclear', map: null },
      { id: 5, phi: null, reducedB2: null, observedState: 'glass', map: adhocMap },
    ]);
  });

  it('survives the structured clone that carries it to a worker thread', () => {
    const bench = structuredClone({ recipes, observations: observationColumns(rows) });
    expect(calibrationObservationsOf(bench).map((o) => [o.id, o.observedState, o.phi])).toEqual([[1, 'gel', 0.2], [2, 'fluid', 0.12], [4, 'unclear', 0.3], [5, 'glass', null]]);
  });
});
