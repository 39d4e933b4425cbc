/**
 * The confirmation runs of the file `analyze` reads, for their verdict: from a backup, the named
 * study's planned confirmation runs (its added blocks) and their logged values; from a CSV that
 * Trialbook exported, its rows of kind "confirmation". Any other table has none.
 */
import type { Factor } from '../core/factor/factor.ts';
import { confirmationRowsOf, type ConfirmationRow } from '../core/predict/confirmation-sets.ts';
import { findResponse } from '../core/study/run-data.ts';
import { selectStudy, studyRuns } from '../io/backup/select-study.ts';
import { exportedCsvConfirmationRows } from '../io/csv/exported-csv-confirmations.ts';
import { readBackupFile } from './read-backup-file.ts';
import { readTextFile } from './read-text-file.ts';

export function confirmationRowsOfFile(path: string, values: { readonly study?: string; readonly response?: string; readonly levels?: string }, factors: readonly Factor[]): ConfirmationRow[] {
  const isBackup = /\.json$/i.test(path);
  const text = isBackup ? '' : readTextFile(path);
  if (isBackup || /^\s*\{/.test(text)) {
    const backup = readBackupFile(path);
    const study = selectStudy(backup, values.study ?? '');
    return confirmationRowsOf(study, studyRuns(backup, study.id), findResponse(study, values.response ?? '').index);
  }
  return values.levels ? [] : exportedCsvConfirmationRows(text, values.response ?? '', factors);
}
