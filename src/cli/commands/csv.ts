/** `csv BACKUP --study ID-OR-NAME [--bom]`: a study's records from a backup as the app's CSV export. */
import { InputError } from '../../core/errors.ts';
import { readBackupSync } from '../../io/backup/backup.ts';
import { selectStudy, studyRuns } from '../../io/backup/select-study.ts';
import { studyCsv } from '../../io/csv/study-csv.ts';
import { parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { readTextFile } from '../read-text-file.ts';

const USAGE = `Usage: npm run --silent cli -- csv BACKUP.json --study ID-OR-NAME [--bom]

Writes one study of a Trialbook backup as CSV on stdout, the same file the app's CSV export
makes: one row per run with its planned, actual and coded settings, each response's mean and
readings, time, operator, notes, excluded and reason.

  --study ID-OR-NAME   the study's id, or its name (a name that matches two studies is refused,
                       listing their ids)
  --bom                start with a UTF-8 byte-order mark, for spreadsheets that need one`;

export const csv: Command = {
  summary: 'one study of a backup as the app\'s CSV export',
  writesFile: true,
  usage: USAGE,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, { study: { type: 'string' }, bom: { type: 'boolean' } });
    if (positionals.length !== 1) throw new InputError(`Give one backup file, got ${positionals.length === 0 ? 'none' : positionals.join(', ')}`);
    if (!values.study) throw new InputError('Name the study with --study ID-OR-NAME');
    const text = readTextFile(positionals[0], { backup: true });
    const backup = readBackupSync(text);
    const study = selectStudy(backup, values.study);
    return studyCsv(study, studyRuns(backup, study.id), { bom: values.bom === true });
  },
};
