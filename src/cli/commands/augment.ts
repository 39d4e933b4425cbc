/**
 * `augment BACKUP.json --study ID-OR-NAME --axial [--axial-distance ...] [--center-runs N]`:
 * augments a logged two-level study into a central composite design in the same study and
 * writes a new backup.
 *
 * The study's own plan never changes once made; the axial runs and their center runs are an
 * added block of the study (core/study/added-block.ts, purpose 'axial'), so the factorial and
 * center runs already logged are reused as they are, and the block's note says what the
 * augmented design can estimate. Every record of the backup is written unchanged, the block is
 * added beside them. Nothing is overwritten: the output goes to stdout, or to a new file with --out.
 */
import { randomUUID } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { augmentStudy } from '../../core/design/augment-study.ts';
import { parseAxialDistance } from '../../core/design/axial-distance.ts';
import { InputError } from '../../core/errors.ts';
import type { AddedBlock } from '../../core/study/added-block.ts';
import { readBackupSync, writeBackup } from '../../io/backup/backup.ts';
import { selectStudy, studyRuns } from '../../io/backup/select-study.ts';
import { parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';

/** The device id the command line writes new records as. */
export const CLI_DEVICE = 'trialbook-cli';

const USAGE = `Usage: npm run --silent cli -- augment BACKUP.json --study ID-OR-NAME --axial [options]

Adds the axial block of a central composite design, with its own center runs, to a logged
two-level study as a new block of the same study (the sequential strategy: the factorial and
center runs already made are reused), and writes a new backup on stdout (or to a new file with
--out). Every record already in the backup is kept unchanged.

  --study ID-OR-NAME   the study to augment
  --axial              add the axial block (the only augmentation for now)
  --axial-distance face|rotatable|orthogonal|NUMBER
                       coded axial distance; default orthogonal (blocks orthogonal to the model)
  --center-runs N      center runs in the added block (default: as many as the study has)
  --seed N             seed of the added block's run order (drawn and shown when absent)
  --out FILE           write the backup to FILE, which must not exist yet
  --summary            print what was added instead of the backup`;

export const augment: Command = {
  summary: 'add the axial block of a central composite design to a logged study, in the same study (new backup)',
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
    // The plan as read (its own runs and every block added so far), so run and block numbers continue it.
    const plan = selectStudy(backup, values.study);
    const logged = studyRuns(backup, plan.id);
    const centerRuns = whole(values['center-runs'], 'center-runs');
    const seed = whole(values.seed, 'seed');
    const a = augmentStudy(plan, logged, {
      ...(values['axial-distance'] !== undefined ? { axialDistance: parseAxialDistance(values['axial-distance']) } : {}),
      ...(centerRuns !== undefined ? { centerRuns } : {}),
      ...(seed !== undefined ? { seed } : {}),
    });
    const now = new Date().toISOString();
    const block: AddedBlock = { id: randomUUID(), studyId: plan.id, device: CLI_DEVICE, createdAt: now, purpose: 'axial', note: a.about, runs: a.added };
    const payload = { ...backup.payload, blocks: [...(backup.payload.blocks ?? []), block] };
    const out = await writeBackup(payload, { device: CLI_DEVICE, exportedAt: now, scope: backup.scope });
    readBackupSync(out); // the record checks, before anything is written
    const summary = [
      `Study "${plan.title}" (${plan.id}): block ${a.block} added with ${a.added.length} planned runs, ${plan.design.runs.length + a.added.length} in all; its ${logged.length} logged runs are kept as they are.`,
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
