/**
 * Time to read back the CSV export of a study with 10,000 logged runs as a new study in Node:
 * inspectRunsCsv (which recognises the export and maps its planned columns) then mapRunsCsv (every
 * cell checked, the plan from the planned settings), over the same invented bench runs as
 * csv-export.ts. Prints the median and spread over 11 imports after 2 warm-up ones; asserts
 * nothing about time. The store write is not included (bench:store measures saving).
 *   npx tsx test/bench/csv-import.ts
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { StudyRecord } from '../../src/core/study/study.ts';
import { inspectRunsCsv, mapRunsCsv } from '../../src/io/csv/runs-import.ts';
import { studyCsv } from '../../src/io/csv/study-csv.ts';
import { fmtMs } from './timing.ts';
import { benchCsvRuns } from './csv-runs.ts';

const RUNS = 10_000;
const WARMUP = 2;
const ROUNDS = 11;

const backup = JSON.parse(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8')) as {
  payload: { studies: StudyRecord[] };
};
const study = backup.payload.studies[0];
const text = studyCsv(study, benchCsvRuns(study, RUNS));

const once = () => mapRunsCsv(text, { ...inspectRunsCsv(text).suggestion, title: 'Bench import' });
for (let i = 0; i < WARMUP; i++) once();
const times: number[] = [];
let rows = 0;
for (let r = 0; r < ROUNDS; r++) {
  const t0 = performance.now();
  rows = once().runs.length;
  times.push(performance.now() - t0);
}
times.sort((a, b) => a - b);
console.log(
  [
    `CSV import benchmark (Node ${process.version}, inspectRunsCsv + mapRunsCsv of a Trialbook export with planned columns)`,
    `  import ${rows} runs (${(text.length / 1e6).toFixed(2)} M characters): median ${fmtMs(times[ROUNDS >> 1])}, min ${fmtMs(times[0])}, max ${fmtMs(times[ROUNDS - 1])} over ${ROUNDS} imports`,
  ].join('\n'),
);
