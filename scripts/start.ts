import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { loadConfig, ConfigError, type Config } from '../server/config';
import { createSequelize } from '../server/db';
import { startGelwright } from '../server/index';
import { migrateUp } from '../server/migrator';
import { DEMO_USERS, seedDemoIfFirstRun } from '../server/seed/demo';
import { buildClientIfStale } from './lib/build-client';
import { ensureEnvFile, loadEnvFile } from './lib/env-file';
import { ensureDatabase, mariaInstance, startMaria, stopMaria, type MariaInstance } from './lib/mariadb';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');

async function main() {
  loadEnvFile(ensureEnvFile(root));
  const config = loadConfig();

  const instance = mariaInstance(root, 'mariadb', config.DB_PORT);
  const ownDatabase = config.DB_HOST === '127.0.0.1' || config.DB_HOST === 'localhost';
  if (ownDatabase) {
    console.log(`gelwright: MariaDB on 127.0.0.1:${config.DB_PORT}, data in ${instance.dataDir}`);
    await startMaria(instance);
    ensureDatabase(instance, { databases: [config.DB_NAME], user: config.DB_USER, password: config.DB_PASSWORD });
  }

  // The instance under .data/ is the project's own: whoever started it, we stop it on the way out.
  try {
    await prepareAndServe(config, instance, ownDatabase);
  } catch (error) {
    if (ownDatabase) await stopMaria(instance);
    throw error;
  }
}

async function prepareAndServe(config: Config, instance: MariaInstance, ownDatabase: boolean) {
  const sequelize = createSequelize(config);
  const applied = await migrateUp(sequelize);
  if (applied.length) console.log(`gelwright: applied ${applied.length} migration(s): ${applied.map((m) => m.name).join(', ')}`);
  const seeded = await seedDemoIfFirstRun(sequelize, config);
  if (seeded) console.log('gelwright: seeded the demo scenario (first run)');
  await sequelize.close();

  buildClientIfStale(root);

  const running = await startGelwright(config, { clientDir: join(root, 'dist'), migrate: false });
  console.log('');
  console.log(`  Gelwright is running at ${config.PUBLIC_URL}`);
  console.log(config.MAIL_CATCHER ? `  Mail is caught on 127.0.0.1:${config.SMTP_PORT} and filed in Team → Outbox.` : `  Mail goes to ${config.SMTP_HOST}:${config.SMTP_PORT}.`);
  console.log('  Demo sign-ins (change them on a real installation):');
  for (const user of DEMO_USERS) console.log(`    ${user.role.padEnd(10)} ${user.email.padEnd(38)} ${user.password}`);
  console.log('  Press Ctrl-C to stop the server, the mail catcher and the database.');
  console.log('');

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    console.log('\ngelwright: stopping …');
    await running.stop().catch((e: Error) => console.warn(e.message));
    if (ownDatabase) await stopMaria(instance);
    console.log('gelwright: stopped; data kept in .data/');
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error) => {
  console.error(error instanceof ConfigError ? error.message : `gelwright: ${error.message}`);
  process.exit(1);
});
