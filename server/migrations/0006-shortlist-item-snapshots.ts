import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Recipes count their versions (every edit is a new one), and a shortlist item keeps the
 * version of its recipe that was submitted: composition, derived parameters, prediction, model
 * and calibration. A submitted or approved shortlist shows that version, whatever happens to the
 * recipe afterwards; `snapshot` is null while the shortlist is a draft.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('recipes', 'version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 });
  await qi.addColumn('shortlist_items', 'snapshot', { type: DataTypes.JSON, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('shortlist_items', 'snapshot');
  await qi.removeColumn('recipes', 'version');
}
