/**
 * The confirmation runs of a CSV that Trialbook exported (study-csv.ts), read for their verdict:
 * each row of kind "confirmation" with its block, run, planned setting (the "<name> planned"
 * columns, coded with the factors the analysis recovered) and its value for the response (null
 * when excluded or empty). Rows of other kinds are not read here.
 * Example: exportedCsvConfirmationRows(text, 'Gloss', model.factors) -> [{ block: 3, run: 12, coded: [1, 0.5], value: 91.2 }, ...].
 */
import { InputError } from '../../core/errors.ts';
import { toCoded } from '../../core/factor/coding.ts';
import type { Factor } from '../../core/factor/factor.ts';
import type { ConfirmationRow } from '../../core/predict/confirmation-sets.ts';
import { cellNumber } from './cell-number.ts';
import { exportedCsvLayout } from './exported-csv.ts';
import { bareColumnName, readTable, rowNumber } from './read-table.ts';

/** Throws InputError for a confirmation row whose run, block or planned setting cannot be read, naming its row and column. */
export function exportedCsvConfirmationRows(csvText: string, responseName: string, factors: readonly Factor[]): ConfirmationRow[] {
  const table = readTable(csvText);
  const layout = exportedCsvLayout(table);
  if (!layout) return [];
  const key = bareColumnName(responseName);
  const response = layout.responses.find((r) => table.header[r.value].toLowerCase() === responseName.trim().toLowerCase()) ?? layout.responses.find((r) => bareColumnName(r.name) === key);
  if (!response) return [];
  const columns = factors.map((f) => {
    const col = layout.factors.find((x) => bareColumnName(x.name) === bareColumnName(f.name));
    if (!col || col.planned < 0) throw new InputError(`The export has no "${f.name} planned" column, which the confirmation runs' setting is read from`);
    return col.planned;
  });
  const out: ConfirmationRow[] = [];
  table.rows.forEach((row, r) => {
    if (row[layout.kind].trim() !== 'confirmation') return;
    const at = (c: number) => `Row ${rowNumber(table, r)}, column ${c + 1} ("${table.header[c]}")`;
    const run = cellNumber(row[layout.run].trim());
    if (!Number.isInteger(run)) throw new InputError(`${at(layout.run)}: a confirmation run needs its run number, got "${row[layout.run]}"`);
    const block = layout.block >= 0 ? cellNumber(row[layout.block].trim()) : 1;
    if (!Number.isInteger(block) || block < 1) throw new InputError(`${at(layout.block)}: the block needs a whole number from 1, got "${row[layout.block]}"`);
    const coded = factors.map((f, j) => {
      try {
        return toCoded(f, row[columns[j]].trim());
      } catch (err) {
        throw err instanceof InputError ? new InputError(`${at(columns[j])}: ${err.message}`) : err;
      }
    });
    const excluded = row[layout.excluded].trim().toLowerCase() === 'yes';
    const text = row[response.value].trim();
    const v = text === '' || excluded ? null : cellNumber(text);
    if (v !== null && !Number.isFinite(v)) throw new InputError(`${at(response.value)}: ${response.name} needs a number, got "${row[response.value]}"`);
    out.push({ block, run, coded, value: v });
  });
  return out;
}
