import { DataTypes, Model, QueryTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize, type Transaction } from 'sequelize';

/** Who did what to which record, when and from where. Rows are only ever added. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  declare details: Record<string, unknown> | null;
  declare ip: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(64), allowNull: false },
        entityType: { type: DataTypes.STRING(40), allowNull: false },
        entityId: { type: DataTypes.STRING(64), allowNull: true },
        details: { type: DataTypes.JSON, allowNull: true },
        ip: { type: DataTypes.STRING(64), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'audit_events', modelName: 'AuditEvent', updatedAt: false },
    );
  }
}

export interface AuditInput {
  actorId: number | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  details?: Record<string, unknown> | null;
  ip?: string | null;
}

/**
 * One fixed statement: every write appends an audit row, so this skips the model's build,
 * validation and query building (the columns are bounded here instead). created_at is the
 * database's clock in UTC (the pool sets time_zone '+00:00').
 */
const INSERT_AUDIT =
  'INSERT INTO audit_events (actor_id, action, entity_type, entity_id, details, ip, created_at) VALUES (?, ?, ?, ?, ?, ?, NOW(3))';

/** Appends one audit event, inside the caller's transaction when it has one. */
export async function recordAudit(event: AuditInput, transaction?: Transaction) {
  await AuditEvent.sequelize!.query(INSERT_AUDIT, {
    type: QueryTypes.INSERT,
    transaction,
    replacements: [
      event.actorId,
      event.action.slice(0, 64),
      event.entityType.slice(0, 40),
      event.entityId === undefined || event.entityId === null ? null : String(event.entityId).slice(0, 64),
      event.details ? JSON.stringify(event.details) : null,
      event.ip ? event.ip.slice(0, 64) : null,
    ],
  });
}
