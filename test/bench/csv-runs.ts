/**
 * The CSV export benchmark's runs (INVENTED data, for timing only): `count` logged runs over the
 * study's planned runs, with invented readings, operators, notes that need quoting and some
 * excluded runs. The same runs in Node (csv-export.ts) and in Chromium (csv-export-chromium.bench.ts).
 */
import type { LoggedRun, StudyRecord } from '../../src/core/study/study.ts';

export function benchCsvRuns(study: StudyRecord, count: number): LoggedRun[] {
  let seed = 2024;
  const rnd = () => (seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  const start = Date.parse('2024-05-02T08:00:00.000Z');
  const runs: LoggedRun[] = Array.from({ length: count }, (_, i) => {
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
  return runs;
}
