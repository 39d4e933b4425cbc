/**
 * Time to write the CSV export of a study with 10,000 logged runs, in Node: studyCsv (the
 * function the app's export and the command line's `csv` call, after reading the runs from the
 * store) over the demo study's 11 planned runs, each logged about 909 times, with invented
 * readings, operators, notes that need quoting and some excluded runs (invented bench data).
 * Prints the median and spread over 21 exports after 3 warm-up ones, and the median CPU time;
 * asserts nothing about time.
 *   npx tsx test/bench/csv-export.ts   (called by npm run bench)
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { LoggedRun, StudyRecord } from '../../src/core/study/study.ts';
import { studyCsv } from '../../src/io/csv/study-csv.ts';
import { fmtMs } from './timing.ts';

/** The export's target from the performance issue (median, ms). */
const TARGET_MS = 300;
const RUNS = 10_000;
const WARMUP = 3;
const ROUNDS = 21;

const backup = JSON.parse(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8')) as {
  payload: { studies: StudyRecord[] };
};
const study = backup.payload.studies[0];

let seed = 2024;
const rnd = () => (seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32;
const start = Date.parse('2024-05-02T08:00:00.000Z');
const runs: LoggedRun[] = Array.from({ length: RUNS }, (_, i) => {
  const planned = study.design.runs[i % study.design.runs.length];
  const at = new Date(start + i * 61_000).toISOString();
  const excluded = i % 97 === 0;
  return {
    id: `run-${i}`, revisionId: `rev-${i}`, revisions: 1, heads: [`rev-${i}`],
    studyId: study.id, plannedRun: planned.run, rev: 1, device: 'bench-device', parents: [], restoredFrom: null, savedAt: at,
    actual: study.factors.map((f, j) => (f.kind === 'numeric' ? Math.round(((f.low + f.high) / 2 + (planned.coded[j] * (f.high - f.low)) / 2 + (rnd() - 0.5)) * 10) / 10 : f.levels[0])),
    readings: [[60 + Math.round(rnd() * 200) / 10, 60 + Math.round(rnd() * 200) / 10, 60 + Math.round(rnd() * 200) / 10], [75 + Math.round(rnd() * 150) / 10]],
    loggedAt: at, operator: `Shift ${'ABC'[i % 3]} (invented)`, notes: i % 5 === 0 ? 'lid re-seated, "tight", checked' : '',
    excluded, reason: excluded ? 'thermocouple loose' : '',
  };
});

for (let i = 0; i < WARMUP; i++) studyCsv(study, runs, { bom: true });
const times: number[] = [];
const cpu: number[] = [];
let bytes = 0;
for (let r = 0; r < ROUNDS; r++) {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const text = studyCsv(study, runs, { bom: true });
  times.push(performance.now() - t0);
  const c = process.cpuUsage(c0);
  cpu.push((c.user + c.system) / 1000);
  bytes = text.length;
}
times.sort((a, b) => a - b);
cpu.sort((a, b) => a - b);
const median = times[times.length >> 1];
console.log(
  [
    `CSV export benchmark (Node ${process.version}, studyCsv, ${RUNS} logged runs over ${study.design.runs.length} planned runs)`,
    `  export ${RUNS} runs: median ${fmtMs(median)} (target at most ${TARGET_MS} ms), min ${fmtMs(times[0])}, max ${fmtMs(times[times.length - 1])} over ${ROUNDS} exports; ${(bytes / 1e6).toFixed(2)} M characters`,
    // The process's CPU time (all its threads, the collector's too) moves less than the wall clock on a shared machine.
    `  CPU time of the process per export: median ${fmtMs(cpu[cpu.length >> 1])}`,
  ].join('\n'),
);
