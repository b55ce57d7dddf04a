import { Op, type Transaction } from 'sequelize';
import type { RecipeMaterials } from '../../shared/recipe-derivation';
import { badRequest } from '../errors';
import { Depletant, ParticleSystem, Salt, Solvent } from '../models';

/** What a recipe (or a plan) names from the library. */
export interface MaterialChoice {
  particleId: number;
  solventId: number;
  attraction: { source: string; depletantId?: number; saltId?: number };
}

/** The library rows of a recipe, as model instances. */
export type LoadedMaterials = RecipeMaterials & { particle: ParticleSystem; solvent: Solvent; depletant: Depletant | null; salt: Salt | null };

/** The field of a choice that names no library row, and what the 400 says about it. */
export interface MissingMaterial {
  missing: { field: string; message: string };
}

/**
 * The library rows of many recipes or plans with one query per kind of material (none for a kind
 * nobody uses), in the order given; a choice that names a missing row gets the first field at
 * fault (particle, solvent, depletant, salt), as materialsOfRecipe reports it.
 */
export async function materialsOfRecipes(choices: MaterialChoice[], transaction: Transaction | null): Promise<(LoadedMaterials | MissingMaterial)[]> {
  const depletantOf = (c: MaterialChoice) => (c.attraction.source === 'depletion' ? c.attraction.depletantId ?? null : null);
  const saltOf = (c: MaterialChoice) => (c.attraction.source === 'salt' ? c.attraction.saltId ?? null : null);
  const ids = (pick: (c: MaterialChoice) => number | null) => [...new Set(choices.map(pick).filter((id): id is number => id !== null))];
  const byId = async <M extends { id: number }>(model: { findAll(options: object): Promise<M[]> }, list: number[]) =>
    new Map((list.length ? await model.findAll({ where: { id: { [Op.in]: list } }, transaction }) : []).map((m) => [m.id, m]));
  const [particles, solvents, depletants, salts] = await Promise.all([
    byId<ParticleSystem>(ParticleSystem, ids((c) => c.particleId)),
    byId<Solvent>(Solvent, ids((c) => c.solventId)),
    byId<Depletant>(Depletant, ids(depletantOf)),
    byId<Salt>(Salt, ids(saltOf)),
  ]);
  return choices.map((c) => {
    const particle = particles.get(c.particleId);
    if (!particle) return { missing: { field: 'particleId', message: 'no such particle system' } };
    const solvent = solvents.get(c.solventId);
    if (!solvent) return { missing: { field: 'solventId', message: 'no such solvent' } };
    const depletantId = depletantOf(c);
    const depletant = depletantId !== null ? depletants.get(depletantId) ?? null : null;
    if (c.attraction.source === 'depletion' && !depletant) return { missing: { field: 'attraction.depletantId', message: 'no such depletant' } };
    const saltId = saltOf(c);
    const salt = saltId !== null ? salts.get(saltId) ?? null : null;
    if (c.attraction.source === 'salt' && !salt) return { missing: { field: 'attraction.saltId', message: 'no such salt' } };
    return { particle, solvent, depletant, salt };
  });
}

/** The library rows a recipe or a plan uses, or a 400 naming the field that points nowhere. */
export async function materialsOfRecipe(choice: MaterialChoice, transaction: Transaction | null): Promise<LoadedMaterials> {
  const [found] = await materialsOfRecipes([choice], transaction);
  if ('missing' in found) throw badRequest(`${found.missing.field}: ${found.missing.message}`, found.missing.field);
  return found;
}
