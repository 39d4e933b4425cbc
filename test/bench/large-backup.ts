/**
 * Large backups for the benchmarks and the command line's time and memory figures (INVENTED
 * data, for timing only): one invented study of a 2^3 plan with 2 center runs, and a long history
 * of revisions, each built on the one before, spread over the chosen number of logged runs.
 * Written by the app's own backup writer, so the files are valid and signed.
 *
 *   npx tsx test/bench/large-backup.ts OUT.json --revisions 100000 [--runs 1] [--note 40]
 *   npx tsx test/bench/large-backup.ts OUT.json --megabytes 100
 */
import { writeFileSync } from 'node:fs';
import { buildDesign } from '../../src/core/design/build-design.ts';
import { checkStudy } from '../../src/core/records/check-study.ts';
import { studyPlan, type RunRevision, type StudyRecord } from '../../src/core/study/study.ts';
import { writeBackup, type BackupPayload } from '../../src/io/backup/backup.ts';
import { portableDigest } from '../../src/io/digest.ts';

export const BENCH_STUDY_TITLE = 'Invented benchmark: long history';

export function benchStudy(): StudyRecord {
  const design = buildDesign({
    factors: [
      { kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' },
      { kind: 'numeric', name: 'Line speed', low: 2, high: 4, unit: 'm/min' },
      { kind: 'numeric', name: 'Powder flow', low: 30, high: 50, unit: 'g/min' },
    ],
    centerRuns: 2,
    seed: 7,
  });
  const plan = studyPlan(BENCH_STUDY_TITLE, 'INVENTED DATA for timing only.', [{ name: 'Film thickness', unit: 'µm', goal: 'target', target: 70, lowerBound: 0 }], design);
  return checkStudy({ ...plan, id: 'bench-study', device: 'bench-device', createdAt: '2024-05-02T10:00:00.000Z' }, 'study');
}

/** The payload: `revisions` revisions over `runs` logged runs (round robin), each with a note of `note` characters. */
export function benchPayload(revisions: number, runs = 1, note = 40): BackupPayload {
  const study = benchStudy();
  const planned = study.design.runs;
  const last: (RunRevision | null)[] = Array(runs).fill(null);
  const out: RunRevision[] = new Array(revisions);
  const text = 'n'.repeat(note);
  for (let i = 0; i < revisions; i++) {
    const k = i % runs;
    const before = last[k];
    const p = planned[k % planned.length];
    const r: RunRevision = {
      id: `rev-${i}`,
      runId: `run-${k}`,
      studyId: study.id,
      plannedRun: p.run,
      rev: before ? before.rev + 1 : 1,
      device: 'bench-device',
      parents: before ? [before.id] : [],
      restoredFrom: null,
      savedAt: new Date(Date.UTC(2024, 4, 2, 10) + i * 1000).toISOString(),
      actual: [180 + p.coded[0] * 20, 3 + p.coded[1], 40 + p.coded[2] * 10],
      readings: [[70 + (i % 17) / 10]],
      loggedAt: null,
      operator: null,
      notes: text,
      excluded: false,
      reason: '',
    };
    out[i] = r;
    last[k] = r;
  }
  return { studies: [study], revisions: out };
}

export const BENCH_HEADER = { device: 'bench-device', exportedAt: '2024-05-02T10:00:00.000Z', scope: 'all' as const };

/** The backup text of benchPayload. */
export function benchBackup(revisions: number, runs = 1, note = 40): Promise<string> {
  return writeBackup(benchPayload(revisions, runs, note), BENCH_HEADER, portableDigest);
}

async function main(argv: string[]) {
  const [out, ...rest] = argv;
  const opt = (name: string, dflt: number) => {
    const i = rest.indexOf(`--${name}`);
    return i >= 0 ? Number(rest[i + 1]) : dflt;
  };
  if (!out) throw new Error('Usage: npx tsx test/bench/large-backup.ts OUT.json (--revisions N [--runs R] [--note C] | --megabytes M)');
  let revisions = opt('revisions', 100_000);
  const runs = opt('runs', 1);
  const note = opt('note', 40);
  const megabytes = opt('megabytes', 0);
  if (megabytes > 0) {
    // Scale from a sample of 1,000 revisions over 10 logged runs to the size asked for.
    const sample = (await benchBackup(1000, 10, note)).length;
    revisions = Math.round((megabytes * 1024 * 1024 * 1000) / sample);
    const text = await benchBackup(revisions, 10, note);
    writeFileSync(out, text);
    console.log(`${out}: ${revisions} revisions over 10 logged runs, ${(Buffer.byteLength(text) / 2 ** 20).toFixed(1)} MB`);
    return;
  }
  const text = await benchBackup(revisions, runs, note);
  writeFileSync(out, text);
  console.log(`${out}: ${revisions} revisions over ${runs} logged run(s), ${(Buffer.byteLength(text) / 2 ** 20).toFixed(1)} MB`);
}

if (process.argv[1] && import.meta.url.endsWith(process.argv[1].split('/').pop()!)) {
  main(process.argv.slice(2)).catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exitCode = 1;
  });
}
