import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A counter per user that every session token carries. Signing out, a password set through a
 * link, deactivation and a role change move it on, so every session issued before stops working
 * on its next request (the session lookup compares the two).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('users', 'session_version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('users', 'session_version');
}
