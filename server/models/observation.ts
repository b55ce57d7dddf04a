import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { OBSERVATION_METHODS, OBSERVED_STATES, PREDICTED_STATES, type ObservationMethod, type ObservedState, type PredictedState } from '../../shared/states';

/** What the bench saw: a recipe (or an ad-hoc composition) in some state at some age. */
export class Observation extends Model<InferAttributes<Observation>, InferCreationAttributes<Observation>> {
  declare id: CreationOptional<number>;
  declare programmeId: number;
  declare recipeId: number | null;
  declare adhocPhi: number | null;
  declare adhocReducedB2: number | null;
  declare adhocDescription: string | null;
  declare adhocPredictedState: PredictedState | null;
  declare mixedAt: Date;
  declare ageDays: number;
  declare observedState: ObservedState;
  declare method: ObservationMethod;
  declare storageModulusPa: number | null;
  declare yieldStressPa: number | null;
  declare settledHeightPct: number | null;
  /** Fill height of the sample in its vial (mm); optional (older rows and bulk writers leave it NULL). */
  declare sampleHeightMm: CreationOptional<number | null>;
  declare notes: string | null;
  declare observerId: number | null;
  declare importBatchId: string | null;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const num = (allowNull = true) => ({ type: DataTypes.DOUBLE, allowNull });
    Observation.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        programmeId: { type: DataTypes.INTEGER, allowNull: false },
        recipeId: { type: DataTypes.INTEGER, allowNull: true },
        adhocPhi: num(),
        adhocReducedB2: { ...num(), field: 'adhoc_reduced_b2' },
        adhocDescription: { type: DataTypes.STRING(300), allowNull: true },
        adhocPredictedState: { type: DataTypes.ENUM(...PREDICTED_STATES), allowNull: true },
        mixedAt: { type: DataTypes.DATE(3), allowNull: false },
        ageDays: num(false),
        observedState: { type: DataTypes.ENUM(...OBSERVED_STATES), allowNull: false },
        method: { type: DataTypes.ENUM(...OBSERVATION_METHODS), allowNull: false },
        storageModulusPa: num(),
        yieldStressPa: num(),
        settledHeightPct: num(),
        sampleHeightMm: num(),
        notes: { type: DataTypes.TEXT, allowNull: true },
        observerId: { type: DataTypes.INTEGER, allowNull: true },
        importBatchId: { type: DataTypes.STRING(36), allowNull: true },
        archivedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'observations', modelName: 'Observation' },
    );
  }
}
