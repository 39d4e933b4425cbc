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

/**
 * Every module a file names: static imports and re-exports (type-only ones included), side-effect
 * imports and dynamic import() calls. Comments are blanked first so an example in a doc comment
 * does not count.
 */
export function importsOf(text: string): string[] {
  const code = text.replace(/\/\*[\s\S]*?\*\//g, (c) => c.replace(/[^\n]/g, ' ')).replace(/(^|[^:'"`\\])\/\/[^\n]*/g, '$1');
  const out: string[] = [];
  for (const m of code.matchAll(/(?:^|\n|;)\s*(?:import|export)\b[^'"`;]*?\bfrom\s*['"]([^'"]+)['"]|(?:^|\n|;)\s*import\s*['"]([^'"]+)['"]|\bimport\(\s*['"]([^'"]+)['"]\s*\)/g)) {
    out.push(m[1] ?? m[2] ?? m[3]);
  }
  return out;
}

/**
 * The import cycles of a graph (file -> files it imports): each strongly connected component with
 * more than one file, or a file importing itself, by Tarjan's algorithm (Tarjan 1972, "Depth-first
 * search and linear graph algorithms", SIAM J. Computing 1(2)). Each cycle is given as its files, sorted.
 */
export function cyclesOf(graph: ReadonlyMap<string, readonly string[]>): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const out: string[][] = [];
  const visit = (v: string) => {
    index.set(v, next);
    low.set(v, next);
    next++;
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const comp: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        comp.push(w);
      } while (w !== v);
      if (comp.length > 1 || (graph.get(v) ?? []).includes(v)) out.push(comp.sort());
    }
  };
  for (const v of [...graph.keys()].sort()) if (!index.has(v)) visit(v);
  return out.sort((a, b) => (a[0] < b[0] ? -1 : 1));
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
  ui: /^(preact|preact\/.*|@preact\/signals|uplot|uplot\/dist\/uPlot\.min\.css|workbox-window|d3-contour)$/,
};

describe('layers', () => {
  for (const layer of Object.keys(allowed)) {
    it(`src/${layer} imports only ${allowed[layer].join(', ')}`, () => {
      for (const file of files(join(root, 'src', layer))) {
        for (const spec of importsOf(readFileSync(file, 'utf8'))) {
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

  it('src has no import cycle, type imports included, within a folder or across folders', () => {
    const all = files(join(root, 'src'));
    const graph = new Map<string, string[]>();
    for (const file of all) {
      const targets = importsOf(readFileSync(file, 'utf8'))
        .filter((s) => s.startsWith('.'))
        .map((s) => relative(root, resolve(dirname(file), s)))
        .filter((t) => /\.(ts|tsx)$/.test(t));
      graph.set(relative(root, file), targets);
    }
    // Every relative import names a file that exists (else the graph would miss an edge).
    for (const [file, targets] of graph) for (const t of targets) expect(graph.has(t), `${file} imports ${t}`).toBe(true);
    expect(graph.size).toBeGreaterThan(100);
    expect(cyclesOf(graph)).toEqual([]);
  });

  it('every folder the README names exists', () => {
    const readme = readFileSync(join(root, 'README.md'), 'utf8');
    const named = [...readme.matchAll(/^\| (src\/\w+|sw|public|test) \|/gm)].map((m) => m[1]);
    expect(named.length).toBeGreaterThan(5);
    for (const p of named) expect(existsSync(join(root, p)), p).toBe(true);
  });
});

describe('the checks themselves', () => {
  it('importsOf finds type-only, multi-line, re-export, side-effect and dynamic imports, not comments', () => {
    const text = [
      "import type { A } from './a.ts';",
      'import {',
      '  b,',
      "  type C,",
      "} from '../b.ts';",
      "export { d } from './d.ts';",
      "export type * from './e.ts';",
      "import './f.css';",
      "const g = await import('./g.ts');",
      "// import { x } from './commented.ts';",
      "/* import { y } from './block.ts'; */",
      "const s = 'from \"./not-an-import.ts\"';",
    ].join('\n');
    expect(importsOf(text)).toEqual(['./a.ts', '../b.ts', './d.ts', './e.ts', './f.css', './g.ts']);
  });

  it('cyclesOf finds a two-file cycle, a longer one, a self-import, and none in a tree', () => {
    // A small graph worked by hand: a <-> b; c -> d -> e -> c; f -> f; g -> a (outside any cycle).
    const g = new Map<string, string[]>([
      ['a', ['b']],
      ['b', ['a']],
      ['c', ['d']],
      ['d', ['e']],
      ['e', ['c']],
      ['f', ['f']],
      ['g', ['a', 'c']],
    ]);
    expect(cyclesOf(g)).toEqual([['a', 'b'], ['c', 'd', 'e'], ['f']]);
    expect(cyclesOf(new Map([['x', ['y', 'z']], ['y', ['z']], ['z', []]]))).toEqual([]);
    expect(cyclesOf(new Map())).toEqual([]);
  });
});
