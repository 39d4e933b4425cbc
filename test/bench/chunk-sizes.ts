/**
 * The built app's JavaScript by chunk: each chunk's gzip size, the screens and packages it holds,
 * and the first screen's total (the entry, the studies screen and every chunk they import
 * statically, which the browser needs before the studies list can show). Builds the app with
 * the project's own vite.config.ts into memory (nothing written), so the chunk graph is the
 * bundler's own, not read back from minified text. Prints figures; without --check it asserts nothing.
 *   npx tsx test/bench/chunk-sizes.ts   (called by npm run bench:web)
 *   npx tsx test/bench/chunk-sizes.ts --check   (called by npm test after the build: a size, not
 *   a time, so it exits 1 when the first screen is over its budget)
 * Gzip at level 9, as static hosts that precompress their files commonly do ("common practice");
 * the bundler's own report uses its default level and may differ by a few hundred bytes.
 */
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { build, type Rollup } from 'vite';

/** The first screen's budget from the performance issue (KB of gzipped JavaScript). */
const FIRST_SCREEN_BUDGET_KB = 60;
/** The module of the screen the app opens on ('#/'). */
const FIRST_SCREEN_MODULE = 'src/ui/screens/studies/index.tsx';
/** The module that adds the demo study, loaded only on a device with no study (the first visit). */
const SEED_MODULE = 'src/ui/demo/demo-study.ts';

const repo = fileURLToPath(new URL('../..', import.meta.url));
const result = await build({ root: undefined, configFile: `${repo}vite.config.ts`, logLevel: 'silent', build: { write: false } });
const outputs = (Array.isArray(result) ? result : [result]) as Rollup.RollupOutput[];
const chunks = outputs.flatMap((o) => o.output).filter((c): c is Rollup.OutputChunk => c.type === 'chunk');
const css = outputs.flatMap((o) => o.output).filter((a): a is Rollup.OutputAsset => a.type === 'asset' && a.fileName.endsWith('.css'));
const byFile = new Map(chunks.map((c) => [c.fileName, c]));
const kb = (bytes: number) => bytes / 1024;
const gz = new Map(chunks.map((c) => [c.fileName, gzipSync(c.code, { level: 9 }).length]));

/** What a chunk holds, in words: the screens whose modules it carries and the packages bundled in it. */
function contents(c: Rollup.OutputChunk): string {
  const ids = c.moduleIds.map((id) => id.replaceAll('\\', '/'));
  const screens = [...new Set(ids.flatMap((id) => /\/src\/ui\/screens\/([^/]+)\//.exec(id)?.[1] ?? []))];
  const packages = [...new Set(ids.flatMap((id) => /\/node_modules\/((?:@[^/]+\/)?[^/]+)\//.exec(id)?.[1] ?? []))];
  const own = ids.filter((id) => id.includes('/src/')).length;
  const parts = [];
  if (screens.length) parts.push(`screens: ${screens.join(', ')}`);
  if (packages.length) parts.push(`packages: ${packages.join(', ')}`);
  parts.push(`${own} own modules`);
  return parts.join('; ');
}

/** A chunk and everything it imports statically (what must arrive before it runs). */
function staticClosure(start: readonly Rollup.OutputChunk[]): Set<string> {
  const seen = new Set<string>();
  const todo = start.map((c) => c.fileName);
  while (todo.length > 0) {
    const f = todo.pop()!;
    if (seen.has(f)) continue;
    seen.add(f);
    for (const i of byFile.get(f)?.imports ?? []) todo.push(i);
  }
  return seen;
}

const holding = (module: string) => chunks.filter((c) => c.moduleIds.some((id) => id.replaceAll('\\', '/').endsWith(module)));
const entry = chunks.filter((c) => c.isEntry);
const firstScreenChunk = holding(FIRST_SCREEN_MODULE);
const seedChunk = holding(SEED_MODULE);
if (entry.length !== 1 || firstScreenChunk.length !== 1 || seedChunk.length !== 1) {
  console.error(`chunk sizes: needs one entry chunk, one chunk holding ${FIRST_SCREEN_MODULE} and one holding ${SEED_MODULE}, got ${entry.length}, ${firstScreenChunk.length} and ${seedChunk.length}`);
  process.exit(2);
}
const first = staticClosure([...entry, ...firstScreenChunk]);
const sum = (files: Iterable<string>) => [...files].reduce((s, f) => s + gz.get(f)!, 0);
const firstTotal = sum(first);
const seedExtra = [...staticClosure(seedChunk)].filter((f) => !first.has(f));
const allTotal = chunks.reduce((s, c) => s + gz.get(c.fileName)!, 0);

const lines = ['JavaScript chunks of the built app (gzip level 9; * = loaded for the first screen)'];
for (const c of [...chunks].sort((a, b) => gz.get(b.fileName)! - gz.get(a.fileName)!)) {
  const mark = first.has(c.fileName) ? '*' : ' ';
  lines.push(`  ${mark} ${kb(gz.get(c.fileName)!).toFixed(1).padStart(6)} KB  ${c.fileName.replace(/^assets\//, '')}  (${contents(c)})`);
}
for (const a of css) {
  const size = gzipSync(typeof a.source === 'string' ? a.source : Buffer.from(a.source), { level: 9 }).length;
  lines.push(`    ${kb(size).toFixed(1).padStart(6)} KB  ${a.fileName.replace(/^assets\//, '')}  (stylesheet, not counted as JavaScript)`);
}
lines.push(`  first screen: ${kb(firstTotal).toFixed(1)} KB of JavaScript in ${first.size} chunk(s) (target at most ${FIRST_SCREEN_BUDGET_KB} KB)${firstTotal > FIRST_SCREEN_BUDGET_KB * 1024 ? ': OVER THE TARGET' : ''}`);
lines.push(`  a device's first visit adds the demo seeding: ${kb(sum(seedExtra)).toFixed(1)} KB in ${seedExtra.length} chunk(s); all chunks: ${kb(allTotal).toFixed(1)} KB in ${chunks.length}`);
console.log(lines.join('\n'));
if (process.argv.includes('--check') && firstTotal > FIRST_SCREEN_BUDGET_KB * 1024) {
  console.error(`first screen budget: ${kb(firstTotal).toFixed(1)} KB of gzipped JavaScript is over ${FIRST_SCREEN_BUDGET_KB} KB; move what the studies screen does not need behind import() (DEVELOPERS.md, Conventions)`);
  process.exit(1);
}
