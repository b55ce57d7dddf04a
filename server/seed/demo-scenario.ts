import { mkdir, writeFile } from 'node:fs/promises';
import { createHash, randomUUID } from 'node:crypto';
import { join, resolve } from 'node:path';
import type { Transaction } from 'sequelize';
import type { RecipeInput } from '../../shared/schemas/recipes';
import type { ObservationMethod, ObservedState, PredictedState } from '../../shared/states';
import type { Config } from '../config';
import { Attachment, CheckSchedule, Depletant, Observation, ParticleSystem, Programme, Recipe, Salt, Shortlist, ShortlistEvent, ShortlistItem, Solvent, type User } from '../models';
import { recordAudit } from '../models/audit-event';
import { attractionColumns } from '../models/recipe-shapes';
import { deriveForRecipe } from '../services/predictions';
import { materialsOfRecipe } from '../services/recipe-materials';
import { deriveRecipe } from '../../shared/recipe-derivation';
import { seededRandom } from '../../shared/seeded-random';
import { demoMicrograph } from './micrograph';
import { DEMO_CHECK_AGES, demoAgeingSamples, demoSampleHeightMm } from './demo-ageing';

/**
 * The invented scenario of Halden Brook Materials: a depletion-gel primer programme and a
 * salt-driven slurry programme, a library of plausible materials, recipes spread over the
 * map, bench observations at several ages (mostly agreeing with the predictions, sometimes
 * not, weak gels collapsing with time), several ageing samples of every gel with checks from 1 to
 * 56 days and a few check schedules (demo-ageing.ts), two generated micrographs, shortlists in
 * every status.
 * Material values are typical handbook-order numbers chosen for the demo; they are not data.
 */
export async function seedDemoScenario(config: Config, people: Record<string, User>, transaction: Transaction) {
  const random = seededRandom(20261202);
  const by = (u: User) => u.id;
  const t = { transaction };

  const primer = await Programme.create({ name: 'Lumen primer gel', goalState: 'gel', attractionSource: 'depletion', codePrefix: 'LPG', notes: 'A sprayable primer that sets into a weak gel holding titania in suspension for 12 months on the shelf.', createdBy: by(people.manager) }, t);
  const slurry = await Programme.create({ name: 'Harbour anode slurry', goalState: 'gel', attractionSource: 'salt', codePrefix: 'HAS', notes: 'Silica-based slurry that must hold its particles up between mixing and coating; gelled by salt.', createdBy: by(people.manager) }, t);

  const titania = await ParticleSystem.create({ name: 'Titania T-180 (steric)', coreMaterial: 'titanium dioxide', radiusNm: 90, polydispersityPct: 9, densityGcm3: 4.0, stabilisation: 'steric', surfacePotentialMv: null, hamakerZj: null, pricePerKg: 6.5, notes: 'Rutile core with a short polymer brush.', createdBy: by(people.formulator) }, t);
  const latex = await ParticleSystem.create({ name: 'Latex L-240', coreMaterial: 'polystyrene', radiusNm: 120, polydispersityPct: 4, densityGcm3: 1.05, stabilisation: 'electrosteric', surfacePotentialMv: null, hamakerZj: null, pricePerKg: 14, notes: null, createdBy: by(people.formulator) }, t);
  const silica = await ParticleSystem.create({ name: 'Colloidal silica S-40', coreMaterial: 'amorphous silica', radiusNm: 20, polydispersityPct: 14, densityGcm3: 2.2, stabilisation: 'charge', surfacePotentialMv: -20, hamakerZj: 12, pricePerKg: 3.2, notes: 'Sold as a 40 % w/w sol.', createdBy: by(people.formulator) }, t);
  const peg20 = await Depletant.create({ name: 'PEG 20 kg/mol', molarMassKgMol: 20, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583, pricePerKg: 9, notes: 'Rg from the PEG-in-water scaling law.', createdBy: by(people.formulator) }, t);
  const peg35 = await Depletant.create({ name: 'PEG 35 kg/mol', molarMassKgMol: 35, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583, pricePerKg: 11, notes: null, createdBy: by(people.formulator) }, t);
  await Depletant.create({ name: 'Dextran 70 kg/mol', molarMassKgMol: 70, rgNm: 7.5, rgPrefactorNm: null, rgExponent: null, pricePerKg: 60, notes: 'Rg as stated by the supplier.', createdBy: by(people.formulator) }, t);
  const water = await Solvent.create({ name: 'Deionised water (25 °C)', viscosityMPas: 0.89002, densityGcm3: 0.99705, temperatureC: 25, relativePermittivity: 78.4, pricePerKg: 0.002, notes: null, createdBy: by(people.formulator) }, t);
  const glycerolWater = await Solvent.create({ name: 'Water–glycerol 30 % w/w (25 °C)', viscosityMPas: 2.2, densityGcm3: 1.07, temperatureC: 25, relativePermittivity: 70, pricePerKg: 0.4, notes: null, createdBy: by(people.formulator) }, t);
  const nacl = await Salt.create({ name: 'Sodium chloride', valence: 1, molarMassGMol: 58.44, pricePerKg: 0.3, notes: null, createdBy: by(people.formulator) }, t);
  await Salt.create({ name: 'Calcium chloride', valence: 2, molarMassGMol: 110.98, pricePerKg: 0.6, notes: 'Divalent: screens far more strongly per mole.', createdBy: by(people.formulator) }, t);

  const recipes: Recipe[] = [];
  /**
   * The invented bench is a little stickier than the theory (a B2* shift of 0.6): outcomes follow
   * that "reality", with surprises mostly near its boundaries — so the Calibrate screen has a
   * real shift to find in the demo.
   */
  const TEAM_REALITY = { attractionShift: 0.6 };
  const reality = new Map<number, { state: PredictedState; margin: number }>();
  const nextCode = new Map<number, number>([[primer.id, 1], [slurry.id, 1]]);
  async function addRecipe(programme: Programme, name: string, input: Omit<RecipeInput, 'programmeId' | 'name'>, author: User) {
    const full: RecipeInput = { programmeId: programme.id, name, ...input };
    const derived = await deriveForRecipe(full, transaction);
    const materials = await materialsOfRecipe(full, transaction);
    const truth = deriveRecipe(full, materials, { parameters: TEAM_REALITY }).derived;
    const number = nextCode.get(programme.id)!;
    nextCode.set(programme.id, number + 1);
    const recipe = await Recipe.create(
      {
        code: `${programme.codePrefix}-${String(number).padStart(4, '0')}`,
        programmeId: programme.id,
        name,
        particleId: full.particleId,
        solventId: full.solventId,
        fractionKind: full.fraction.kind,
        fractionValue: full.fraction.value,
        temperatureC: full.temperatureC,
        notes: full.notes ?? null,
        origin: null,
        ...attractionColumns(full.attraction),
        phi: derived.phi,
        reducedB2: derived.reducedB2,
        predictedState: derived.predictedState,
        margin: derived.margin,
        modelVersion: derived.modelVersion,
        derived,
        createdBy: author.id,
        updatedBy: author.id,
      },
      t,
    );
    recipes.push(recipe);
    reality.set(recipe.id, { state: truth.predictedState ?? 'fluid', margin: truth.margin ?? 1 });
    return recipe;
  }

  // Primer: titania in water or water–glycerol with PEG, over crowding and polymer dose.
  for (const phi of [0.04, 0.1, 0.18, 0.26, 0.34, 0.44, 0.52, 0.6]) {
    for (const grams of [0, 3, 6, 8.5, 11]) {
      const solvent = grams === 6 && phi >= 0.26 && phi <= 0.44 ? glycerolWater : water;
      const polymer = phi >= 0.44 && grams >= 8.5 ? peg35 : peg20;
      await addRecipe(
        primer,
        `Titania ${Math.round(phi * 100)} % v/v, ${grams === 0 ? 'no polymer' : `${polymer === peg35 ? 'PEG35' : 'PEG20'} ${grams} g/L`}${solvent === glycerolWater ? ', glycerol' : ''}`,
        { particleId: titania.id, solventId: solvent.id, fraction: { kind: 'volume', value: phi }, temperatureC: 25, attraction: grams === 0 ? { source: 'none' } : { source: 'depletion', depletantId: polymer.id, concentrationGL: grams } },
        random() < 0.7 ? people.formulator : people.formulator2,
      );
    }
  }
  for (const [w, grams] of [[0.1, 2], [0.25, 3], [0.4, 6]] as const) {
    await addRecipe(primer, `Latex ${w * 100} % w/w, PEG20 ${grams} g/L`, { particleId: latex.id, solventId: water.id, fraction: { kind: 'mass', value: w }, temperatureC: 25, attraction: { source: 'depletion', depletantId: peg20.id, concentrationGL: grams }, notes: 'Reference system with a low-density particle.' }, people.formulator2);
  }
  // Slurry: charged silica gelled by sodium chloride.
  for (const phi of [0.06, 0.15, 0.25, 0.35]) {
    for (const mM of [20, 60, 100, 200, 400]) {
      await addRecipe(slurry, `Silica ${Math.round(phi * 100)} % v/v, NaCl ${mM} mM`, { particleId: silica.id, solventId: water.id, fraction: { kind: 'volume', value: phi }, temperatureC: 25, attraction: { source: 'salt', saltId: nacl.id, concentrationMM: mM } }, people.formulator);
    }
  }

  // The codes were handed out here; the programmes continue the numbering from the next one.
  for (const programme of [primer, slurry]) {
    programme.nextCodeNumber = nextCode.get(programme.id)!;
    await programme.save(t);
  }

  // Bench outcomes at several ages: the team's reality, mostly as predicted, surprises near boundaries.
  const ages = [0, 1, 7, 30, 90];
  const observations: Observation[] = [];
  const neighbours: Record<PredictedState, ObservedState[]> = {
    fluid: ['separated', 'gel'],
    gel: ['fluid', 'separated'],
    glass: ['gel', 'crystal'],
    crystal: ['glass', 'fluid'],
    separated: ['gel', 'fluid'],
  };
  // Fill heights come from a stream of their own, so the rest of the invented bench is as it was.
  const fillHeights = seededRandom(20020401);
  for (const recipe of recipes) {
    const truth = reality.get(recipe.id)!;
    const mixedAt = new Date(Date.UTC(2026, 5 + Math.floor(random() * 5), 1 + Math.floor(random() * 27)));
    const sampleHeightMm = demoSampleHeightMm(fillHeights);
    // Near a boundary a sample can land either side; far from one it almost never does.
    const surprising = random() < 0.35 * Math.exp(-truth.margin / 0.05);
    const picked = ages.filter((age, i) => i === 0 || random() < 0.75);
    for (const ageDays of picked) {
      let state: ObservedState = surprising && ageDays > 0 ? neighbours[truth.state][Math.floor(random() * 2)] : truth.state;
      if (truth.state === 'gel' && recipe.phi < 0.1 && ageDays >= 30 && random() < 0.6) state = 'collapsed';
      if (random() < 0.03) state = 'unclear';
      const method: ObservationMethod = state === 'gel' && random() < 0.6 ? 'rheology' : random() < 0.15 ? 'microscopy' : 'visual';
      observations.push(
        await Observation.create(
          {
            programmeId: recipe.programmeId,
            recipeId: recipe.id,
            adhocPhi: null,
            adhocReducedB2: null,
            adhocDescription: null,
            adhocPredictedState: null,
            mixedAt,
            ageDays,
            observedState: state,
            method,
            storageModulusPa: method === 'rheology' ? Math.round(4 + 900 * recipe.phi ** 2.5 * (1 + random())) : null,
            yieldStressPa: method === 'rheology' ? Math.round(10 * (0.2 + 30 * recipe.phi ** 2.2) * (1 + random())) / 10 : null,
            settledHeightPct: state === 'collapsed' ? Math.round(40 + random() * 35) : null,
            // Written once, at mixing; the shelf-life analysis takes a sample's latest recorded height.
            sampleHeightMm: ageDays === 0 ? sampleHeightMm : null,
            notes: state === 'collapsed' ? 'Clear supernatant on top; network compacted.' : ageDays === 0 ? 'Just after mixing.' : null,
            observerId: random() < 0.7 ? people.scientist.id : people.scientist2.id,
            importBatchId: null,
          },
          t,
        ),
      );
    }
  }

  // Ageing on the shelf: several samples of every recipe that gels in the team's reality, checked
  // at 1–56 days, some collapsing; a few recipes carry a check schedule and a sample mixed lately
  // whose next check has come, so the bench log's due list has work in it.
  const today = new Date();
  const daysBefore = (days: number) => new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate() - days));
  const gels = recipes.filter((r) => reality.get(r.id)!.state === 'gel' && r.derived.contactEnergyKT !== null);
  const scheduled = new Map<number, number>();
  const recentDays = [9, 16, 30, 5, 12, 20];
  for (const programme of [primer, slurry]) {
    for (const recipe of gels.filter((r) => r.programmeId === programme.id).slice(0, 3)) scheduled.set(recipe.id, recentDays[scheduled.size]);
  }
  const ageingRows = [];
  for (const recipe of gels) {
    const samples = demoAgeingSamples({ phi: recipe.phi, contactEnergyKT: recipe.derived.contactEnergyKT!, softens: recipe.particleId === latex.id }, random, scheduled.get(recipe.id));
    for (const sample of samples) {
      const observerId = random() < 0.6 ? people.scientist.id : people.scientist2.id;
      for (const [index, check] of sample.checks.entries()) {
        const collapsed = check.state === 'collapsed';
        ageingRows.push({
          programmeId: recipe.programmeId, recipeId: recipe.id, adhocPhi: null, adhocReducedB2: null, adhocDescription: null, adhocPredictedState: null,
          mixedAt: daysBefore(sample.mixedDaysAgo), ageDays: check.ageDays, observedState: check.state,
          method: (check.storageModulusPa !== null ? 'rheology' : 'visual') as ObservationMethod,
          storageModulusPa: check.storageModulusPa, yieldStressPa: null,
          settledHeightPct: collapsed ? Math.round(40 + random() * 35) : null,
          sampleHeightMm: index === 0 ? sample.sampleHeightMm : null,
          notes: collapsed ? 'Clear supernatant on top; network compacted.' : null,
          observerId, importBatchId: null,
        });
      }
    }
  }
  const aged = await Observation.bulkCreate(ageingRows, t);
  for (const recipeId of scheduled.keys()) await CheckSchedule.create({ recipeId, agesDays: [...DEMO_CHECK_AGES], updatedBy: people.scientist.id }, t);

  // Two generated micrographs, stored like uploads.
  const dir = resolve(config.DATA_DIR, 'attachments');
  for (const [kind, state] of [['gel', 'gel'], ['fluid', 'fluid']] as const) {
    const target = observations.find((o) => o.observedState === state && o.method !== 'rheology');
    if (!target) continue;
    const bytes = demoMicrograph(kind, kind === 'gel' ? 7 : 11);
    const storedName = `${randomUUID()}.png`;
    await mkdir(join(dir, storedName.slice(0, 2)), { recursive: true });
    await writeFile(join(dir, storedName.slice(0, 2), storedName), bytes);
    target.method = 'microscopy';
    await target.save(t);
    await Attachment.create({ observationId: target.id, originalName: `bright-field ${kind} day ${target.ageDays}.png`, storedName, mimeType: 'image/png', sizeBytes: bytes.length, sha256: createHash('sha256').update(bytes).digest('hex'), uploaderId: target.observerId }, t);
  }

  // Shortlists in every status.
  const primerGels = recipes.filter((r) => r.programmeId === primer.id && r.predictedState === 'gel').sort((a, b) => (b.margin ?? 0) - (a.margin ?? 0));
  const pick = (from: number, n: number) => (primerGels.length ? Array.from({ length: n }, (_, i) => primerGels[(from + i) % primerGels.length]) : []);
  async function addShortlist(title: string, purpose: string, items: Recipe[], steps: { to: 'draft' | 'submitted' | 'approved' | 'returned'; actor: User; comment?: string }[]) {
    const unique = [...new Map(items.map((r) => [r.id, r])).values()];
    const last = steps[steps.length - 1];
    const decided = last.to === 'approved' || last.to === 'returned';
    const shortlist = await Shortlist.create({ programmeId: primer.id, title, purpose, targetState: 'gel', status: last.to, authorId: people.formulator.id, reviewerId: decided ? last.actor.id : null, decisionComment: decided ? last.comment ?? null : null, submittedAt: steps.some((s) => s.to === 'submitted') ? new Date() : null, decidedAt: decided ? new Date() : null }, t);
    await ShortlistItem.bulkCreate(unique.map((r, position) => ({ shortlistId: shortlist.id, recipeId: r.id, position, reason: `Predicted gel with margin ${r.margin?.toFixed(3) ?? '—'}; ${r.name.toLowerCase()}.` })), t);
    let from: ShortlistEvent['fromStatus'] = null;
    for (const step of steps) {
      await ShortlistEvent.create({ shortlistId: shortlist.id, fromStatus: from, toStatus: step.to, actorId: step.actor.id, comment: step.comment ?? null }, t);
      from = step.to;
    }
  }
  await addShortlist('Primer gels, first bench round', 'Three gels with the widest margins for the 30-day shelf test.', pick(0, 3), [
    { to: 'draft', actor: people.formulator },
    { to: 'submitted', actor: people.formulator },
    { to: 'approved', actor: people.manager, comment: 'Approved for mixing; report back at day 30.' },
  ]);
  await addShortlist('Low-polymer candidates', 'Cheaper recipes that may still gel.', pick(3, 2), [
    { to: 'draft', actor: people.formulator },
    { to: 'submitted', actor: people.formulator },
  ]);
  await addShortlist('Glycerol variants', 'Slower settling through a more viscous solvent.', pick(5, 2), [
    { to: 'draft', actor: people.formulator },
    { to: 'submitted', actor: people.formulator },
    { to: 'returned', actor: people.manager, comment: 'Add a water-only control at the same polymer dose.' },
  ]);
  await addShortlist('Ideas for the next batch', 'Work in progress.', pick(1, 2), [{ to: 'draft', actor: people.formulator }]);

  await recordAudit({ actorId: null, action: 'demo.seeded', entityType: 'installation', entityId: null, details: { recipes: recipes.length, observations: observations.length + aged.length } }, transaction);
  return { recipes: recipes.length, observations: observations.length + aged.length, checkSchedules: scheduled.size };
}
