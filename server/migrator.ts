import { Umzug, SequelizeStorage } from 'umzug';
import type { Sequelize } from 'sequelize';
import { MIGRATIONS } from './migrations';

/** The schema is created and changed only here, never by sequelize.sync(). */
export function createMigrator(sequelize: Sequelize, logger: Pick<Console, 'info' | 'warn' | 'error'> | undefined = undefined) {
  return new Umzug({
    migrations: MIGRATIONS.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: logger ? { info: () => {}, warn: logger.warn, error: logger.error, debug: () => {} } : undefined,
  });
}

export async function migrateUp(sequelize: Sequelize) {
  const migrator = createMigrator(sequelize, console);
  return migrator.up();
}
