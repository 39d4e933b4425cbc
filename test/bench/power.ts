/**
 * npx tsx test/bench/power.ts: medians of the power of a plan (what the planning screen would
 * recompute on every change) and of one noncentral t evaluation beside jstat 1.9.6's, with the
 * ratio. Prints figures only; it never fails on a time (the machines are shared and noisy).
 */
import jStat from 'jstat';
import { buildDesign } from '../../src/core/design/build-design.ts';
import { noncentralTCdf } from '../../src/core/dist/noncentral-t.ts';
import { planPower } from '../../src/core/plan/power.ts';
import { fmtMs, medianMs } from './timing.ts';

const numeric = (k: number) => Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 10 }));
const lines: string[] = [];

// (1) noncentral t cdf over a grid of 60 points (df 4 to 60, delta 0.5 to 9), ours beside jstat's.
const grid: [number, number, number][] = [];
for (const df of [4, 12, 30, 60]) for (const d of [0.5, 2, 4, 6.5, 9]) for (const t of [-1, 2, 5]) grid.push([t, df, d]);
const ours = medianMs(() => grid.forEach(([t, df, d]) => noncentralTCdf(t, df, d)), { batch: 20 }) / grid.length;
const ref = medianMs(() => grid.forEach(([t, df, d]) => jStat.noncentralt.cdf(t, df, d)), { batch: 2, rounds: 15 }) / grid.length;
lines.push(`(1) noncentral t cdf, per evaluation: Trialbook ${fmtMs(ours)} median; jstat ${fmtMs(ref)} median; ratio ${(ref / ours).toFixed(1)}x`);

// (2) the whole power block (model, QR, power, smallest effect, replicates needed) for three plans.
for (const [title, spec] of [
  ['2^5 full factorial + 4 center runs, main effects + 2FI', { factors: numeric(5), centerRuns: 4, seed: 1 }],
  ['2^(8-3) fraction, 2 replicates', { factors: numeric(8), fraction: '1/8', replicates: 2, seed: 1 }],
  ['24-run Plackett-Burman, 23 factors, 3 center runs', { factors: numeric(23), plackettBurman: 24, centerRuns: 3, seed: 1 }],
] as const) {
  const d = buildDesign(spec);
  const ms = medianMs(() => planPower(d, { effect: 1, sigma: 1 }), { batch: 5 });
  lines.push(`(2) power of a plan, ${title}: ${fmtMs(ms)} median`);
}
console.log(lines.join('\n'));
