/** The project's source files, read for the scans that keep wording and tolerances in one place. */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

/** Every .ts and .tsx file under `dir` (relative to the checkout), with its path relative to the checkout. */
export function sourceFiles(dir: string): { path: string; text: string }[] {
  const walk = (d: string): string[] =>
    !existsSync(d)
      ? []
      : readdirSync(d).flatMap((name) => {
          const p = join(d, name);
          return statSync(p).isDirectory() ? walk(p) : /\.(ts|tsx)$/.test(name) ? [p] : [];
        });
  return walk(join(root, dir)).map((p) => ({ path: relative(root, p).split(/[\\/]/).join('/'), text: readFileSync(p, 'utf8') }));
}

/** The code of a TypeScript file without its comments (block and line comments; strings kept). */
export function withoutComments(text: string): string {
  return text.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:'"`])\/\/.*$/gm, '$1');
}
