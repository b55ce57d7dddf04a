import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { PREDICTED_STATES, type PredictedState } from '../../shared/states';
import type { RecipeDerived } from '../../shared/views/recipe';

export type RecipeSource = 'depletion' | 'salt' | 'direct' | 'none';

/** A composition the team may mix, with what shared/physics derived from it at its last save. */
export class Recipe extends Model<InferAttributes<Recipe>, InferCreationAttributes<Recipe>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare programmeId: number;
  declare name: string;
  declare particleId: number;
  declare solventId: number;
  declare fractionKind: 'mass' | 'volume';
  declare fractionValue: number;
  declare temperatureC: number;
  declare attractionSource: RecipeSource;
  declare depletantId: number | null;
  declare depletantConcentrationGL: number | null;
  declare saltId: number | null;
  declare saltConcentrationMM: number | null;
  declare contactEnergyKT: number | null;
  declare rangeSigma: number | null;
  declare notes: string | null;
  declare origin: string | null;
  declare phi: number;
  declare reducedB2: number | null;
  declare predictedState: PredictedState | null;
  declare margin: number | null;
  declare modelVersion: string;
  declare derived: RecipeDerived;
  /** 1 on creation; every edit makes the next version (shortlists keep the one submitted). */
  declare version: CreationOptional<number>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdBy: number | null;
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const num = (allowNull = true) => ({ type: DataTypes.DOUBLE, allowNull });
    Recipe.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        code: { type: DataTypes.STRING(16), allowNull: false, unique: true },
        programmeId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        particleId: { type: DataTypes.INTEGER, allowNull: false },
        solventId: { type: DataTypes.INTEGER, allowNull: false },
        fractionKind: { type: DataTypes.ENUM('mass', 'volume'), allowNull: false },
        fractionValue: num(false),
        temperatureC: { ...num(false), field: 'temperature_c' },
        attractionSource: { type: DataTypes.ENUM('depletion', 'salt', 'direct', 'none'), allowNull: false },
        depletantId: { type: DataTypes.INTEGER, allowNull: true },
        depletantConcentrationGL: { ...num(), field: 'depletant_gl' },
        saltId: { type: DataTypes.INTEGER, allowNull: true },
        saltConcentrationMM: { ...num(), field: 'salt_mm' },
        contactEnergyKT: { ...num(), field: 'contact_energy_kt' },
        rangeSigma: num(),
        notes: { type: DataTypes.TEXT, allowNull: true },
        origin: { type: DataTypes.STRING(200), allowNull: true },
        phi: num(false),
        reducedB2: { ...num(), field: 'reduced_b2' },
        predictedState: { type: DataTypes.ENUM(...PREDICTED_STATES), allowNull: true },
        margin: num(),
        modelVersion: { type: DataTypes.STRING(40), allowNull: false },
        derived: { type: DataTypes.JSON, allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        archivedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        updatedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'recipes', modelName: 'Recipe' },
    );
  }
}
