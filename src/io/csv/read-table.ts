/**
 * Reads CSV text into a header and rows of strings, with papaparse (RFC 4180 quoting; a leading
 * byte-order mark is dropped). Blank lines are skipped.
 * - The separator is found among ",", ";", tab and "|" (guessDelimiter) and reported in `delimiter`.
 * - Line ends: CRLF, LF and CR may be mixed in one file (a file edited in two programs); outside
 *   quoted cells each is one line end, inside a quoted cell it is kept as it is.
 * - A cell guarded against formulas by a leading single quote (formula-guard.ts) is read without
 *   it, so a Trialbook export reads back as it was written.
 * - In a file separated by ";" or tabs (a European spreadsheet's export), a column whose every
 *   filled cell is a number or numbers with a decimal comma ("12,5" or readings "12,5 13,1") and
 *   none with a point is read with decimal points; `messages` says which columns.
 * Throws InputError naming the row for a malformed file, an empty file or duplicate column names.
 * Example: readTable('a,b\n\n1,2\n') -> { header: ['a','b'], rows: [['1','2']], rowNumbers: [3], delimiter: ',', messages: [] }.
 */
import Papa from 'papaparse';
import { InputError } from '../../core/errors.ts';
import { unguardCell } from './formula-guard.ts';

export interface Table {
  readonly header: readonly string[];
  /** Data rows (the header and blank lines excluded); rows[r][c] is column c + 1 of row rowNumber(table, r). */
  readonly rows: readonly (readonly string[])[];
  /** The file's row number of each data row (the header is row 1; blank lines count). */
  readonly rowNumbers: readonly number[];
  /** The separator between cells, for messages. */
  readonly delimiter?: string;
  /** What reading did that a person should know (decimal commas read), for the report. */
  readonly messages?: readonly string[];
}

/** The file's row number of data row r, for messages. */
export function rowNumber(table: Table, r: number): number {
  return table.rowNumbers[r] ?? r + 2;
}

const DELIMITERS = [',', ';', '\t', '|'];

/**
 * The separator: of ",", ";", tab and "|", the one that splits the first 20 lines into the same
 * number of cells, more than one, the most cells winning; "," when none does (a one-column
 * file, or a ragged one, which is then refused with its row). Quoting is respected (papaparse
 * splits the sample). Common practice; papaparse's own guess is thrown off by a final line end.
 */
function guessDelimiter(body: string): string {
  const sample = body.slice(0, 65536).replace(/\r\n?/g, '\n');
  let best = ',';
  let bestCells = 1;
  for (const d of DELIMITERS) {
    const rows = Papa.parse<string[]>(sample, { delimiter: d, newline: '\n', preview: 20, skipEmptyLines: 'greedy' }).data;
    const n = rows[0]?.length ?? 0;
    if (n > bestCells && rows.every((r) => r.length === n)) {
      best = d;
      bestCells = n;
    }
  }
  return best;
}

/**
 * Every CRLF and lone CR outside quoted cells made LF. A cell is quoted when its first character
 * is a double quote (RFC 4180, section 2, rule 5), as papaparse reads it; "" inside it is a quote.
 */
export function uniformLineEnds(text: string, delimiter: string): string {
  if (!text.includes('\r')) return text;
  if (!text.includes('"')) return text.replace(/\r\n?/g, '\n');
  // Jump from one quote or CR to the next; a quote opens a quoted cell only at a cell's start.
  const parts: string[] = [];
  const next = /["\r]/g;
  let last = 0;
  let m: RegExpExecArray | null;
  while ((m = next.exec(text)) !== null) {
    const i = m.index;
    if (m[0] === '\r') {
      parts.push(text.slice(last, i), '\n');
      last = text[i + 1] === '\n' ? i + 2 : i + 1;
      next.lastIndex = last;
      continue;
    }
    const prev = i === 0 ? '\n' : text[i - 1];
    if (prev !== delimiter && prev !== '\n' && prev !== '\r') continue; // a quote inside an unquoted cell
    // Skip the quoted cell: its end is a quote not followed by another.
    let j = i + 1;
    for (;;) {
      const q = text.indexOf('"', j);
      if (q < 0) {
        j = text.length;
        break;
      }
      if (text[q + 1] === '"') j = q + 2;
      else {
        j = q + 1;
        break;
      }
    }
    next.lastIndex = j;
  }
  parts.push(text.slice(last));
  return parts.join('');
}

const COMMA_NUMBER = /^[+-]?(\d+,\d*|,\d+)([eE][+-]?\d+)?$/;
// A number with neither comma nor point, which reads the same in both conventions.
const WHOLE_NUMBER = /^[+-]?\d+([eE][+-]?\d+)?$/;

/** Columns of a ";" or tab file written with decimal commas, read with points (see the file comment). */
function readDecimalCommas(header: string[], rows: string[][]): string[] {
  const converted: string[] = [];
  header.forEach((h, c) => {
    let comma = false;
    for (const row of rows) {
      const cell = row[c].trim();
      if (cell === '' || WHOLE_NUMBER.test(cell)) continue;
      if (COMMA_NUMBER.test(cell)) {
        comma = true;
        continue;
      }
      for (const tok of cell.split(/\s+/)) {
        if (COMMA_NUMBER.test(tok)) comma = true;
        else if (!WHOLE_NUMBER.test(tok)) return;
      }
    }
    if (!comma) return;
    for (const row of rows) row[c] = row[c].split(/(\s+)/).map((t) => (COMMA_NUMBER.test(t) ? t.replace(',', '.') : t)).join('');
    converted.push(`"${h}"`);
  });
  return converted;
}

export function readTable(text: string): Table {
  const bom = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const delimiter = guessDelimiter(bom);
  const body = uniformLineEnds(bom, delimiter);
  // Blank lines are dropped after parsing, not by the parser, so that every row keeps its number.
  const parsed = Papa.parse<string[]>(body, { header: false, skipEmptyLines: false, delimiter, newline: '\n' });
  const bad = parsed.errors.find((e) => e.type !== 'Delimiter');
  if (bad) throw new InputError(`The CSV file cannot be read at row ${(bad.row ?? 0) + 1}: ${bad.message}`);
  const blank = (r: string[]) => r.every((cell) => cell.trim() === '');
  const numbered = parsed.data.map((r, i) => ({ r: r.map(unguardCell), n: i + 1 })).filter(({ r }) => !blank(r));
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
      const hint =
        delimiter === ',' && r.length > names.length && r.some((cell, c) => c > 0 && /^\d+$/.test(cell.trim()) && /\d$/.test(r[c - 1].trim()))
          ? '; if its numbers have decimal commas, save the file with ";" as the separator (decimal commas are read then) or quote those cells'
          : '';
      throw new InputError(`Row ${rowNumbers[i]} of the CSV file has ${r.length} cells but the header has ${names.length} columns${hint}`);
    }
  });
  const messages: string[] = [];
  if (delimiter === ';' || delimiter === '\t') {
    const converted = readDecimalCommas(names, rows);
    if (converted.length > 0) {
      messages.push(`Read as a file separated by ${delimiter === ';' ? 'semicolons' : 'tabs'} with decimal commas in ${converted.length === 1 ? 'the column' : 'the columns'} ${converted.join(', ')}`);
    }
  }
  return { header: names, rows, rowNumbers, delimiter, messages };
}

/**
 * A column's name without a unit in parentheses or square brackets, lower case, in Unicode
 * normal form C (so "é" typed as e and a combining accent matches "é"): "Temperature (degC)" -> "temperature".
 */
export function bareColumnName(name: string): string {
  return name.normalize('NFC').replace(/\s*[([][^)\]]*[)\]]\s*/g, ' ').trim().toLowerCase();
}

/** The unit in parentheses of a column name, if any: "Temperature (degC)" -> "degC". */
export function columnUnit(name: string): string | undefined {
  return /\(([^)]*)\)/.exec(name)?.[1]?.trim() || undefined;
}

/**
 * The one column whose name matches `name` by the rule `matches`, or -1 when none does. Throws
 * InputError listing both when two columns match (say "Temp (C)" and "Temp (F)" for "Temp"),
 * because picking one would be a silent choice.
 */
export function uniqueColumn(table: Table, name: string, what: string, matches: (header: string, c: number) => boolean): number {
  const found = table.header.flatMap((h, c) => (matches(h, c) ? [c] : []));
  if (found.length > 1) {
    throw new InputError(
      `The ${what} "${name}" matches ${found.length} columns: ${found.map((c) => `"${table.header[c]}" (column ${c + 1})`).join(' and ')}; name the column in full, unit included`,
    );
  }
  return found.length === 1 ? found[0] : -1;
}
