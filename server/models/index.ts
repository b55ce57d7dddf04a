import type { Sequelize } from 'sequelize';
import { User } from './user';
import { UserToken } from './user-token';
import { AuditEvent } from './audit-event';
import { OutboxMessage } from './outbox-message';

export { User, UserToken, AuditEvent, OutboxMessage };

/** Binds every model to the process's Sequelize instance and declares the associations. */
export function initModels(sequelize: Sequelize) {
  for (const model of [User, UserToken, AuditEvent, OutboxMessage]) model.initModel(sequelize);
  UserToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  AuditEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
}
