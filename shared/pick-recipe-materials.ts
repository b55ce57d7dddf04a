/** What a recipe (or a plan) names from the library. */
export interface MaterialChoice {
  particleId: number;
  solventId: number;
  attraction: { source: string; depletantId?: number; saltId?: number };
}

/** The field of a choice that names no library row, and what a 400 says about it. */
export interface MissingMaterial {
  missing: { field: string; message: string };
}

/** Finds library rows by id, however they are held (a Map of model instances, a fetched list). */
export interface MaterialLookup<P, S, D, A> {
  particle(id: number): P | undefined;
  solvent(id: number): S | undefined;
  depletant(id: number): D | undefined;
  salt(id: number): A | undefined;
}

/**
 * The library rows a recipe uses: its particle system and solvent, and the depletant or salt its
 * attraction names (null for the kind it does not use); or the first field at fault (particle,
 * solvent, depletant, salt) when a row is missing. The one rule for server and client alike.
 */
export function pickRecipeMaterials<P, S, D, A>(choice: MaterialChoice, lookup: MaterialLookup<P, S, D, A>): { particle: P; solvent: S; depletant: D | null; salt: A | null } | MissingMaterial {
  const particle = lookup.particle(choice.particleId);
  if (!particle) return { missing: { field: 'particleId', message: 'no such particle system' } };
  const solvent = lookup.solvent(choice.solventId);
  if (!solvent) return { missing: { field: 'solventId', message: 'no such solvent' } };
  const { attraction } = choice;
  const depletant = attraction.source === 'depletion' && attraction.depletantId !== undefined ? lookup.depletant(attraction.depletantId) ?? null : null;
  if (attraction.source === 'depletion' && !depletant) return { missing: { field: 'attraction.depletantId', message: 'no such depletant' } };
  const salt = attraction.source === 'salt' && attraction.saltId !== undefined ? lookup.salt(attraction.saltId) ?? null : null;
  if (attraction.source === 'salt' && !salt) return { missing: { field: 'attraction.saltId', message: 'no such salt' } };
  return { particle, solvent, depletant, salt };
}

/** A material choice's depletant id, or null when its attraction is not depletion. */
export const depletantIdOf = (c: MaterialChoice) => (c.attraction.source === 'depletion' ? c.attraction.depletantId ?? null : null);

/** A material choice's salt id, or null when its attraction is not salt. */
export const saltIdOf = (c: MaterialChoice) => (c.attraction.source === 'salt' ? c.attraction.saltId ?? null : null);
