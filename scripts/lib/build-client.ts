import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';

const INPUTS = ['src', 'shared', 'index.html', 'public', 'vite.config.ts', 'tailwind.config.js', 'package-lock.json'];

function fingerprint(root: string): string {
  const hash = createHash('sha256');
  const visit = (path: string) => {
    if (!existsSync(path)) return;
    const stat = statSync(path);
    if (stat.isDirectory()) {
      for (const entry of readdirSync(path).sort()) visit(join(path, entry));
    } else if (!path.endsWith('.test.ts')) {
      hash.update(relative(root, path)).update(readFileSync(path));
    }
  };
  for (const input of INPUTS) visit(join(root, input));
  return hash.digest('hex');
}

/**
 * Builds the client with Vite unless dist/ was built from exactly these sources. A lock folder
 * keeps two runs on one machine (npm start and npm test, say) from building over each other.
 */
export function buildClientIfStale(root: string, outDir = 'dist') {
  const lock = join(root, `.${outDir.replace(/\W/g, '_')}-build.lock`);
  const deadline = Date.now() + 180_000;
  for (;;) {
    try {
      mkdirSync(lock);
      break;
    } catch {
      // A lock older than three minutes belongs to a build that died.
      if (existsSync(lock) && Date.now() - statSync(lock).mtimeMs > 180_000) rmSync(lock, { recursive: true, force: true });
      if (Date.now() > deadline) throw new Error(`another client build holds ${lock}; remove it if no build is running`);
      Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 250);
    }
  }
  try {
    return buildUnlocked(root, outDir);
  } finally {
    rmSync(lock, { recursive: true, force: true });
  }
}

function buildUnlocked(root: string, outDir: string) {
  const stamp = join(root, outDir, '.source-sha256');
  const wanted = fingerprint(root);
  if (existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === wanted) return false;
  console.log('gelwright: building the client (vite build) …');
  const result = spawnSync(join(root, 'node_modules', '.bin', 'vite'), ['build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], {
    cwd: root,
    stdio: ['ignore', 'inherit', 'inherit'],
    // Always a production build: Vite would otherwise follow NODE_ENV (test during npm test)
    // and ship React's development build.
    env: { ...process.env, NODE_ENV: 'production' },
  });
  if (result.status !== 0) throw new Error('vite build failed; see the messages above');
  writeFileSync(stamp, wanted + '\n');
  return true;
}
