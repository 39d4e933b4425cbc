/**
 * Timings of the second-order tools (invented surfaces, for timing only; prints medians, asserts
 * nothing): the exact box search over 3^k faces, the ridge table, the desirability search, and
 * the properties of a central composite design. Run: npx tsx test/bench/second-order.bench.ts
 */
import { centralComposite } from '../../src/core/design/central-composite.ts';
import { boxExtreme } from '../../src/core/optimum/box-optimum.ts';
import { maximizeDesirability } from '../../src/core/optimum/desirability-search.ts';
import { quadraticSurface } from '../../src/core/optimum/quadratic-surface.ts';
import { ridgeAnalysis } from '../../src/core/optimum/ridge-analysis.ts';
import { syntheticModel } from '../core/optimum/helpers.ts';
import { fmtMs, medianMs } from './timing.ts';

const rows: [string, number][] = [];
for (const k of [2, 4, 6, 8]) {
  const s = quadraticSurface(syntheticModel(k, k));
  rows.push([`box optimum, exact over 3^${k} faces`, medianMs(() => boxExtreme(s, 'max'), { rounds: 11, warmup: 2 })]);
}
const m3 = syntheticModel(3, 1);
rows.push(['ridge table, 3 factors, 17 radii', medianMs(() => ridgeAnalysis(m3, 'max', 1.7), { rounds: 11 })]);
const two = [syntheticModel(3, 2), { ...syntheticModel(3, 3), response: 'Y2' }];
const specs = [
  { name: 'Y', goal: 'max' as const, low: -5, high: 5 },
  { name: 'Y2', goal: 'min' as const, low: -5, high: 5 },
];
rows.push(['desirability search, 2 responses, 3 factors', medianMs(() => maximizeDesirability(two, specs), { rounds: 11, warmup: 2 })]);
const f8 = Array.from({ length: 8 }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 1 }));
rows.push(['central composite design + properties, 8 factors', medianMs(() => centralComposite({ factors: f8, seed: 1 }), { rounds: 5, warmup: 1 })]);
const w = Math.max(...rows.map(([n]) => n.length));
for (const [n, ms] of rows) console.log(`${n.padEnd(w)}  median ${fmtMs(ms)}`);
