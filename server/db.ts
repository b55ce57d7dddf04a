import { Sequelize } from 'sequelize';
import type { Config } from './config';
import { initModels } from './models';

/**
 * One Sequelize instance per process, talking to MariaDB over TCP. The pool re-opens
 * connections by itself when the server comes back after a restart or a crash.
 */
export function createSequelize(config: Pick<Config, 'DB_HOST' | 'DB_PORT' | 'DB_NAME' | 'DB_USER' | 'DB_PASSWORD' | 'DB_POOL_MAX'>) {
  const sequelize = new Sequelize(config.DB_NAME, config.DB_USER, config.DB_PASSWORD, {
    host: config.DB_HOST,
    port: config.DB_PORT,
    dialect: 'mariadb',
    logging: false,
    timezone: '+00:00',
    pool: { max: config.DB_POOL_MAX, min: 0, acquire: 4000, idle: 10_000, evict: 1000 },
    dialectOptions: {
      connectTimeout: 3000,
      // Fail fast while the database is down, so the API can answer 503 instead of hanging.
      socketTimeout: 20_000,
    },
    define: { underscored: true, timestamps: true },
  });
  initModels(sequelize);
  return sequelize;
}
