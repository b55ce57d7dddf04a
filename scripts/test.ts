import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { loadConfig } from '../server/config';
import { createSequelize } from '../server/db';
import { migrateUp } from '../server/migrator';
import { buildClientIfStale } from './lib/build-client';
import { ensureDebianPackage } from './lib/debian';
import { dropDatabases, ensureDatabase, mariaInstance, startMaria, stopMaria } from './lib/mariadb';
import { TEST_WORKERS, testDatabases, testEnvironment } from './lib/test-env';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');

/**
 * npm test: a private MariaDB on its own port with fresh databases (one per worker),
 * migrations, the built client, Chromium; then every vitest project (unit, api, browser),
 * and a closing "N passed, N failed" line read from vitest's JSON report.
 */
async function main(): Promise<number> {
  const env = testEnvironment();
  Object.assign(process.env, env);
  ensureDebianPackage('chromium', 'chromium', ['/usr/bin/chromium']);
  // pdftotext and pdfinfo read the printed shortlist dossier back in its browser test.
  ensureDebianPackage('pdftotext', 'poppler-utils', ['/usr/bin/pdftotext']);

  // Each run has its own instance (own port, own data folder), so two runs never share a database.
  removeStaleTestInstances();
  const port = await freePort();
  env.DB_PORT = String(port);
  process.env.DB_PORT = env.DB_PORT;
  const instance = mariaInstance(root, `mariadb-test-${process.pid}`, port);
  console.log(`test: MariaDB on 127.0.0.1:${port} (data in ${instance.dataDir})`);
  await startMaria(instance);
  try {
    const databases = testDatabases();
    dropDatabases(instance, databases);
    ensureDatabase(instance, { databases, user: env.DB_USER, password: env.DB_PASSWORD });
    for (const name of databases) {
      const sequelize = createSequelize(loadConfig({ ...process.env, DB_NAME: name }));
      await migrateUp(sequelize);
      await sequelize.close();
    }
    console.log(`test: migrated ${databases.join(', ')}`);
    env.DATA_DIR = `.data/test-files-${process.pid}`;
    process.env.DATA_DIR = env.DATA_DIR;
    rmSync(join(root, env.DATA_DIR), { recursive: true, force: true });
    buildClientIfStale(root);
    return await runVitest(process.argv.slice(2));
  } finally {
    await stopMaria(instance);
    for (const path of [instance.dataDir, instance.logFile, instance.socket, instance.pidFile, join(root, env.DATA_DIR)]) rmSync(path, { recursive: true, force: true });
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

/** Removes the data folders of test runs whose process is gone (killed before cleaning up). */
function removeStaleTestInstances() {
  const base = join(root, '.data');
  if (!existsSync(base)) return;
  for (const name of readdirSync(base)) {
    const match = /^mariadb-test-(\d+)(\.tmp)?$/.exec(name);
    if (!match) continue;
    const pid = Number(match[1]);
    let alive = true;
    try {
      process.kill(pid, 0);
    } catch {
      alive = false;
    }
    if (!alive) for (const suffix of ['', '.tmp', '.log', '.sock', '.pid']) rmSync(join(base, `mariadb-test-${pid}${suffix}`), { recursive: true, force: true });
  }
}

function runVitest(extraArgs: string[]): Promise<number> {
  // One report per run, so runs started at the same time never read each other's results.
  const report = join(root, 'test-results', `vitest-${process.pid}.json`);
  mkdirSync(dirname(report), { recursive: true });
  rmSync(report, { force: true });
  const args = ['run', `--maxWorkers=${TEST_WORKERS}`, '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extraArgs];
  return new Promise((resolve) => {
    const child = spawn(join(root, 'node_modules', '.bin', 'vitest'), args, { cwd: root, stdio: 'inherit', env: process.env });
    child.on('exit', (code) => {
      const summary = readSummary(report);
      console.log('');
      if (!summary) {
        console.log('0 passed, 1 failed (vitest wrote no report)');
        return resolve(1);
      }
      console.log(`${summary.passed} passed, ${summary.failed} failed`);
      resolve(summary.failed > 0 || summary.passed === 0 || code !== 0 ? 1 : 0);
    });
  });
}

function readSummary(path: string): { passed: number; failed: number } | null {
  if (!existsSync(path)) return null;
  const json = JSON.parse(readFileSync(path, 'utf8')) as { numPassedTests: number; numFailedTests: number; testResults?: { status: string }[] };
  // A file that failed to load counts as a failure even though it ran no test.
  const brokenFiles = (json.testResults ?? []).filter((f) => f.status === 'failed').length;
  return { passed: json.numPassedTests, failed: Math.max(json.numFailedTests, json.numFailedTests === 0 ? brokenFiles : 0) };
}

main().then(
  (code) => process.exit(code),
  (error) => {
    console.error(`test: ${error instanceof Error ? error.message : error}`);
    console.log('0 passed, 1 failed');
    process.exit(1);
  },
);
