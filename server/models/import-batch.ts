import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ImportReport } from '../../shared/views/team-data';

/** One CSV import, stored in the import's own transaction, so a retried key finds it. */
export class ImportBatch extends Model<InferAttributes<ImportBatch>, InferCreationAttributes<ImportBatch>> {
  declare id: string;
  declare idempotencyKey: string | null;
  declare userId: number;
  declare fileName: string | null;
  declare rowCount: number;
  declare report: ImportReport;
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
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'import_batches', modelName: 'ImportBatch', updatedAt: false },
    );
  }
}
