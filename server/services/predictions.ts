import type { Transaction } from 'sequelize';
import { classifyPoint, PhysicsArgumentError, type ClassifierParameters } from '../../shared/physics';
import { cachedStateMap } from '../../shared/state-map-cache';
import { deriveRecipe, recipeFieldOf } from '../../shared/recipe-derivation';
import type { RecipeInput } from '../../shared/schemas/recipes';
import type { PredictedState } from '../../shared/states';
import type { RecipeDerived } from '../../shared/views/recipe';
import { badRequest } from '../errors';
import { Calibration, Programme } from '../models';
import { materialsOfRecipe } from './recipe-materials';

/**
 * The classifier parameters of a programme's accepted calibration and its label, or none (the
 * uncalibrated theory). Inside a transaction with `fresh`, the programme row is share-locked
 * first and the calibration read with a locking read, so a prediction made while a calibration
 * is being accepted or withdrawn waits for it and uses the committed result (accepting locks the
 * programme row for update before it changes anything). Recipe saves need not: accepting locks
 * every live recipe row and recomputes it, so whichever commits first, the other sees it.
 */
export async function programmeParameters(
  programmeId: number,
  transaction: Transaction | null,
  options: { fresh?: boolean } = {},
): Promise<{ parameters?: Partial<ClassifierParameters>; calibration: { id: number; acceptedAt: string } | null }> {
  const lock = options.fresh && transaction ? transaction.LOCK.SHARE : undefined;
  if (lock) await Programme.findByPk(programmeId, { transaction, lock, attributes: ['id'] });
  const accepted = await Calibration.findOne({ where: { programmeId, status: 'accepted' }, transaction, lock, attributes: ['id', 'attractionShift', 'gelB2Threshold', 'acceptedAt'] });
  if (!accepted || !accepted.acceptedAt) return { calibration: null };
  return {
    parameters: { attractionShift: accepted.attractionShift, gelB2Threshold: accepted.gelB2Threshold },
    calibration: { id: accepted.id, acceptedAt: accepted.acceptedAt.toISOString() },
  };
}

/**
 * What a recipe stores, derived with shared/physics on the server. Physics complaints about the
 * composition become a 400 on the form field they concern.
 */
export async function deriveForRecipe(input: RecipeInput, transaction: Transaction | null): Promise<RecipeDerived> {
  const materials = await materialsOfRecipe(input, transaction);
  const { parameters, calibration } = await programmeParameters(input.programmeId, transaction);
  try {
    return deriveRecipe(input, materials, { parameters, calibration }).derived;
  } catch (error) {
    if (error instanceof PhysicsArgumentError) throw badRequest(`${recipeFieldOf(error)}: ${error.message}`, recipeFieldOf(error));
    throw error;
  }
}

/** The predicted state of an ad-hoc composition, placed by its B2* on the generic map. */
export async function predictAdhoc(programmeId: number, phi: number, reducedB2: number, transaction: Transaction | null): Promise<PredictedState | null> {
  const { parameters } = await programmeParameters(programmeId, transaction, { fresh: true });
  try {
    return adhocPrediction(phi, reducedB2, parameters);
  } catch (error) {
    if (error instanceof PhysicsArgumentError) throw badRequest(`adhoc: ${error.message}`, 'adhoc.phi');
    throw error;
  }
}

/** The classification behind predictAdhoc: the generic mean-field map, placed by B2*. */
export function adhocPrediction(phi: number, reducedB2: number, parameters: Partial<ClassifierParameters> | undefined): PredictedState {
  const map = cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' }, { parameters });
  return classifyPoint(map, { phi, attraction: { kind: 'b2', value: reducedB2 } }, parameters).state;
}
