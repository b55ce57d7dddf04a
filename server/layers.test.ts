import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');

/** Every TypeScript source file below a folder of the repository (tests included). */
function sourceFiles(folder: string): string[] {
  return readdirSync(join(ROOT, folder), { recursive: true, encoding: 'utf8' })
    .filter((name) => name.endsWith('.ts'))
    .map((name) => join(folder, name));
}

/**
 * The modules a file imports, as repository paths: static imports and re-exports (type-only
 * ones too, since they tie the layers as much as values do) and dynamic `import('…')`.
 */
function importsOf(file: string): string[] {
  const text = readFileSync(join(ROOT, file), 'utf8');
  const specifiers = [
    ...text.matchAll(/^\s*(?:import|export)\s[^;]*?\sfrom\s*['"]([^'"]+)['"]/gm),
    ...text.matchAll(/^\s*import\s*['"]([^'"]+)['"]/gm),
    ...text.matchAll(/import\(\s*['"]([^'"]+)['"]\s*\)/g),
  ].map((match) => match[1]);
  return specifiers.filter((s) => s.startsWith('.')).map((s) => relative(ROOT, resolve(ROOT, dirname(file), s)));
}

/** `file imports target` for every import of a file under `from` that reaches into `into`. */
function crossings(from: string, into: string): string[] {
  const files = sourceFiles(from);
  expect(files.length).toBeGreaterThan(0);
  return files.flatMap((file) =>
    importsOf(file)
      .filter((target) => target === into || target.startsWith(`${into}/`))
      .map((target) => `${file} imports ${target}`),
  );
}

describe('server layers: routes → services → models; presenters only shape records', () => {
  it('no file under server/routes imports from server/models (routers call services)', () => {
    expect(crossings('server/routes', 'server/models')).toEqual([]);
  });

  it('no file under server/presenters imports from server/services', () => {
    expect(crossings('server/presenters', 'server/services')).toEqual([]);
  });

  it('no file under server/models imports from routes, http, services or presenters (models are the bottom layer)', () => {
    expect(['server/routes', 'server/http', 'server/services', 'server/presenters'].flatMap((upper) => crossings('server/models', upper))).toEqual([]);
  });

  it('no file under server/services imports from server/presenters (routers present what services return)', () => {
    expect(crossings('server/services', 'server/presenters')).toEqual([]);
  });
});
