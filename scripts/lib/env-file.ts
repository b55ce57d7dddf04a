import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseEnv } from 'node:util';

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

/** Reads the file's settings (Node's own .env parser) into process.env without overriding what the caller already set. */
export function loadEnvFile(path: string) {
  for (const [name, value] of Object.entries(parseEnv(readFileSync(path, 'utf8')))) {
    if (process.env[name] === undefined) process.env[name] = value;
  }
}
