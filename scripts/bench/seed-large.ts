import { randomBytes } from 'node:crypto';
import { deriveRecipe } from '../../shared/recipe-derivation';
import { seededRandom } from '../../shared/seeded-random';
import { OBSERVATION_METHODS } from '../../shared/states';
import { Depletant, Observation, ParticleSystem, Programme, Recipe, Solvent, User } from '../../server/models';
import { presentDepletant, presentParticle, presentSolvent } from '../../server/presenters/materials';
import { hashPassword } from '../../server/services/passwords';

export const BENCH_PASSWORD = 'bench-run-password';

/**
 * A programme large enough to measure: 200 recipes over φ × polymer dose and 10,000 bench
 * observations, inserted in bulk. Invented data for the benchmark only.
 */
export async function seedLargeProgramme(observationCount = 10_000) {
  const hash = await hashPassword(BENCH_PASSWORD, 10);
  const viewer = await User.create({ email: 'viewer@bench.example', name: 'Bench viewer', role: 'viewer', passwordHash: hash, active: true, lastSignInAt: null, invitedBy: null });
  const scientist = await User.create({ email: 'scientist@bench.example', name: 'Bench scientist', role: 'scientist', passwordHash: hash, active: true, lastSignInAt: null, invitedBy: null });
  const programme = await Programme.create({ name: 'Large bench programme', goalState: 'gel', attractionSource: 'depletion', codePrefix: 'BIG', notes: null, createdBy: null });
  const particle = await ParticleSystem.create({ name: 'Bench spheres', coreMaterial: 'silica', radiusNm: 100, polydispersityPct: 6, densityGcm3: 2.0, stabilisation: 'steric', surfacePotentialMv: null, hamakerZj: null, pricePerKg: 50, notes: null, createdBy: null });
  const depletant = await Depletant.create({ name: 'Bench PEG', molarMassKgMol: 20, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583, pricePerKg: 10, notes: null, createdBy: null });
  const solvent = await Solvent.create({ name: 'Bench water', viscosityMPas: 0.89, densityGcm3: 0.997, temperatureC: 25, relativePermittivity: 78.4, pricePerKg: 0, notes: null, createdBy: null });
  const materials = { particle: presentParticle(particle), solvent: presentSolvent(solvent), depletant: presentDepletant(depletant), salt: null };
  const rows = [];
  let number = 1;
  for (let i = 0; i < 20; i++) {
    for (let j = 0; j < 10; j++) {
      const input = { programmeId: programme.id, name: `Bench ${i}-${j}`, particleId: particle.id, solventId: solvent.id, fraction: { kind: 'volume' as const, value: 0.03 + i * 0.028 }, temperatureC: 25, attraction: { source: 'depletion' as const, depletantId: depletant.id, concentrationGL: 0.5 + j * 1.2 } };
      const { derived } = deriveRecipe(input, materials);
      rows.push({ code: `BIG-${String(number++).padStart(4, '0')}`, programmeId: programme.id, name: input.name, particleId: particle.id, solventId: solvent.id, fractionKind: 'volume' as const, fractionValue: input.fraction.value, temperatureC: 25, attractionSource: 'depletion' as const, depletantId: depletant.id, depletantConcentrationGL: input.attraction.concentrationGL, saltId: null, saltConcentrationMM: null, contactEnergyKT: null, rangeSigma: null, notes: null, origin: null, phi: derived.phi, reducedB2: derived.reducedB2, predictedState: derived.predictedState, margin: derived.margin, modelVersion: derived.modelVersion, derived, createdBy: null, updatedBy: null });
    }
  }
  const recipes = await Recipe.bulkCreate(rows);
  await programme.update({ nextCodeNumber: number });
  const random = seededRandom(7);
  const states = ['fluid', 'gel', 'gel', 'crystal', 'glass', 'separated', 'collapsed'] as const;
  for (let start = 0; start < observationCount; start += 1000) {
    await Observation.bulkCreate(
      Array.from({ length: Math.min(1000, observationCount - start) }, () => {
        const recipe = recipes[Math.floor(random() * recipes.length)];
        return { programmeId: programme.id, recipeId: recipe.id, adhocPhi: null, adhocReducedB2: null, adhocDescription: null, adhocPredictedState: null, mixedAt: new Date(Date.UTC(2026, Math.floor(random() * 11), 1 + Math.floor(random() * 27))), ageDays: Math.floor(random() * 120), observedState: random() < 0.8 ? recipe.predictedState ?? 'fluid' : states[Math.floor(random() * states.length)], method: OBSERVATION_METHODS[Math.floor(random() * 4)], storageModulusPa: null, yieldStressPa: null, settledHeightPct: null, notes: `bench ${randomBytes(2).toString('hex')}`, observerId: scientist.id, importBatchId: null };
      }),
    );
  }
  return { programmeId: programme.id, recipeId: recipes[0].id, viewerEmail: viewer.email, scientistEmail: scientist.email };
}
