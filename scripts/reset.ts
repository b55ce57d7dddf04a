import { rmSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureEnvFile, loadEnvFile } from './lib/env-file';
import { isRunning, mariaInstance, stopMaria } from './lib/mariadb';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');

/**
 * npm run db:reset -- --yes: stops the private database and deletes the demo installation's
 * data (database files and attachments), so the next npm start seeds the demo afresh.
 * .env stays, so the secrets and settings stay too.
 */
async function main() {
  if (!process.argv.includes('--yes')) {
    console.log('This deletes every record and attachment of this installation (.data/mariadb, .data/files).');
    console.log('Run again as: npm run db:reset -- --yes');
    process.exit(1);
  }
  loadEnvFile(ensureEnvFile(root));
  const instance = mariaInstance(root, 'mariadb', Number(process.env.DB_PORT ?? 3391));
  if (isRunning(instance)) await stopMaria(instance);
  rmSync(instance.dataDir, { recursive: true, force: true });
  rmSync(join(root, process.env.DATA_DIR ?? '.data/files'), { recursive: true, force: true });
  console.log('gelwright: data deleted; the next npm start creates a fresh demo installation.');
}

main().catch((error) => {
  console.error(`gelwright: ${error.message}`);
  process.exit(1);
});
