/** `csv BACKUP --study ID-OR-NAME [--bom]`: a study's records from a backup as the app's CSV export. */
import { InputError } from '../../core/errors.ts';
import { readBackupSync } from '../../io/backup/backup.ts';
import { backupDivergedRuns, selectStudy, studyRuns } from '../../io/backup/select-study.ts';
import { divergedNote } from '../../core/text/diverged-text.ts';
import { studyCsv } from '../../io/csv/study-csv.ts';
import { confirmationsCsv } from '../../io/csv/confirmations-csv.ts';
import { noConfirmationRuns } from '../../core/text/confirmation-text.ts';
import { studyConfirmations } from '../../core/predict/study-confirmations.ts';
import { parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { readTextFile } from '../read-text-file.ts';
import { visibleText } from '../visible-text.ts';

const USAGE = `Usage: npm run --silent cli -- csv BACKUP.json --study ID-OR-NAME [--bom] [--confirmations]

Writes one study of a Trialbook backup as CSV on stdout, the same file the app's CSV export
makes: one row per run with its planned, actual and coded settings, each response's mean and
readings, time, operator, notes, excluded and reason. A run with two current revisions (edited
in two places) is named on stderr with both values; the file has its current one.

  --study ID-OR-NAME   the study's id, or its name (a name that matches two studies is refused,
                       listing their ids)
  --bom                start with a UTF-8 byte-order mark, for spreadsheets that need one
  --confirmations      write instead the study's confirmation verdicts, the small CSV the app
                       saves beside the runs file: per set of confirmation runs and response,
                       the setting, the mean of the runs, the prediction and the 95% interval for
                       the mean of that many new runs from the default model, and the verdict`;

export const csv: Command = {
  summary: 'one study of a backup as the app\'s CSV export',
  writesFile: true,
  usage: USAGE,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, { study: { type: 'string' }, bom: { type: 'boolean' }, confirmations: { type: 'boolean' } });
    if (positionals.length !== 1) throw new InputError(`Give one backup file, got ${positionals.length === 0 ? 'none' : positionals.join(', ')}`);
    if (!values.study) throw new InputError('Name the study with --study ID-OR-NAME');
    const text = readTextFile(positionals[0], { backup: true });
    const backup = readBackupSync(text);
    const study = selectStudy(backup, values.study);
    const runs = studyRuns(backup, study.id);
    // The file keeps its columns (each run's current revision); a run with two current
    // revisions is named on stderr with both values, so the export never picks silently.
    for (const d of backupDivergedRuns(backup, runs)) process.stderr.write(visibleText(`trialbook csv: ${divergedNote(study, d)}\n`));
    if (values.confirmations) {
      const results = studyConfirmations(study, runs);
      if (results.length === 0) throw new InputError(noConfirmationRuns(study.title, 'command'));
      return confirmationsCsv(study.factors, results, { bom: values.bom === true });
    }
    return studyCsv(study, runs, { bom: values.bom === true });
  },
};
