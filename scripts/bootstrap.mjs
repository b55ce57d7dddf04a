// The only plain-JavaScript file in the project: it runs before node_modules exists.
// It makes the npm dependencies match package-lock.json, then hands over to the
// TypeScript command named on the command line (scripts/<command>.ts, run by tsx).
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { spawn, spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const commands = {
  start: 'scripts/start.ts',
  test: 'scripts/test.ts',
  reset: 'scripts/reset.ts',
  bench: 'scripts/bench/index.ts',
  'bench:physics': 'scripts/bench/physics.ts',
  'test:faults': 'scripts/test-faults.ts',
};

const command = process.argv[2];
if (!commands[command]) {
  console.error(`bootstrap: unknown command "${command}"; expected one of ${Object.keys(commands).join(', ')}`);
  process.exit(2);
}

ensureDependencies();

const tsx = join(root, 'node_modules', '.bin', 'tsx');
const child = spawn(tsx, [join(root, commands[command]), ...process.argv.slice(3)], {
  cwd: root,
  stdio: 'inherit',
});
// Ctrl-C reaches the whole foreground process group, the child included; the child
// shuts its services down and exits, and we exit with its code.
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => {});
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));

/** Runs `npm ci` when node_modules is missing or was installed from another lock file. */
function ensureDependencies() {
  const lock = join(root, 'package-lock.json');
  const stamp = join(root, 'node_modules', '.gelwright-lock-sha256');
  const wanted = createHash('sha256').update(readFileSync(lock)).digest('hex');
  const installed = existsSync(stamp) ? readFileSync(stamp, 'utf8').trim() : '';
  if (installed === wanted && existsSync(join(root, 'node_modules', '.bin', 'tsx'))) return;
  console.log('gelwright: installing npm dependencies (npm ci) …');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error('gelwright: npm ci failed; see the messages above.');
    process.exit(result.status ?? 1);
  }
  writeFileSync(stamp, wanted + '\n');
}
