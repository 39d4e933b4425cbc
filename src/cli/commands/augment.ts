/**
 * `augment BACKUP.json --study ID-OR-NAME --axial [--axial-distance ...] [--center-runs N]`:
 * augments a logged two-level study into a central composite design and writes a new backup.
 *
 * A study's plan never changes once made (a backup whose study differs from the one on a device
 * is refused as altered), so the augmented plan goes into a new study: the original study and
 * every revision of its runs are written unchanged, and the new study holds the original planned
 * runs plus the added block, with the current values of each logged run carried into it as the
 * first revision of a run of the new study (the same planned run number). Nothing is lost and
 * nothing is overwritten: the output goes to stdout, or to a new file with --out.
 */
import { randomUUID } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { augmentStudy } from '../../core/design/augment-study.ts';
import { parseAxialDistance } from '../../core/design/axial-distance.ts';
import { InputError } from '../../core/errors.ts';
import type { RunRevision, StudyRecord } from '../../core/study/study.ts';
import { readBackupSync, writeBackup } from '../../io/backup/backup.ts';
import { selectStudy, studyRuns } from '../../io/backup/select-study.ts';
import { parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';

/** The device id the command line writes new records as. */
export const CLI_DEVICE = 'trialbook-cli';

const USAGE = `Usage: npm run --silent cli -- augment BACKUP.json --study ID-OR-NAME --axial [options]

Adds the axial block of a central composite design, with its own center runs, to a logged
two-level study (the sequential strategy: the factorial and center runs already made are
reused), and writes a new backup on stdout (or to a new file with --out). A study's plan is
fixed once made, so the augmented plan is a new study beside the original: the original and
all its records are kept unchanged, and the current values of its logged runs are carried into
the new study under the same run numbers.

  --study ID-OR-NAME   the study to augment
  --axial              add the axial block (the only augmentation for now)
  --axial-distance face|rotatable|orthogonal|NUMBER
                       coded axial distance; default orthogonal (blocks orthogonal to the model)
  --center-runs N      center runs in the added block (default: as many as the study has)
  --seed N             seed of the added block's run order (drawn and shown when absent)
  --out FILE           write the backup to FILE, which must not exist yet
  --summary            print what was added instead of the backup`;

export const augment: Command = {
  summary: 'add the axial block of a central composite design to a logged study (new backup)',
  usage: USAGE,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, {
      study: { type: 'string' },
      axial: { type: 'boolean' },
      'axial-distance': { type: 'string' },
      'center-runs': { type: 'string' },
      seed: { type: 'string' },
      out: { type: 'string' },
      summary: { type: 'boolean' },
    });
    if (positionals.length !== 1) throw new InputError(`Give one backup file, got ${positionals.length === 0 ? 'none' : positionals.join(', ')}`);
    if (!values.study) throw new InputError('Name the study with --study ID-OR-NAME');
    if (!values.axial) throw new InputError('Say what to add: --axial (the axial block of a central composite design)');
    const whole = (t: string | undefined, o: string) => {
      if (t === undefined) return undefined;
      if (!/^\s*\d+\s*$/.test(t)) throw new InputError(`--${o} needs a whole number, got "${t}"`);
      return Number(t);
    };
    let text: string;
    try {
      text = readFileSync(positionals[0], 'utf8');
    } catch (err) {
      throw new InputError(`Cannot read the file "${positionals[0]}": ${(err as NodeJS.ErrnoException).code === 'ENOENT' ? 'it does not exist' : (err as Error).message}`);
    }
    const backup = readBackupSync(text);
    const study = selectStudy(backup, values.study);
    const logged = studyRuns(backup, study.id);
    const centerRuns = whole(values['center-runs'], 'center-runs');
    const seed = whole(values.seed, 'seed');
    const a = augmentStudy(study, logged, {
      ...(values['axial-distance'] !== undefined ? { axialDistance: parseAxialDistance(values['axial-distance']) } : {}),
      ...(centerRuns !== undefined ? { centerRuns } : {}),
      ...(seed !== undefined ? { seed } : {}),
    });
    const now = new Date().toISOString();
    const newStudy: StudyRecord = {
      ...a.plan,
      id: randomUUID(),
      device: CLI_DEVICE,
      createdAt: now,
      title: `${study.title} (augmented)`,
      purpose: `${study.purpose}${study.purpose ? '\n' : ''}Augmented from study ${study.id} ("${study.title}"): its runs 1 to ${Math.max(...study.design.runs.map((r) => r.run))} are reused; block ${a.block} is added.`,
    };
    const carried: RunRevision[] = logged.map((l) => ({
      id: randomUUID(),
      runId: randomUUID(),
      studyId: newStudy.id,
      plannedRun: l.plannedRun,
      rev: 1,
      device: CLI_DEVICE,
      parents: [],
      restoredFrom: null,
      savedAt: now,
      actual: l.actual,
      readings: l.readings,
      loggedAt: l.loggedAt,
      operator: l.operator,
      notes: l.notes,
      excluded: l.excluded,
      reason: l.reason,
    }));
    const payload = { studies: [...backup.payload.studies, newStudy], revisions: [...backup.payload.revisions, ...carried] };
    const out = await writeBackup(payload, { device: CLI_DEVICE, exportedAt: now, scope: backup.scope });
    readBackupSync(out); // the record checks, before anything is written
    const summary = [
      `New study "${newStudy.title}" (${newStudy.id}): ${a.plan.design.runs.length} planned runs, ${carried.length} logged runs carried over.`,
      ...a.notes.map((n) => `  - ${n}`),
    ].join('\n');
    if (values.out !== undefined) {
      try {
        writeFileSync(values.out, out, { flag: 'wx' });
      } catch (err) {
        throw new InputError(`Cannot write "${values.out}": ${(err as NodeJS.ErrnoException).code === 'EEXIST' ? 'it already exists (nothing is overwritten; choose a new name)' : (err as Error).message}`);
      }
      return `${summary}\nWritten to ${values.out}.`;
    }
    return values.summary ? summary : out;
  },
};
