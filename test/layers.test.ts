import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync, existsSync } from 'node:fs';
import { join, relative, resolve, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');

function files(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? files(p) : /\.(ts|tsx)$/.test(name) ? [p] : [];
  });
}

/** Which top-level layers each layer may import (DEVELOPERS.md, "Architecture"). */
const allowed: Record<string, string[]> = {
  core: ['core'],
  io: ['io', 'core'],
  store: ['store', 'io', 'core'],
  cli: ['cli', 'io', 'core'],
  ui: ['ui', 'store', 'io', 'core'],
};
const runtimePackagesAllowed: Record<string, RegExp> = {
  core: /^$/,
  io: /^(papaparse)$/,
  store: /^(dexie)$/,
  cli: /^(node:.*)$/,
  ui: /^(preact|preact\/.*|@preact\/signals|uplot|uplot\/dist\/uPlot\.min\.css|workbox-window)$/,
};

describe('layers', () => {
  for (const layer of Object.keys(allowed)) {
    it(`src/${layer} imports only ${allowed[layer].join(', ')}`, () => {
      for (const file of files(join(root, 'src', layer))) {
        const text = readFileSync(file, 'utf8');
        for (const m of text.matchAll(/(?:^|\n)\s*(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)) {
          const spec = m[1] ?? m[2];
          if (spec.startsWith('.')) {
            const target = relative(join(root, 'src'), resolve(dirname(file), spec)).split(/[\\/]/)[0];
            expect(allowed[layer], `${relative(root, file)} imports ${spec}`).toContain(target);
          } else {
            expect(spec, `${relative(root, file)} imports the package ${spec}`).toMatch(runtimePackagesAllowed[layer]);
          }
        }
      }
    });
  }

  it('every folder the README names exists', () => {
    const readme = readFileSync(join(root, 'README.md'), 'utf8');
    const named = [...readme.matchAll(/^\| (src\/\w+|sw|public|test) \|/gm)].map((m) => m[1]);
    expect(named.length).toBeGreaterThan(5);
    for (const p of named) expect(existsSync(join(root, p)), p).toBe(true);
  });
});
