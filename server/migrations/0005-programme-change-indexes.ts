import type { QueryInterface } from 'sequelize';

/**
 * Indexes that let the map overlay ask "has anything in this programme changed?" with a few
 * index lookups (latest id and latest update of its recipes and observations).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addIndex('recipes', ['programme_id', 'updated_at'], { name: 'recipes_programme_updated' });
  await qi.addIndex('observations', ['programme_id', 'updated_at'], { name: 'observations_programme_updated' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('observations', 'observations_programme_updated');
  await qi.removeIndex('recipes', 'recipes_programme_updated');
}
