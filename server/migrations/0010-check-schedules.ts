import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A recipe's check schedule: the ages (whole days after mixing) at which the bench looks at each
 * sample again. Kept in its own table rather than on `recipes`: a schedule is bench practice, not
 * composition, so changing it must not make a new recipe version or show as a change on a shortlist.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('check_schedules', {
    recipe_id: { type: DataTypes.INTEGER, primaryKey: true, references: { model: 'recipes', key: 'id' } },
    ages_days: { type: DataTypes.JSON, allowNull: false },
    updated_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('check_schedules');
}
