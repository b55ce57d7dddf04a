import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { PlanRequest } from '../../shared/schemas/plans';
import { GOAL_STATES, type GoalState } from '../../shared/states';
import type { PlanView } from '../../shared/views/plan';
import type { PlanRecipe } from './plan-recipe';
import type { Recipe } from './recipe';
import type { User } from './user';

/** What a plan stored besides its inputs: the view's parts that do not change after the run. */
export type StoredPlanOutcome = Omit<PlanView, 'id' | 'programmeId' | 'title' | 'targetState' | 'source' | 'inputs' | 'modelVersion' | 'recipes' | 'createdBy' | 'createdAt'>;

/** A plan as loaded with its author and the recipes made from it (services/plans.ts loadPlan). */
export type LoadedPlan = Plan & { creator?: User | null; made?: (PlanRecipe & { recipe?: Recipe })[] };

/** One planner run: what was asked, with which model and calibration, and what it found. Never changed after. */
export class Plan extends Model<InferAttributes<Plan>, InferCreationAttributes<Plan>> {
  declare id: CreationOptional<number>;
  declare programmeId: number;
  declare title: string;
  declare targetState: GoalState;
  declare attractionSource: 'depletion' | 'salt';
  declare inputs: PlanRequest;
  declare modelVersion: string;
  declare calibrationId: number | null;
  declare outcome: StoredPlanOutcome;
  declare candidateCount: number;
  declare feasible: boolean;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Plan.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        programmeId: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        targetState: { type: DataTypes.ENUM(...GOAL_STATES), allowNull: false },
        attractionSource: { type: DataTypes.ENUM('depletion', 'salt'), allowNull: false },
        inputs: { type: DataTypes.JSON, allowNull: false },
        modelVersion: { type: DataTypes.STRING(40), allowNull: false },
        calibrationId: { type: DataTypes.INTEGER, allowNull: true },
        outcome: { type: DataTypes.JSON, allowNull: false },
        candidateCount: { type: DataTypes.INTEGER, allowNull: false },
        feasible: { type: DataTypes.BOOLEAN, allowNull: false },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'plans', modelName: 'Plan' },
    );
  }
}
