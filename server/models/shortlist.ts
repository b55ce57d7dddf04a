import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { GOAL_STATES, SHORTLIST_STATUSES, type GoalState, type ShortlistStatus } from '../../shared/states';
import type { RecipeSnapshot } from '../../shared/views/recipe';

export class Shortlist extends Model<InferAttributes<Shortlist>, InferCreationAttributes<Shortlist>> {
  declare id: CreationOptional<number>;
  declare programmeId: number;
  declare title: string;
  declare purpose: string | null;
  declare targetState: GoalState;
  declare status: ShortlistStatus;
  declare authorId: number | null;
  declare reviewerId: number | null;
  declare decisionComment: string | null;
  declare submittedAt: Date | null;
  declare decidedAt: Date | null;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Shortlist.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        programmeId: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        purpose: { type: DataTypes.TEXT, allowNull: true },
        targetState: { type: DataTypes.ENUM(...GOAL_STATES), allowNull: false },
        status: { type: DataTypes.ENUM(...SHORTLIST_STATUSES), allowNull: false },
        authorId: { type: DataTypes.INTEGER, allowNull: true },
        reviewerId: { type: DataTypes.INTEGER, allowNull: true },
        decisionComment: { type: DataTypes.TEXT, allowNull: true },
        submittedAt: { type: DataTypes.DATE(3), allowNull: true },
        decidedAt: { type: DataTypes.DATE(3), allowNull: true },
        archivedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'shortlists', modelName: 'Shortlist' },
    );
  }
}

export class ShortlistItem extends Model<InferAttributes<ShortlistItem>, InferCreationAttributes<ShortlistItem>> {
  declare id: CreationOptional<number>;
  declare shortlistId: number;
  declare recipeId: number;
  declare position: number;
  declare reason: string;
  /** The recipe version sent for review; null while the shortlist is a draft. */
  declare snapshot: CreationOptional<RecipeSnapshot | null>;

  static initModel(sequelize: Sequelize) {
    ShortlistItem.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        shortlistId: { type: DataTypes.INTEGER, allowNull: false },
        recipeId: { type: DataTypes.INTEGER, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        snapshot: { type: DataTypes.JSON, allowNull: true },
      },
      { sequelize, tableName: 'shortlist_items', modelName: 'ShortlistItem', timestamps: false },
    );
  }
}

/** One status change, kept for ever: the shortlist's history. */
export class ShortlistEvent extends Model<InferAttributes<ShortlistEvent>, InferCreationAttributes<ShortlistEvent>> {
  declare id: CreationOptional<number>;
  declare shortlistId: number;
  declare fromStatus: ShortlistStatus | null;
  declare toStatus: ShortlistStatus;
  declare actorId: number | null;
  declare comment: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShortlistEvent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        shortlistId: { type: DataTypes.INTEGER, allowNull: false },
        fromStatus: { type: DataTypes.ENUM(...SHORTLIST_STATUSES), allowNull: true },
        toStatus: { type: DataTypes.ENUM(...SHORTLIST_STATUSES), allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        comment: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'shortlist_events', modelName: 'ShortlistEvent', updatedAt: false },
    );
  }
}
