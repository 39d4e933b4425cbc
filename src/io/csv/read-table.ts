/**
 * Reads CSV text into a header and rows of strings, with papaparse (RFC 4180 quoting; a leading
 * byte-order mark is dropped). Blank lines are skipped. Throws InputError naming the row for a
 * malformed file, an empty file or duplicate column names.
 * Example: readTable('a,b\n\n1,2\n') -> { header: ['a','b'], rows: [['1','2']], rowNumbers: [3] }.
 */
import Papa from 'papaparse';
import { InputError } from '../../core/errors.ts';

export interface Table {
  readonly header: readonly string[];
  /** Data rows (the header and blank lines excluded); rows[r][c] is column c + 1 of row rowNumber(table, r). */
  readonly rows: readonly (readonly string[])[];
  /** The file's row number of each data row (the header is row 1; blank lines count). */
  readonly rowNumbers: readonly number[];
}

/** The file's row number of data row r, for messages. */
export function rowNumber(table: Table, r: number): number {
  return table.rowNumbers[r] ?? r + 2;
}

export function readTable(text: string): Table {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  // Blank lines are dropped after parsing, not by the parser, so that every row keeps its number.
  const parsed = Papa.parse<string[]>(body, { header: false, skipEmptyLines: false });
  const bad = parsed.errors.find((e) => e.type !== 'Delimiter');
  if (bad) throw new InputError(`The CSV file cannot be read at row ${(bad.row ?? 0) + 1}: ${bad.message}`);
  const blank = (r: string[]) => r.every((cell) => cell.trim() === '');
  const numbered = parsed.data.map((r, i) => ({ r, n: i + 1 })).filter(({ r }) => !blank(r));
  const header = numbered[0]?.r;
  const rows = numbered.slice(1).map(({ r }) => r);
  const rowNumbers = numbered.slice(1).map(({ n }) => n);
  if (!header || header.length === 0) throw new InputError('The CSV file is empty: a header row naming the columns is needed');
  const names = header.map((h) => h.trim());
  const seen = new Map<string, number>();
  names.forEach((h, c) => {
    const key = h.toLowerCase();
    if (seen.has(key)) throw new InputError(`The CSV header names "${h}" twice (columns ${seen.get(key)! + 1} and ${c + 1})`);
    seen.set(key, c);
  });
  rows.forEach((r, i) => {
    if (r.length !== names.length) {
      throw new InputError(`Row ${rowNumbers[i]} of the CSV file has ${r.length} cells but the header has ${names.length} columns`);
    }
  });
  return { header: names, rows, rowNumbers };
}

/** A column's name without a unit in parentheses or square brackets, lower case: "Temperature (degC)" -> "temperature". */
export function bareColumnName(name: string): string {
  return name.replace(/\s*[([][^)\]]*[)\]]\s*/g, ' ').trim().toLowerCase();
}

/** The unit in parentheses of a column name, if any: "Temperature (degC)" -> "degC". */
export function columnUnit(name: string): string | undefined {
  return /\(([^)]*)\)/.exec(name)?.[1]?.trim() || undefined;
}
