import { DataTypes, type QueryInterface } from 'sequelize';

/** Users, their one-time tokens (invitations, password resets), the audit trail, the outbox, installation facts. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.ENUM('admin', 'manager', 'formulator', 'scientist', 'viewer'), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    last_sign_in_at: { type: DataTypes.DATE(3), allowNull: true },
    invited_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });

  await qi.createTable('user_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    purpose: { type: DataTypes.ENUM('invitation', 'reset'), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    used_at: { type: DataTypes.DATE(3), allowNull: true },
    created_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('user_tokens', ['user_id', 'purpose']);

  await qi.createTable('audit_events', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    actor_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    action: { type: DataTypes.STRING(64), allowNull: false },
    entity_type: { type: DataTypes.STRING(40), allowNull: false },
    entity_id: { type: DataTypes.STRING(64), allowNull: true },
    details: { type: DataTypes.JSON, allowNull: true },
    ip: { type: DataTypes.STRING(64), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('audit_events', ['entity_type', 'entity_id']);
  await qi.addIndex('audit_events', ['action']);
  await qi.addIndex('audit_events', ['created_at']);

  await qi.createTable('outbox_messages', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    message_id: { type: DataTypes.STRING(255), allowNull: true },
    sender: { type: DataTypes.STRING(320), allowNull: false },
    recipients: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.STRING(500), allowNull: false },
    text_body: { type: DataTypes.TEXT('medium'), allowNull: true },
    html_body: { type: DataTypes.TEXT('medium'), allowNull: true },
    transport: { type: DataTypes.ENUM('catcher', 'relay'), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('outbox_messages', ['created_at']);

  // Small installation facts, e.g. that the demo scenario was seeded.
  await qi.createTable('app_meta', {
    name: { type: DataTypes.STRING(64), primaryKey: true },
    value: { type: DataTypes.TEXT, allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('app_meta');
  await qi.dropTable('outbox_messages');
  await qi.dropTable('audit_events');
  await qi.dropTable('user_tokens');
  await qi.dropTable('users');
}
