import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** When the bench looks at a recipe's samples again: ages in whole days after mixing, ascending. */
export class CheckSchedule extends Model<InferAttributes<CheckSchedule>, InferCreationAttributes<CheckSchedule>> {
  declare recipeId: number;
  declare agesDays: number[];
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CheckSchedule.init(
      {
        recipeId: { type: DataTypes.INTEGER, primaryKey: true },
        agesDays: { type: DataTypes.JSON, allowNull: false },
        updatedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'check_schedules', modelName: 'CheckSchedule' },
    );
  }
}
