import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ImportReport } from '../../shared/views/observation';

/** One CSV import, stored in the import's own transaction, so a retried key finds it. */
export class ImportBatch extends Model<InferAttributes<ImportBatch>, InferCreationAttributes<ImportBatch>> {
  declare id: string;
  declare idempotencyKey: string | null;
  declare userId: number;
  declare fileName: string | null;
  declare rowCount: number;
  declare report: ImportReport;
  /** Checksum of the file the key was first used with (null for batches from before it was kept). */
  declare contentSha256: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ImportBatch.init(
      {
        id: { type: DataTypes.STRING(36), primaryKey: true },
        idempotencyKey: { type: DataTypes.STRING(200), allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        fileName: { type: DataTypes.STRING(255), allowNull: true },
        rowCount: { type: DataTypes.INTEGER, allowNull: false },
        report: { type: DataTypes.JSON, allowNull: false },
        contentSha256: { type: DataTypes.CHAR(64), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'import_batches', modelName: 'ImportBatch', updatedAt: false },
    );
  }
}
