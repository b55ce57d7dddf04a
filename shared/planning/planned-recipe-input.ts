import type { RecipeInput } from '../schemas/recipes';

/** What every composition of a plan shares: the programme, materials and temperature. */
export interface PlanTemplate {
  programmeId: number;
  particleId: number;
  solventId: number;
  temperatureC: number;
  attraction: { source: 'depletion'; depletantId: number } | { source: 'salt'; saltId: number };
}

/**
 * The recipe of one planned composition: volume fraction φ and the dose (polymer g per litre
 * of solvent, or salt mM), with the plan's materials and temperature.
 * @example plannedRecipeInput(template, 0.2, 8.5, 'Planned gel').attraction // { source: 'depletion', depletantId, concentrationGL: 8.5 }
 */
export function plannedRecipeInput(template: PlanTemplate, phi: number, level: number, name: string, notes?: string): RecipeInput {
  const a = template.attraction;
  return {
    programmeId: template.programmeId,
    name,
    particleId: template.particleId,
    solventId: template.solventId,
    fraction: { kind: 'volume', value: phi },
    temperatureC: template.temperatureC,
    attraction: a.source === 'depletion' ? { source: 'depletion', depletantId: a.depletantId, concentrationGL: level } : { source: 'salt', saltId: a.saltId, concentrationMM: level },
    ...(notes ? { notes } : {}),
  };
}
