import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { CalibrationFit } from '../../shared/calibration/types';
import { CALIBRATION_STATUSES, type CalibrationStatus } from '../../shared/views/calibration';

/**
 * A fit of a programme's gel boundary to its bench observations. Proposed when fitted; accepted
 * (at most one per programme: a unique generated column in the table says so), then superseded
 * by the next accepted one or withdrawn back to the theory. Rows are never deleted: they are
 * the history.
 */
export class Calibration extends Model<InferAttributes<Calibration>, InferCreationAttributes<Calibration>> {
  declare id: CreationOptional<number>;
  declare programmeId: number;
  declare status: CreationOptional<CalibrationStatus>;
  declare attractionShift: number;
  declare attractionShiftSe: number;
  declare gelB2Threshold: number;
  declare gelB2ThresholdSe: number | null;
  declare observationCount: number;
  declare cvAccuracyBefore: number;
  declare cvAccuracyAfter: number;
  declare method: string;
  declare modelVersion: string;
  declare result: CalibrationFit;
  declare note: string | null;
  declare fittedBy: number | null;
  declare acceptedBy: CreationOptional<number | null>;
  declare acceptedAt: CreationOptional<Date | null>;
  declare endedBy: CreationOptional<number | null>;
  declare endedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const num = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });
    Calibration.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        programmeId: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.ENUM(...CALIBRATION_STATUSES), allowNull: false, defaultValue: 'proposed' },
        attractionShift: num(),
        attractionShiftSe: { ...num(), field: 'attraction_shift_se' },
        gelB2Threshold: { ...num(), field: 'gel_b2_threshold' },
        gelB2ThresholdSe: { ...num(true), field: 'gel_b2_threshold_se' },
        observationCount: { type: DataTypes.INTEGER, allowNull: false },
        cvAccuracyBefore: num(),
        cvAccuracyAfter: num(),
        method: { type: DataTypes.STRING(24), allowNull: false },
        modelVersion: { type: DataTypes.STRING(40), allowNull: false },
        result: { type: DataTypes.JSON, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: true },
        fittedBy: { type: DataTypes.INTEGER, allowNull: true },
        acceptedBy: { type: DataTypes.INTEGER, allowNull: true },
        acceptedAt: { type: DataTypes.DATE(3), allowNull: true },
        endedBy: { type: DataTypes.INTEGER, allowNull: true },
        endedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'calibrations', modelName: 'Calibration' },
    );
  }
}
