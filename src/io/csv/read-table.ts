/**
 * Reads CSV text into a header and rows of strings, with papaparse (RFC 4180 quoting; a leading
 * byte-order mark is dropped). Blank lines are skipped. Throws InputError naming the row for a
 * malformed file, an empty file or duplicate column names.
 * Example: readTable('a,b\n1,2\n') -> { header: ['a','b'], rows: [['1','2']] }.
 */
import Papa from 'papaparse';
import { InputError } from '../../core/errors.ts';

export interface Table {
  readonly header: readonly string[];
  /** Data rows (the header excluded); rows[r][c] is row r + 2 of the file, column c + 1. */
  readonly rows: readonly (readonly string[])[];
}

export function readTable(text: string): Table {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const parsed = Papa.parse<string[]>(body, { header: false, skipEmptyLines: 'greedy' });
  const bad = parsed.errors.find((e) => e.type !== 'Delimiter');
  if (bad) throw new InputError(`The CSV file cannot be read at row ${(bad.row ?? 0) + 1}: ${bad.message}`);
  const [header, ...rows] = parsed.data;
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
      throw new InputError(`Row ${i + 2} of the CSV file has ${r.length} cells but the header has ${names.length} columns`);
    }
  });
  return { header: names, rows };
}

/** A column's name without a unit in parentheses or square brackets, lower case: "Temperature (degC)" -> "temperature". */
export function bareColumnName(name: string): string {
  return name.replace(/\s*[([][^)\]]*[)\]]\s*/g, ' ').trim().toLowerCase();
}

/** The unit in parentheses of a column name, if any: "Temperature (degC)" -> "degC". */
export function columnUnit(name: string): string | undefined {
  return /\(([^)]*)\)/.exec(name)?.[1]?.trim() || undefined;
}
