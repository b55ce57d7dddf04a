import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

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
