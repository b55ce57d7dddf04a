import { Op, type Sequelize } from 'sequelize';
import { PHYSICS_MODEL_VERSION } from '../../shared/physics';
import { Recipe } from '../models';
import { recomputePredictions } from './calibrations';

/**
 * After an upgrade that changed the physics (PHYSICS_MODEL_VERSION), derive again every live
 * recipe still stored with an older version, one programme per transaction, with the
 * programme's accepted calibration — the same recomputation accepting a calibration does. A
 * programme whose recipes cannot all be derived keeps its old predictions and is reported.
 * Runs once at start-up; a programme already on the current version costs one indexed query.
 */
export async function rederiveOutdatedPredictions(sequelize: Sequelize, log: (line: string) => void = console.log): Promise<{ programmes: number; recipes: number }> {
  const outdated = await Recipe.findAll({
    attributes: ['programmeId'],
    where: { modelVersion: { [Op.ne]: PHYSICS_MODEL_VERSION }, archivedAt: null },
    group: ['programmeId'],
    raw: true,
  });
  let recipes = 0;
  let programmes = 0;
  for (const { programmeId } of outdated) {
    try {
      const result = await sequelize.transaction((transaction) => recomputePredictions(transaction, programmeId));
      recipes += result.recipes;
      programmes++;
    } catch (error) {
      log(`physics ${PHYSICS_MODEL_VERSION}: programme ${programmeId} keeps its earlier predictions (${(error as Error).message})`);
    }
  }
  if (programmes > 0) log(`physics ${PHYSICS_MODEL_VERSION}: derived ${recipes} recipes of ${programmes} programmes again`);
  return { programmes, recipes };
}
