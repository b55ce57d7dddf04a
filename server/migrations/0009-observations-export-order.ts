import type { QueryInterface } from 'sequelize';

/**
 * The bench-log export reads a programme's observations a page at a time in (mixed_at, id)
 * order; this index lets each page start where the last ended instead of sorting the programme.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addIndex('observations', ['programme_id', 'mixed_at', 'id'], { name: 'observations_programme_mixed' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('observations', 'observations_programme_mixed');
}
