/**
 * The page side of csv-export-chromium.bench.ts: bundled for a blank page, it times studyCsv (the
 * app's export function) over the benchmark's invented runs and hands back each export's time.
 */
import type { StudyRecord } from '../../src/core/study/study.ts';
import { studyCsv } from '../../src/io/csv/study-csv.ts';
import { benchCsvRuns } from './csv-runs.ts';

(globalThis as unknown as { csvBench: unknown }).csvBench = (study: StudyRecord, count: number, warmup: number, rounds: number) => {
  const runs = benchCsvRuns(study, count);
  for (let i = 0; i < warmup; i++) studyCsv(study, runs, { bom: true });
  const times: number[] = [];
  let chars = 0;
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    chars = studyCsv(study, runs, { bom: true }).length;
    times.push(performance.now() - t0);
  }
  return { times, chars };
};
