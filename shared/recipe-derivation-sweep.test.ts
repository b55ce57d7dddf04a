import { describe, expect, it } from 'vitest';
import { highestGlassPhi, PhysicsArgumentError, SHORT_RANGE_LIMIT, type StateMap } from './physics';
import { deriveRecipe, recipeFieldOf, type RecipeMaterials } from './recipe-derivation';
import type { RecipeInput } from './schemas/recipes';
import type { RecipeDerived } from './views/recipe';
import { PREDICTED_STATES } from './states';

// A property-style sweep over realistic recipes, derived exactly as the server does on save
// (deriveRecipe on the recipe's cached map; a PhysicsArgumentError becomes a 400 on recipeFieldOf).
// The grids are test inputs, not check values: typical ranges of formulation work.

/** ~4 s on an idle machine (about 25 free-volume maps are built); generous for a loaded one. */
const SWEEP_TIMEOUT_MS = 60_000;

/** Form fields a physics complaint may be placed on (shared/schemas/recipes.ts). */
const RECIPE_FIELDS = [
  'fraction.value', 'temperatureC', 'particleId', 'solventId', 'attraction.concentrationGL',
  'attraction.depletantId', 'attraction.concentrationMM', 'attraction.saltId',
];

/** A polystyrene-like particle (1.05 g/cm³, −30 mV, Hamaker 10 zJ) in water at 25 °C. */
function buildMaterials(radiusNm: number, extra: Partial<RecipeMaterials> = {}): RecipeMaterials {
  return {
    particle: { radiusNm, densityGcm3: 1.05, polydispersityPct: 5, surfacePotentialMv: -30, hamakerZj: 10 },
    solvent: { viscosityMPas: 0.89002, densityGcm3: 0.997, relativePermittivity: 78.4 },
    ...extra,
  };
}

function buildRecipe(phi: number, attraction: RecipeInput['attraction']): RecipeInput {
  return { programmeId: 1, name: 'sweep', particleId: 1, solventId: 1, fraction: { kind: 'volume', value: phi }, temperatureC: 25, attraction };
}

/** Every number and string anywhere in a value, with its path. */
function leaves(value: unknown, path = '', into: Array<[string, unknown]> = []): Array<[string, unknown]> {
  if (Array.isArray(value)) value.forEach((item, index) => leaves(item, `${path}[${index}]`, into));
  else if (value && typeof value === 'object') Object.entries(value).forEach(([key, item]) => leaves(item, `${path}.${key}`, into));
  else into.push([path, value]);
  return into;
}

/** Derives as the server does; returns a description of every property the result breaks. */
function sweepProblems(recipe: RecipeInput, materials: RecipeMaterials): string[] {
  const label = JSON.stringify({ radiusNm: materials.particle.radiusNm, phi: recipe.fraction.value, attraction: recipe.attraction });
  try {
    const { derived, map } = deriveRecipe(recipe, materials);
    const problems = leaves(derived)
      .filter(([, value]) => (typeof value === 'number' && !Number.isFinite(value)) || (typeof value === 'string' && /NaN|Infinity/.test(value)))
      .map(([path, value]) => `${label}: ${path} = ${String(value)}`);
    if (!PREDICTED_STATES.includes(derived.predictedState!)) problems.push(`${label}: state ${derived.predictedState}`);
    problems.push(...ruleProblems(label, derived, map));
    return problems;
  } catch (error) {
    if (!(error instanceof PhysicsArgumentError)) return [`${label}: ${(error as Error).message}`];
    const field = recipeFieldOf(error);
    const plain = RECIPE_FIELDS.includes(field) && !/NaN|Infinity/.test(error.message);
    return plain ? [] : [`${label}: ${field}: ${error.message}`];
  }
}

/**
 * The state rule's promises (physics.md §5, issue of the arrest lines): a glass only at or beyond
 * the glass line, a gel only below it; dilute, strongly attractive short-range depletion gels
 * (arrested spinodal decomposition, Lu et al., Nature 453, 499 (2008)), never a glass; long-range
 * depletion (q > 0.25) has no attractive glass, so no glass below the hard-sphere line.
 */
function ruleProblems(label: string, derived: RecipeDerived, map: StateMap): string[] {
  const problems: string[] = [];
  const phi = derived.phi!;
  const glass = map.tables.glass.phi;
  if (derived.predictedState === 'glass' && phi < Math.min(...glass) - 1e-9) problems.push(`${label}: glass below the glass line`);
  if (derived.predictedState === 'gel' && phi >= highestGlassPhi(map)) problems.push(`${label}: gel above the glass line`);
  const q = derived.sizeRatio;
  if (q !== null && q <= SHORT_RANGE_LIMIT && derived.contactEnergyKT !== null && derived.contactEnergyKT >= 10 && phi <= 0.15 && derived.predictedState !== 'gel') {
    problems.push(`${label}: dilute strong short-range depletion predicted ${derived.predictedState}, not gel`);
  }
  if (q !== null && q > SHORT_RANGE_LIMIT && derived.predictedState === 'glass' && phi < 0.58) problems.push(`${label}: long-range depletion called glass below φ = 0.58`);
  return problems;
}

describe('deriveRecipe over realistic recipe grids', () => {
  it('derives every depletion recipe (radius 5–500 nm, PEG 1–1000 kg/mol, 0.1–50 g/L, φ 0.01–0.64) or names a field', () => {
    const problems: string[] = [];
    for (const radiusNm of [5, 10, 30, 100, 250, 500]) {
      for (const molarMassKgMol of [1, 4, 20, 100, 400, 1000]) {
        // PEG in water, R_g = 0.0215 nm·M^0.583 (physics.md §6).
        const materials = buildMaterials(radiusNm, { depletant: { molarMassKgMol, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583 } });
        for (const concentrationGL of [0.1, 1, 5, 20, 50]) {
          for (const phi of [0.01, 0.05, 0.15, 0.3, 0.45, 0.55, 0.6, 0.64]) {
            problems.push(...sweepProblems(buildRecipe(phi, { source: 'depletion', depletantId: 1, concentrationGL }), materials));
          }
        }
      }
    }
    expect(problems).toEqual([]);
  }, SWEEP_TIMEOUT_MS);

  it('derives every salt recipe (1–2000 mM, valence 1–3, radius 5–500 nm, φ 0.01–0.64) or names a field', () => {
    const problems: string[] = [];
    for (const radiusNm of [5, 20, 100, 500]) {
      for (const valence of [1, 2, 3]) {
        const materials = buildMaterials(radiusNm, { salt: { valence } });
        for (const concentrationMM of [1, 10, 50, 200, 1000, 2000]) {
          for (const phi of [0.01, 0.2, 0.45, 0.64]) {
            problems.push(...sweepProblems(buildRecipe(phi, { source: 'salt', saltId: 1, concentrationMM }), materials));
          }
        }
      }
    }
    expect(problems).toEqual([]);
  }, SWEEP_TIMEOUT_MS);
});
