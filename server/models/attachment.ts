import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A file on an observation: stored under DATA_DIR by a server-made name, described here. */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<number>;
  declare observationId: number;
  declare originalName: string;
  declare storedName: string;
  declare mimeType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare uploaderId: number | null;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Attachment.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        observationId: { type: DataTypes.INTEGER, allowNull: false },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        storedName: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        mimeType: { type: DataTypes.STRING(80), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        uploaderId: { type: DataTypes.INTEGER, allowNull: true },
        archivedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'attachments', modelName: 'Attachment', updatedAt: false },
    );
  }
}
