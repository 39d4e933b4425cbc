/**
 * The confirmation verdicts of a study as their own small CSV, saved beside the runs CSV (the
 * same text as the command line's `csv --confirmations`; io/csv/confirmations-csv.ts). A module
 * of its own because it runs the analysis: the export screen loads it only when asked, so the
 * first screen's code stays small.
 */
import { InputError } from '../core/errors.ts';
import { studyConfirmations } from '../core/predict/study-confirmations.ts';
import { confirmationsCsv } from '../io/csv/confirmations-csv.ts';
import { noConfirmationRuns } from '../core/text/confirmation-text.ts';
import type { StudyCsvOptions } from '../io/csv/study-csv.ts';
import { studyAndRuns } from './files.ts';
import type { Store } from './store.ts';

/** Throws InputError for a missing study or one without confirmation runs; writes nothing. */
export async function exportConfirmationsCsv(store: Store, studyId: string, options: StudyCsvOptions = {}): Promise<string> {
  const [study, runs] = await studyAndRuns(store, studyId);
  const results = studyConfirmations(study, runs);
  if (results.length === 0) throw new InputError(noConfirmationRuns(study.title, 'app'));
  return confirmationsCsv(study.factors, results, options);
}
