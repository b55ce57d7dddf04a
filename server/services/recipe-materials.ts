import { Op, type Transaction } from 'sequelize';
import { depletantIdOf, pickRecipeMaterials, saltIdOf, type MaterialChoice, type MissingMaterial } from '../../shared/pick-recipe-materials';
import type { RecipeMaterials } from '../../shared/recipe-derivation';
import { badRequest } from '../errors';
import { Depletant, ParticleSystem, Salt, Solvent } from '../models';

export type { MaterialChoice, MissingMaterial };

/** The library rows of a recipe, as model instances. */
export type LoadedMaterials = RecipeMaterials & { particle: ParticleSystem; solvent: Solvent; depletant: Depletant | null; salt: Salt | null };

/**
 * The library rows of many recipes or plans with one query per kind of material (none for a kind
 * nobody uses), in the order given; a choice that names a missing row gets the first field at
 * fault (particle, solvent, depletant, salt), as materialsOfRecipe reports it.
 */
export async function materialsOfRecipes(choices: MaterialChoice[], transaction: Transaction | null): Promise<(LoadedMaterials | MissingMaterial)[]> {
  const ids = (pick: (c: MaterialChoice) => number | null) => [...new Set(choices.map(pick).filter((id): id is number => id !== null))];
  const byId = async <M extends { id: number }>(model: { findAll(options: object): Promise<M[]> }, list: number[]) =>
    new Map((list.length ? await model.findAll({ where: { id: { [Op.in]: list } }, transaction }) : []).map((m) => [m.id, m]));
  const [particles, solvents, depletants, salts] = await Promise.all([
    byId<ParticleSystem>(ParticleSystem, ids((c) => c.particleId)),
    byId<Solvent>(Solvent, ids((c) => c.solventId)),
    byId<Depletant>(Depletant, ids(depletantIdOf)),
    byId<Salt>(Salt, ids(saltIdOf)),
  ]);
  return choices.map((c) =>
    pickRecipeMaterials(c, { particle: (id) => particles.get(id), solvent: (id) => solvents.get(id), depletant: (id) => depletants.get(id), salt: (id) => salts.get(id) }),
  );
}

/** The library rows a recipe or a plan uses, or a 400 naming the field that points nowhere. */
export async function materialsOfRecipe(choice: MaterialChoice, transaction: Transaction | null): Promise<LoadedMaterials> {
  const [found] = await materialsOfRecipes([choice], transaction);
  if ('missing' in found) throw badRequest(`${found.missing.field}: ${found.missing.message}`, found.missing.field);
  return found;
}

/**
 * Library rows as plain objects, as a heavy-job worker receives them: a model instance keeps its
 * values behind getters, which the structured clone to a worker thread does not carry.
 */
export function plainMaterials(m: LoadedMaterials) {
  return {
    particle: m.particle.get({ plain: true }),
    solvent: m.solvent.get({ plain: true }),
    depletant: m.depletant ? m.depletant.get({ plain: true }) : null,
    salt: m.salt ? m.salt.get({ plain: true }) : null,
  };
}
