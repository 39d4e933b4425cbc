/**
 * The confirmation verdicts of a study as a small CSV of their own, written beside the runs CSV
 * (study-csv.ts) so that the runs file keeps one header row and opens cleanly in a spreadsheet.
 * One row per set of confirmation runs and response: Response, Model, Block, Runs (the run
 * numbers, separated by spaces), each factor's setting ("<name> (<unit>) setting", real units),
 * Runs logged (m), Mean, Predicted, Interval low, Interval high (the 95% interval for the mean of
 * m new runs), Level, Outcome (confirmed, not-confirmed, not-logged or cannot-judge, the tokens
 * of `analyze --json`'s confirmations), Verdict (the sentence) and Caution (the standing caution
 * of every prediction, core/predict/caution.ts, since a verdict leads to a setting). Numbers are in the response's
 * units (the default model has no transform); empty where the runs give none. Written by toCsv
 * (RFC 4180, CRLF, the formula guard), optionally with a UTF-8 byte-order mark.
 * Example: confirmationsCsv(study, studyConfirmations(study, runs)).split('\r\n')[0] ->
 *   "Response,Model,Block,Runs,Oven temperature (°C) setting,...,Outcome,Verdict".
 */
import { toReal } from '../../core/factor/coding.ts';
import type { Factor } from '../../core/factor/factor.ts';
import type { ResponseConfirmations } from '../../core/predict/study-confirmations.ts';
import { factorLabel } from '../../core/study/name-with-unit.ts';
import { confirmationStatement, confirmationToken, NOT_LOGGED_YET } from '../../core/text/confirmation-text.ts';
import { toCsv, type Cell, type Table } from './run-sheet.ts';
import { CAUTION } from '../../core/predict/caution.ts';

/** Header of a factor's setting column in the confirmations file: "<name> (<unit>) setting". */
export function settingColumn(f: Factor): string {
  return `${factorLabel(f)} setting`;
}

const MODEL_WORDS = { 'two-way': 'main effects and two-factor interactions', main: 'main effects' } as const;

/** The file as a table: the header and one row per set and response. */
export function confirmationsTable(factors: readonly Factor[], results: readonly ResponseConfirmations[]): Table {
  const header = ['Response', 'Model', 'Block', 'Runs', ...factors.map(settingColumn), 'Runs logged', 'Mean', 'Predicted', 'Interval low', 'Interval high', 'Level', 'Outcome', 'Verdict', 'Caution'];
  const rows: Cell[][] = [];
  // A verdict is read as leave to change a setting: the standing caution goes with every row.
  const caution = CAUTION.join(' ');
  for (const r of results) {
    for (const j of r.judged) {
      const c = j.comparison;
      rows.push([
        r.response,
        MODEL_WORDS[r.model],
        j.set.block,
        j.set.runs.join(' '),
        ...factors.map((f, i) => toReal(f, j.set.coded[i])),
        c ? c.m : j.set.values.length,
        c ? c.mean : '',
        c ? c.fit : '',
        c?.interval ? c.interval[0] : '',
        c?.interval ? c.interval[1] : '',
        c ? c.level : '',
        confirmationToken(j),
        c ? confirmationStatement(c) : j.problem ?? NOT_LOGGED_YET,
        caution,
      ]);
    }
  }
  return { header, rows };
}

/** The CSV text (see the file comment for the columns). */
export function confirmationsCsv(factors: readonly Factor[], results: readonly ResponseConfirmations[], options: { readonly bom?: boolean } = {}): string {
  return (options.bom ? '\ufeff' : '') + toCsv(confirmationsTable(factors, results));
}
