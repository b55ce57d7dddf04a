import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Idempotency keys for single writes (recording an observation): the first request with a key
 * claims it under a unique index in its own transaction and stores its answer; a retry with the
 * same key and the same body gets that answer back, with another body a 409. Imports keep the
 * checksum of the file a key was first used with, for the same reason.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('idempotent_requests', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    scope: { type: DataTypes.STRING(60), allowNull: false },
    idempotency_key: { type: DataTypes.STRING(200), allowNull: false },
    request_sha256: { type: DataTypes.CHAR(64), allowNull: false },
    response_status: { type: DataTypes.INTEGER, allowNull: true },
    response_body: { type: DataTypes.JSON, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('idempotent_requests', ['user_id', 'scope', 'idempotency_key'], { unique: true, name: 'idempotent_requests_one_per_key' });
  await qi.addColumn('import_batches', 'content_sha256', { type: DataTypes.CHAR(64), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('import_batches', 'content_sha256');
  await qi.dropTable('idempotent_requests');
}
