/**
 * Time to write the CSV export of a study with 10,000 logged runs, in Node: studyCsv (the
 * function the app's export and the command line's `csv` call, after reading the runs from the
 * store) over the demo study's 11 planned runs, each logged about 909 times, with invented
 * readings, operators, notes that need quoting and some excluded runs (invented bench data).
 * Prints the median and spread over 21 exports after 3 warm-up ones, and the median CPU time;
 * asserts nothing about time.
 *   npx tsx test/bench/csv-export.ts   (called by npm run bench; the same export in Chromium:
 *   csv-export-chromium.bench.ts)
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { StudyRecord } from '../../src/core/study/study.ts';
import { studyCsv } from '../../src/io/csv/study-csv.ts';
import { fmtMs } from './timing.ts';
import { benchCsvRuns } from './csv-runs.ts';

/** The export's target from the performance issue (median, ms). */
const TARGET_MS = 300;
const RUNS = 10_000;
const WARMUP = 3;
const ROUNDS = 21;

const backup = JSON.parse(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8')) as {
  payload: { studies: StudyRecord[] };
};
const study = backup.payload.studies[0];

const runs = benchCsvRuns(study, RUNS);

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
