import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

const GENERATED = ['DB_PASSWORD', 'SESSION_SECRET'];

/**
 * Makes sure .env exists: on first run it is .env.example with the blank secrets filled
 * with random values. An existing .env is only completed, never overwritten.
 */
export function ensureEnvFile(root: string): string {
  const path = join(root, '.env');
  const source = existsSync(path) ? readFileSync(path, 'utf8') : readFileSync(join(root, '.env.example'), 'utf8');
  let changed = !existsSync(path);
  const filled = source.replace(/^([A-Z_]+)=\s*$/gm, (line, name: string) => {
    if (!GENERATED.includes(name)) return line;
    changed = true;
    return `${name}=${randomBytes(24).toString('base64url')}`;
  });
  if (changed) writeFileSync(path, filled, { mode: 0o600 });
  return path;
}

/** Reads KEY=value lines into process.env without overriding what the caller already set. */
export function loadEnvFile(path: string) {
  for (const line of readFileSync(path, 'utf8').split('\n')) {
    const match = /^([A-Z0-9_]+)=(.*)$/.exec(line.trim());
    if (match && process.env[match[1]] === undefined) process.env[match[1]] = match[2];
  }
}
