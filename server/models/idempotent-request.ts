import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A write made with an Idempotency-Key: what was asked (checksum) and what was answered. */
export class IdempotentRequest extends Model<InferAttributes<IdempotentRequest>, InferCreationAttributes<IdempotentRequest>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare scope: string;
  declare idempotencyKey: string;
  declare requestSha256: string;
  declare responseStatus: number | null;
  declare responseBody: unknown;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    IdempotentRequest.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        scope: { type: DataTypes.STRING(60), allowNull: false },
        idempotencyKey: { type: DataTypes.STRING(200), allowNull: false },
        requestSha256: { type: DataTypes.CHAR(64), allowNull: false },
        responseStatus: { type: DataTypes.INTEGER, allowNull: true },
        responseBody: { type: DataTypes.JSON, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'idempotent_requests', modelName: 'IdempotentRequest', updatedAt: false },
    );
  }
}
