import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ensureDebianPackage } from './debian';

export interface MariaInstance {
  name: string;
  dataDir: string;
  socket: string;
  pidFile: string;
  logFile: string;
  port: number;
}

/** Where an instance keeps its files: everything under .data/<name>, git-ignored. */
export function mariaInstance(root: string, name: string, port: number): MariaInstance {
  const base = resolve(root, '.data');
  return {
    name,
    dataDir: join(base, name),
    socket: join(base, `${name}.sock`),
    pidFile: join(base, `${name}.pid`),
    logFile: join(base, `${name}.log`),
    port,
  };
}

export function ensureMariaInstalled() {
  ensureDebianPackage('mariadbd', 'mariadb-server', ['/usr/sbin/mariadbd']);
}

const bin = (name: string) => (existsSync(`/usr/sbin/${name}`) ? `/usr/sbin/${name}` : existsSync(`/usr/bin/${name}`) ? `/usr/bin/${name}` : name);

// Every mariadb* command takes --no-defaults first, or it reads Debian's /etc/mysql/my.cnf.
function admin(instance: MariaInstance, ...args: string[]) {
  return spawnSync(bin('mariadb-admin'), ['--no-defaults', `--socket=${instance.socket}`, '-uroot', '--connect-timeout=2', ...args], { encoding: 'utf8' });
}

export function isRunning(instance: MariaInstance): boolean {
  return existsSync(instance.socket) && admin(instance, 'ping').status === 0;
}

/** Creates the data folder once; an interrupted init is never mistaken for a finished one. */
function initialise(instance: MariaInstance) {
  if (existsSync(join(instance.dataDir, 'mysql'))) return;
  const staging = `${instance.dataDir}.tmp`;
  rmSync(staging, { recursive: true, force: true });
  mkdirSync(staging, { recursive: true });
  const result = spawnSync(
    bin('mariadb-install-db'),
    ['--no-defaults', `--datadir=${staging}`, '--user=root', '--auth-root-authentication-method=normal', '--skip-test-db'],
    { encoding: 'utf8' },
  );
  if (result.status !== 0) throw new Error(`mariadb-install-db failed:\n${result.stdout}\n${result.stderr}`);
  rmSync(instance.dataDir, { recursive: true, force: true });
  renameSync(staging, instance.dataDir);
}

/**
 * Starts the instance on 127.0.0.1 unless it already answers, and waits until it does.
 * Returns whether this call started it (and so should stop it).
 */
export async function startMaria(instance: MariaInstance, timeoutMs = 60_000): Promise<{ startedHere: boolean }> {
  ensureMariaInstalled();
  mkdirSync(resolve(instance.dataDir, '..'), { recursive: true });
  if (isRunning(instance)) return { startedHere: false };
  initialise(instance);
  const child = spawn(
    bin('mariadbd'),
    [
      '--no-defaults',
      `--datadir=${instance.dataDir}`,
      `--socket=${instance.socket}`,
      `--pid-file=${instance.pidFile}`,
      `--port=${instance.port}`,
      '--bind-address=127.0.0.1',
      '--user=root',
      `--log-error=${instance.logFile}`,
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      '--innodb-buffer-pool-size=128M',
      '--max-connections=300',
      '--skip-name-resolve',
    ],
    // Its own process group: Ctrl-C in the terminal reaches our script, which then shuts
    // the database down in order, instead of killing it mid-write.
    { detached: true, stdio: 'ignore' },
  );
  let exited: number | null = null;
  child.once('exit', (code) => (exited = code ?? -1));
  child.unref();
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (exited !== null) throw new Error(`mariadbd exited (code ${exited}); last log lines:\n${tail(instance.logFile)}`);
    if (isRunning(instance)) return { startedHere: true };
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`mariadbd did not answer within ${timeoutMs / 1000} s; last log lines:\n${tail(instance.logFile)}`);
}

export async function stopMaria(instance: MariaInstance) {
  if (!isRunning(instance)) return;
  admin(instance, 'shutdown');
  const deadline = Date.now() + 30_000;
  while (existsSync(instance.pidFile) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 100));
}

/** Runs SQL as the instance's root user over the socket. */
export function rootSql(instance: MariaInstance, sql: string): string {
  const result = spawnSync(bin('mariadb'), ['--no-defaults', `--socket=${instance.socket}`, '-uroot', '--batch', '--skip-column-names', '-e', sql], {
    encoding: 'utf8',
  });
  if (result.status !== 0) throw new Error(`SQL failed: ${result.stderr.trim()}`);
  return result.stdout;
}

const quote = (value: string) => `'${value.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

/** Creates (or keeps) a database and an application user that may use only databases with its prefix. */
export function ensureDatabase(instance: MariaInstance, input: { databases: string[]; user: string; password: string }) {
  const grants = input.databases.map((db) => `GRANT ALL PRIVILEGES ON \`${db}\`.* TO ${quote(input.user)}@'127.0.0.1';`).join('\n');
  rootSql(
    instance,
    [
      ...input.databases.map((db) => `CREATE DATABASE IF NOT EXISTS \`${db}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`),
      `CREATE USER IF NOT EXISTS ${quote(input.user)}@'127.0.0.1' IDENTIFIED BY ${quote(input.password)};`,
      `ALTER USER ${quote(input.user)}@'127.0.0.1' IDENTIFIED BY ${quote(input.password)};`,
      grants,
      'FLUSH PRIVILEGES;',
    ].join('\n'),
  );
}

export function dropDatabases(instance: MariaInstance, databases: string[]) {
  rootSql(instance, databases.map((db) => `DROP DATABASE IF EXISTS \`${db}\`;`).join('\n'));
}

function tail(file: string, lines = 15) {
  try {
    return readFileSync(file, 'utf8').trim().split('\n').slice(-lines).join('\n');
  } catch {
    return '(no log)';
  }
}
