/**
 * The run sheet: a plan's runs in run order with their planned settings in real units, as CSV a
 * spreadsheet opens. The same planned-settings columns head the records export, so a sheet
 * printed from either looks the same. CSV follows RFC 4180 (Shafranovich 2005): comma-separated,
 * CRLF line ends, fields with commas, quotes or line breaks quoted (toCsv, checked against
 * papaparse's unparse). Text cells that a spreadsheet would run as a formula (starting with =, +, -, @, tab or
 * carriage return, also after spaces or zero-width characters; formula-guard.ts) get a leading
 * single quote, as the OWASP "CSV Injection" advice says; numbers stay numbers. Numbers are
 * written by JavaScript's Number to String, the shortest text that reads back to the same value
 * (ECMA-262, Number::toString).
 */
import type { Design, DesignRun } from '../../core/design/design.ts';
import { plannedSetting } from '../../core/design/planned-settings.ts';
import { InputError } from '../../core/errors.ts';
import type { Factor } from '../../core/factor/factor.ts';
import { factorLabel } from '../../core/study/name-with-unit.ts';
import { guardCell } from './formula-guard.ts';

export type Cell = string | number;

export interface Table {
  readonly header: readonly string[];
  readonly rows: readonly (readonly Cell[])[];
}

/** The leading columns of a run sheet, before the factors' planned settings. */
export const RUN_COLUMNS = ['Run', 'Std order', 'Replicate', 'Block', 'Kind'] as const;

/**
 * Header of a factor's planned-settings column: "<name> (<unit>) planned", or "<name> planned"
 * without a unit. Example: plannedColumn(Temperature in degC) -> "Temperature (degC) planned".
 */
export function plannedColumn(f: Factor): string {
  return `${factorLabel(f)} planned`;
}

/**
 * Header and cells of one run's leading columns and planned settings (Run, Std order, Replicate,
 * Block, Kind, then one planned setting per factor). Std order is empty for a center run.
 * Example: runCells(run 1, std 3, factors T and Powder) -> [1, 3, 1, 1, 'factorial', 200, 'matte'].
 */
export function runCells(run: DesignRun, factors: readonly Factor[]): Cell[] {
  if (run.coded.length !== factors.length) {
    throw new InputError(`Run ${run.run} has ${run.coded.length} settings for ${factors.length} factors`);
  }
  return [run.run, run.standardOrder ?? '', run.replicate, run.block, run.kind, ...factors.map((f, i) => plannedSetting(f, run.coded[i]))];
}

/**
 * The run sheet of a design as a table: header (RUN_COLUMNS, then plannedColumn per factor) and
 * one row per run in run order. Throws InputError for a design without runs.
 * Example: runSheetTable(design).header -> ['Run','Std order','Replicate','Block','Kind','Temperature (degC) planned', ...].
 */
export function runSheetTable(design: Pick<Design, 'factors' | 'runs'>): Table {
  if (design.runs.length === 0) throw new InputError('A run sheet needs a plan with runs, got none');
  return {
    header: [...RUN_COLUMNS, ...design.factors.map(plannedColumn)],
    rows: design.runs.map((r) => runCells(r, design.factors)),
  };
}

/**
 * A cell made safe for a spreadsheet: text that a spreadsheet could run as a formula (=, +, -, @,
 * also after spaces or zero-width characters, or their full-width forms; formula-guard.ts) gets a
 * leading single quote; numbers and other text are returned as they are. Throws InputError for a
 * number that is not finite (a spreadsheet cannot hold it).
 * Example: neutraliseCell('=SUM(A1)') -> "'=SUM(A1)"; neutraliseCell(-1.5) -> -1.5.
 */
export function neutraliseCell(cell: Cell): Cell {
  if (typeof cell === 'number') {
    if (!Number.isFinite(cell)) throw new InputError(`A CSV cell needs a finite number, got ${cell}`);
    return cell;
  }
  return guardCell(cell);
}

/**
 * A field quoted when RFC 4180 needs it (a comma, a double quote or a line break in it), and also
 * when it holds a byte-order mark or starts or ends with a space, as papaparse's unparse does,
 * so that readers that trim fields keep the spaces; quotes inside are doubled.
 */
const NEEDS_QUOTES = /[",\r\n\ufeff]|^ | $/;

function csvField(cell: Cell): string {
  const safe = neutraliseCell(cell);
  // A number's shortest form (digits, '.', '-', 'e', '+') never needs quotes.
  if (typeof safe === 'number') return String(safe);
  return NEEDS_QUOTES.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

/**
 * RFC 4180 CSV text of a table (CRLF line ends, a final CRLF), every cell neutralised. Written in
 * one pass of string appends (the export of 10,000 runs is a benchmark figure: test/bench/
 * csv-export.ts); the same text papaparse's unparse writes, which a property test checks.
 * Cost: linear in the table's characters. Throws InputError when a row's length differs from the
 * header's, or for a number that is not finite.
 * Example: toCsv({header:['Run','Kind'], rows:[[1,'center']]}) -> "Run,Kind\r\n1,center\r\n".
 */
export function toCsv(table: Table): string {
  const width = table.header.length;
  table.rows.forEach((r, i) => {
    if (r.length !== width) throw new InputError(`CSV row ${i + 1} has ${r.length} cells for ${width} columns`);
  });
  let out = '';
  for (const row of [table.header, ...table.rows]) {
    for (let j = 0; j < width; j++) out += (j === 0 ? '' : ',') + csvField(row[j]);
    out += '\r\n';
  }
  return out;
}

/** The run sheet of a design as CSV text. Example: runSheetCsv(design).split('\r\n')[0] -> "Run,Std order,Replicate,Block,Kind,...". */
export function runSheetCsv(design: Pick<Design, 'factors' | 'runs'>): string {
  return toCsv(runSheetTable(design));
}
