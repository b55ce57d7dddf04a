import { gzipSync } from 'node:zlib';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/**
 * The JavaScript a first visit downloads before anything else: the entry script and every
 * module it preloads, as index.html names them, gzipped at the default level.
 */
export function initialJavaScript(distDir: string) {
  const html = readFileSync(join(distDir, 'index.html'), 'utf8');
  const files = [...html.matchAll(/(?:src|href)="(\/assets\/[^"]+\.js)"/g)].map((m) => m[1]);
  const unique = [...new Set(files)];
  const sizes = unique.map((file) => {
    const bytes = readFileSync(join(distDir, file));
    return { file, bytes: bytes.length, gzip: gzipSync(bytes).length };
  });
  return { files: sizes, gzipTotal: sizes.reduce((a, s) => a + s.gzip, 0), rawTotal: sizes.reduce((a, s) => a + s.bytes, 0) };
}
