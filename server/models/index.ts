import type { Sequelize } from 'sequelize';
import { User } from './user';
import { UserToken } from './user-token';
import { AuditEvent } from './audit-event';
import { OutboxMessage } from './outbox-message';
import { Programme } from './programme';
import { ParticleSystem, Depletant, Solvent, Salt } from './materials';
import { Recipe } from './recipe';
import { Observation } from './observation';
import { Attachment } from './attachment';
import { ImportBatch } from './import-batch';
import { Shortlist, ShortlistItem, ShortlistEvent } from './shortlist';
import { Calibration } from './calibration';
import { Plan } from './plan';
import { PlanRecipe } from './plan-recipe';
import { IdempotentRequest } from './idempotent-request';
import { CheckSchedule } from './check-schedule';
import { programmeWritten } from './write-events';

export { User, UserToken, AuditEvent, OutboxMessage, Programme, ParticleSystem, Depletant, Solvent, Salt, Recipe, Observation, Attachment, ImportBatch, Shortlist, ShortlistItem, ShortlistEvent, Calibration, Plan, PlanRecipe, IdempotentRequest, CheckSchedule };

const ALL = [User, UserToken, AuditEvent, OutboxMessage, Programme, ParticleSystem, Depletant, Solvent, Salt, Recipe, Observation, Attachment, ImportBatch, Shortlist, ShortlistItem, ShortlistEvent, Calibration, Plan, PlanRecipe, IdempotentRequest, CheckSchedule];

/** Binds every model to the process's Sequelize instance and declares the associations. */
export function initModels(sequelize: Sequelize) {
  for (const model of ALL) model.initModel(sequelize);
  UserToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  AuditEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  Recipe.belongsTo(Programme, { foreignKey: 'programmeId', as: 'programme' });
  Recipe.belongsTo(ParticleSystem, { foreignKey: 'particleId', as: 'particle' });
  Recipe.belongsTo(Solvent, { foreignKey: 'solventId', as: 'solvent' });
  Recipe.belongsTo(Depletant, { foreignKey: 'depletantId', as: 'depletant' });
  Recipe.belongsTo(Salt, { foreignKey: 'saltId', as: 'salt' });
  Recipe.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  Observation.belongsTo(Recipe, { foreignKey: 'recipeId', as: 'recipe' });
  Observation.belongsTo(User, { foreignKey: 'observerId', as: 'observer' });
  Observation.hasMany(Attachment, { foreignKey: 'observationId', as: 'attachments' });
  Attachment.belongsTo(User, { foreignKey: 'uploaderId', as: 'uploader' });
  Shortlist.hasMany(ShortlistItem, { foreignKey: 'shortlistId', as: 'items' });
  Shortlist.hasMany(ShortlistEvent, { foreignKey: 'shortlistId', as: 'events' });
  Shortlist.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Shortlist.belongsTo(User, { foreignKey: 'reviewerId', as: 'reviewer' });
  ShortlistItem.belongsTo(Recipe, { foreignKey: 'recipeId', as: 'recipe' });
  ShortlistEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  Calibration.belongsTo(User, { foreignKey: 'fittedBy', as: 'fitter' });
  Calibration.belongsTo(User, { foreignKey: 'acceptedBy', as: 'acceptor' });
  Calibration.belongsTo(User, { foreignKey: 'endedBy', as: 'ender' });
  Plan.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  Plan.hasMany(PlanRecipe, { foreignKey: 'planId', as: 'made' });
  PlanRecipe.belongsTo(Recipe, { foreignKey: 'recipeId', as: 'recipe' });
  watchProgrammeWrites();
}

/**
 * A saved recipe, observation or calibration tells the write events which programme it changed
 * (after its transaction commits), so the map overlay drops only that programme's cache.
 * Raw inserts (createObservation) call programmeWritten themselves.
 */
function watchProgrammeWrites() {
  type Hookable = { addHook: (name: string, key: string, fn: (...args: never[]) => void) => void };
  for (const model of [Recipe, Observation, Calibration] as unknown as Hookable[]) {
    const one = (row: { programmeId: number }, options: { transaction?: unknown }) => programmeWritten(row.programmeId, options.transaction as never);
    model.addHook('afterCreate', 'programme-written', one as never);
    model.addHook('afterUpdate', 'programme-written', one as never);
    model.addHook('afterDestroy', 'programme-written', one as never);
    model.addHook('afterBulkCreate', 'programme-written', ((rows: { programmeId: number }[], options: { transaction?: unknown }) => {
      for (const programmeId of new Set(rows.map((r) => r.programmeId))) programmeWritten(programmeId, options.transaction as never);
    }) as never);
  }
}
