import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
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

/** Builds the client with Vite unless dist/ was built from exactly these sources. */
export function buildClientIfStale(root: string, outDir = 'dist') {
  const stamp = join(root, outDir, '.source-sha256');
  const wanted = fingerprint(root);
  if (existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === wanted) return false;
  console.log('gelwright: building the client (vite build) …');
  const result = spawnSync(join(root, 'node_modules', '.bin', 'vite'), ['build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], {
    cwd: root,
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  if (result.status !== 0) throw new Error('vite build failed; see the messages above');
  writeFileSync(stamp, wanted + '\n');
  return true;
}
