import { DataTypes, type QueryInterface } from 'sequelize';

const ref = (table: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model: table, key: 'id' } });

/**
 * Planner runs and the recipes made from them. A plan keeps what was asked (inputs), the
 * physics model version and the calibration it used, and everything it found (outcome), so a
 * manager reviewing a recipe can see where it came from; plan_recipes links each recipe made from
 * a plan to the candidate or proposed experiment it was, once (unique per plan, kind and index).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('plans', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    programme_id: ref('programmes'),
    title: { type: DataTypes.STRING(120), allowNull: false },
    target_state: { type: DataTypes.ENUM('fluid', 'gel', 'glass', 'crystal'), allowNull: false },
    attraction_source: { type: DataTypes.ENUM('depletion', 'salt'), allowNull: false },
    inputs: { type: DataTypes.JSON, allowNull: false },
    model_version: { type: DataTypes.STRING(40), allowNull: false },
    calibration_id: ref('calibrations', true),
    outcome: { type: DataTypes.JSON, allowNull: false },
    candidate_count: { type: DataTypes.INTEGER, allowNull: false },
    feasible: { type: DataTypes.BOOLEAN, allowNull: false },
    created_by: ref('users', true),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('plans', ['programme_id', 'created_at'], { name: 'plans_programme_created' });
  await qi.createTable('plan_recipes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    plan_id: ref('plans'),
    recipe_id: ref('recipes'),
    kind: { type: DataTypes.ENUM('candidate', 'experiment'), allowNull: false },
    item_index: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('plan_recipes', ['plan_id', 'kind', 'item_index'], { unique: true, name: 'plan_recipes_one_per_item' });
  await qi.addIndex('plan_recipes', ['recipe_id'], { name: 'plan_recipes_recipe' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('plan_recipes');
  await qi.dropTable('plans');
}
