import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A recipe made from a plan, and which of the plan's candidates or proposed experiments it is. */
export class PlanRecipe extends Model<InferAttributes<PlanRecipe>, InferCreationAttributes<PlanRecipe>> {
  declare id: CreationOptional<number>;
  declare planId: number;
  declare recipeId: number;
  declare kind: 'candidate' | 'experiment';
  declare itemIndex: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PlanRecipe.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        planId: { type: DataTypes.INTEGER, allowNull: false },
        recipeId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.ENUM('candidate', 'experiment'), allowNull: false },
        itemIndex: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'plan_recipes', modelName: 'PlanRecipe', updatedAt: false },
    );
  }
}
