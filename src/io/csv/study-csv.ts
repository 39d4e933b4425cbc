/**
 * The records export of a study as CSV: one row per logged run (and one per planned run not yet
 * logged), in run order. Columns: the run sheet's (Run, Std order, Replicate, Block, Kind and each
 * factor's planned setting, from run-sheet.ts, so the two files agree), then each factor's actual
 * setting ("<name> (<unit>) actual"), each factor's coded actual setting ("<name> coded"), each
 * response's value, the mean of its readings ("<name> (<unit>)", without binary round-off), and its readings
 * ("<name> (<unit>) readings", separated by spaces), then Logged at, Operator, Notes, Excluded
 * (yes/no) and Reason. Written by run-sheet.ts's toCsv: RFC 4180, CRLF, text cells that a
 * spreadsheet would run as a formula neutralised as OWASP advises, numbers as numbers; UTF-8,
 * optionally with a byte-order mark so spreadsheets read the units' characters right.
 * Example: studyCsv(study, runs).split('\r\n')[0] ->
 *   "Run,Std order,Replicate,Block,Kind,Oven temperature (°C) planned,...,Oven temperature (°C) actual,...".
 */
import { toCoded } from '../../core/factor/coding.ts';
import type { Factor } from '../../core/factor/factor.ts';
import { factorLabel, nameWithUnit } from '../../core/study/name-with-unit.ts';
import { withoutRoundOff } from '../../core/format/without-round-off.ts';
import type { Response } from '../../core/study/response.ts';
import { meanReading, type LoggedRun, type StudyRecord } from '../../core/study/study.ts';
import { runSheetTable, toCsv, type Cell, type Table } from './run-sheet.ts';

export interface StudyCsvOptions {
  /** Start with a UTF-8 byte-order mark (some spreadsheets need it to read the text as UTF-8). */
  readonly bom?: boolean;
}

/** Header of a factor's actual-settings column: "<name> (<unit>) actual". */
export function actualColumn(f: Factor): string {
  return `${factorLabel(f)} actual`;
}

/** Header of a factor's coded actual setting: "<name> coded". */
export function codedColumn(f: Factor): string {
  return `${f.name} coded`;
}

/** Header of a response's value (the mean of its readings): "<name> (<unit>)". */
export function responseColumn(r: Response): string {
  return nameWithUnit(r.name, r.unit);
}

/** Header of a response's readings: "<name> (<unit>) readings". */
export function readingsColumn(r: Response): string {
  return `${nameWithUnit(r.name, r.unit)} readings`;
}

export const TRAILING_COLUMNS = ['Logged at', 'Operator', 'Notes', 'Excluded', 'Reason'] as const;

/** The export as a table (header and cells), before it is written as text. */
export function studyTable(study: StudyRecord, runs: readonly LoggedRun[]): Table {
  const sheet = runSheetTable({ factors: study.factors, runs: study.design.runs });
  const header = [
    ...sheet.header,
    ...study.factors.map(actualColumn),
    ...study.factors.map(codedColumn),
    ...study.responses.flatMap((r) => [responseColumn(r), readingsColumn(r)]),
    ...TRAILING_COLUMNS,
  ];
  const blankTail = (): Cell[] => [...study.factors.map(() => ''), ...study.factors.map(() => ''), ...study.responses.flatMap(() => ['', '']), '', '', '', '', ''];
  const byPlanned = new Map<number, LoggedRun[]>();
  for (const r of runs) {
    const list = byPlanned.get(r.plannedRun);
    if (list) list.push(r);
    else byPlanned.set(r.plannedRun, [r]);
  }
  const rows: Cell[][] = [];
  const { factors, responses } = study;
  // Rows are built by pushing into one array each (10,000 runs is a benchmark figure:
  // test/bench/csv-export.ts), not from spreads of temporary arrays.
  study.design.runs.forEach((planned, i) => {
    const logged = (byPlanned.get(planned.run) ?? []).sort((a, b) => (a.savedAt < b.savedAt ? -1 : a.savedAt > b.savedAt ? 1 : a.id < b.id ? -1 : 1));
    if (logged.length === 0) rows.push([...sheet.rows[i], ...blankTail()]);
    for (const run of logged) {
      const row = sheet.rows[i].slice();
      for (const v of run.actual) row.push(v);
      for (let j = 0; j < factors.length; j++) row.push(toCoded(factors[j], run.actual[j]));
      for (let j = 0; j < responses.length; j++) {
        const readings = run.readings[j] ?? [];
        const mean = meanReading(readings);
        // The mean without binary round-off (70.3, not 70.30000000000001); the readings exactly.
        row.push(mean === null ? '' : withoutRoundOff(mean), readings.length === 1 ? readings[0] : readings.join(' '));
      }
      row.push(run.loggedAt ?? '', run.operator ?? '', run.notes, run.excluded ? 'yes' : 'no', run.reason);
      rows.push(row);
    }
  });
  return { header, rows };
}

/** The CSV text of a study's records (see the file comment for the columns). */
export function studyCsv(study: StudyRecord, runs: readonly LoggedRun[], options: StudyCsvOptions = {}): string {
  return (options.bom ? '\ufeff' : '') + toCsv(studyTable(study, runs));
}
