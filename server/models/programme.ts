import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { ATTRACTION_SOURCES, GOAL_STATES, type AttractionSource, type GoalState } from '../../shared/states';

/** A product line the team works on; recipes, observations and shortlists belong to one. */
export class Programme extends Model<InferAttributes<Programme>, InferCreationAttributes<Programme>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare goalState: GoalState;
  declare attractionSource: AttractionSource;
  declare codePrefix: string;
  declare nextCodeNumber: CreationOptional<number>;
  declare notes: string | null;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Programme.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        goalState: { type: DataTypes.ENUM(...GOAL_STATES), allowNull: false },
        attractionSource: { type: DataTypes.ENUM(...ATTRACTION_SOURCES), allowNull: false },
        codePrefix: { type: DataTypes.STRING(5), allowNull: false, unique: true },
        nextCodeNumber: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        notes: { type: DataTypes.TEXT, allowNull: true },
        archivedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'programmes', modelName: 'Programme' },
    );
  }
}
