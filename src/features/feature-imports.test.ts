import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const FEATURES = join(SRC, 'features');

/** Every module a source text imports or re-exports (type-only ones too), and every dynamic import('…'). */
function specifiersOf(text: string): string[] {
  return [
    ...text.matchAll(/^\s*(?:import|export)\s[^;]*?\sfrom\s*['"]([^'"]+)['"]/gm),
    ...text.matchAll(/^\s*import\s*['"]([^'"]+)['"]/gm),
    ...text.matchAll(/import\(\s*['"]([^'"]+)['"]\s*\)/g),
  ].map((match) => match[1]);
}

/** The feature a path under src/features belongs to, and the rest of the path inside it. */
function featurePath(path: string): { feature: string; inside: string } | null {
  const rel = relative(FEATURES, path);
  if (rel.startsWith('..')) return null;
  const [feature, ...rest] = rel.split(sep);
  return { feature, inside: rest.join('/') };
}

/** Where a specifier written in `file` points, as an absolute path without extension (null: a package or shared/). */
function target(file: string, specifier: string): string | null {
  if (specifier.startsWith('@/')) return join(SRC, specifier.slice(2));
  if (specifier.startsWith('.')) return resolve(dirname(file), specifier);
  return null;
}

/** `file imports specifier` for each import of another feature other than its index.ts. */
function reachesInto(file: string, text: string): string[] {
  const own = featurePath(file);
  if (!own || own.inside === '') return [];
  return specifiersOf(text).filter((specifier) => {
    const path = target(file, specifier);
    const other = path === null ? null : featurePath(path);
    return other !== null && other.feature !== own.feature && other.inside !== '' && other.inside !== 'index';
  });
}

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { recursive: true, encoding: 'utf8' })
    .filter((name) => /\.tsx?$/.test(name))
    .map((name) => join(folder, name));
}

describe('features use each other only through index.ts', () => {
  it('finds an import of another feature’s file, with the alias or a relative path, and lets its index through', () => {
    const file = join(FEATURES, 'planner', 'components', 'plan-form.tsx');
    const text = [
      "import { MaterialOptions } from '@/features/library/components/material-options';",
      "import type { RecipeFilters } from '../../recipes/api/recipe-keys';",
      "export { mapPointKeys } from '@/features/map/api/get-map-points';",
      "const lazy = () => import('@/features/bench/components/bench-screen');",
      "import { useLiveMaterials } from '@/features/library';",
      "import { useRecipes } from '@/features/recipes/index';",
      "import { planKeys } from '../api/plan-keys';",
      "import { Button } from '@/components/ui/button';",
    ].join('\n');
    expect(reachesInto(file, text)).toEqual([
      '@/features/library/components/material-options',
      '../../recipes/api/recipe-keys',
      '@/features/map/api/get-map-points',
      '@/features/bench/components/bench-screen',
    ]);
  });

  it('no file under src/features/<a>/ imports from src/features/<b>/ other than <b>/index.ts', () => {
    const files = sourceFiles(FEATURES);
    expect(files.length).toBeGreaterThan(0);
    const found = files.flatMap((file) => reachesInto(file, readFileSync(file, 'utf8')).map((specifier) => `${relative(SRC, file)} imports ${specifier}`));
    expect(found).toEqual([]);
  });
});
