/**
 * Turns a table of runs into the data for one response: factor columns hold real settings
 * (numbers) or level labels, coded with the given levels or, without them, with a numeric
 * column's most frequent value below its mid-range as low and above it as high (ties: the more
 * extreme; so one off-target extreme does not rescale every run) and a categorical column's
 * first label in file order as -1. Columns are matched by name with any unit in parentheses ignored; where an
 * "<name> actual" column exists (a Trialbook export), the actual settings are used, and a
 * "<name> planned" column (a filled-in run sheet) is used when nothing else matches. Runs whose
 * response cell is empty are skipped, and so are runs marked excluded; the messages say how many.
 * Throws InputError naming row and column for a value that cannot be read (a number beyond what
 * a calculation carries, NaN or Infinity included), and listing both columns when a name matches
 * two ("Temp (C)" and "Temp (F)").
 */
import { InputError } from '../../core/errors.ts';
import { parseNumber, toCoded } from '../../core/factor/coding.ts';
import { defineFactors, type FactorSpec } from '../../core/factor/factor.ts';
import type { ResponseData } from '../../core/study/response-data.ts';
import { cellNumber, isNonFiniteNumberText, responseMagnitudeProblem, whyNotANumber } from './cell-number.ts';
import { bareColumnName, columnUnit, rowNumber, uniqueColumn, type Table } from './read-table.ts';

export interface TableColumns {
  /** Factor column names, in the order that gives their letters. */
  readonly factors: readonly string[];
  readonly response: string;
  /** Per factor name: [low, high] as text (numbers or level labels). */
  readonly levels?: Readonly<Record<string, readonly [string, string]>>;
  /** Column holding the block of each run. */
  readonly block?: string;
}

const EXCLUDED_WORDS = new Set(['yes', 'true', '1', 'y', 'x', 'excluded']);

function findColumn(table: Table, name: string, what: string): number {
  const key = bareColumnName(name);
  const bare = table.header.map(bareColumnName);
  const actual = uniqueColumn(table, name, `${what} column`, (_, c) => bare[c] === `${key} actual`);
  if (actual >= 0) return actual;
  const exact = table.header.findIndex((h) => h.toLowerCase() === name.trim().toLowerCase());
  if (exact >= 0) return exact;
  // Two columns with the same name and different units ("Temp (C)", "Temp (F)") are refused, not picked.
  const loose = uniqueColumn(table, name, `${what} column`, (_, c) => bare[c] === key);
  if (loose >= 0) return loose;
  // A filled-in run sheet from the design command has only planned settings.
  const planned = uniqueColumn(table, name, `${what} column`, (_, c) => bare[c] === `${key} planned`);
  if (planned >= 0) return planned;
  throw new InputError(`The ${what} column "${name}" is not in the file (columns: ${table.header.join(', ')})`);
}

export function tableResponseData(table: Table, cols: TableColumns): ResponseData {
  if (cols.factors.length === 0) throw new InputError('Name at least one factor column');
  const fIdx = cols.factors.map((f) => findColumn(table, f, 'factor'));
  const yIdx = findColumn(table, cols.response, 'response');
  const bIdx = cols.block ? findColumn(table, cols.block, 'block') : -1;
  const exIdx = table.header.findIndex((h) => bareColumnName(h) === 'excluded');
  const runIdx = table.header.findIndex((h) => bareColumnName(h) === 'run');
  const messages: string[] = [...(table.messages ?? [])];

  // Rows used: a response value present and not excluded.
  const used: number[] = [];
  let excluded = 0;
  let missing = 0;
  table.rows.forEach((row, r) => {
    if (exIdx >= 0 && EXCLUDED_WORDS.has(row[exIdx].trim().toLowerCase())) return void excluded++;
    if (row[yIdx].trim() === '') return void missing++;
    used.push(r);
  });
  if (excluded > 0) messages.push(`${excluded} excluded run${excluded > 1 ? 's' : ''} skipped`);
  if (missing > 0) messages.push(`${missing} run${missing > 1 ? 's' : ''} without a value for ${cols.response} skipped`);

  const specs: FactorSpec[] = cols.factors.map((_name, j) => {
    const c = fIdx[j];
    const header = table.header[c];
    const factorName = cols.factors[j].trim();
    const given = cols.levels?.[factorName] ?? Object.entries(cols.levels ?? {}).find(([k]) => k.toLowerCase() === factorName.toLowerCase())?.[1];
    const cells = used.map((r) => table.rows[r][c].trim());
    cells.forEach((v, i) => {
      if (v === '') throw new InputError(`Row ${rowNumber(table, used[i])}, column "${header}": ${factorName} has no setting`);
      if (isNonFiniteNumberText(v)) throw new InputError(`Row ${rowNumber(table, used[i])}, column "${header}": ${factorName} needs a number, got "${v}"${whyNotANumber(v, table.delimiter)}`);
    });
    const numeric = cells.every((v) => Number.isFinite(cellNumber(v)));
    const unit = columnUnit(header);
    if (given) {
      const [lo, hi] = given;
      for (const v of given) {
        if (isNonFiniteNumberText(v)) throw new InputError(`The levels given for ${factorName} need finite numbers or labels, got "${v}"${whyNotANumber(v)}`);
      }
      const nlo = parseNumber(lo);
      const nhi = parseNumber(hi);
      if (Number.isFinite(nlo) && Number.isFinite(nhi)) {
        return { kind: 'numeric', name: factorName, low: nlo, high: nhi, ...(unit ? { unit } : {}) };
      }
      return { kind: 'categorical', name: factorName, levels: [lo, hi] };
    }
    if (numeric) {
      const [low, high] = inferredLevels(cells.map(parseNumber));
      return { kind: 'numeric', name: factorName, low, high, ...(unit ? { unit } : {}) };
    }
    const labels: string[] = [];
    for (const v of cells) if (!labels.some((l) => l.toLowerCase() === v.toLowerCase())) labels.push(v);
    if (labels.length !== 2) {
      throw new InputError(
        `${factorName} needs numbers or exactly two level labels, got ${labels.length} label${labels.length === 1 ? '' : 's'} (${labels.slice(0, 5).join(', ')})${labels.map((l) => whyNotANumber(l, table.delimiter)).find((w) => w !== '') ?? ''}`,
      );
    }
    return { kind: 'categorical', name: factorName, levels: [labels[0], labels[1]] };
  });
  const factors = defineFactors(specs);

  const coded: number[][] = [];
  const y: number[] = [];
  const blocks: number[] = [];
  const labels: string[] = [];
  const blockIds = new Map<string, number>();
  for (const r of used) {
    const row = table.rows[r];
    coded.push(
      factors.map((f, j) => {
        const cell = row[fIdx[j]].trim();
        try {
          return toCoded(f, cell);
        } catch (err) {
          throw new InputError(`Row ${rowNumber(table, r)}, column "${table.header[fIdx[j]]}": ${(err as Error).message}`);
        }
      }),
    );
    const v = cellNumber(row[yIdx]);
    if (!Number.isFinite(v)) throw new InputError(`Row ${rowNumber(table, r)}, column "${table.header[yIdx]}": ${cols.response} needs a number, got "${row[yIdx]}"${whyNotANumber(row[yIdx], table.delimiter)}`);
    const big = responseMagnitudeProblem(v);
    if (big) throw new InputError(`Row ${rowNumber(table, r)}, column "${table.header[yIdx]}": ${cols.response} ${big}`);
    y.push(v);
    if (bIdx >= 0) {
      const b = row[bIdx].trim();
      if (b === '') throw new InputError(`Row ${rowNumber(table, r)}, column "${table.header[bIdx]}": the block is empty`);
      if (isNonFiniteNumberText(b)) throw new InputError(`Row ${rowNumber(table, r)}, column "${table.header[bIdx]}": the block needs a number or a name, got "${b}"${whyNotANumber(b, table.delimiter)}`);
      if (!blockIds.has(b)) blockIds.set(b, Number.isFinite(cellNumber(b)) ? cellNumber(b) : blockIds.size + 1);
      blocks.push(blockIds.get(b)!);
    }
    labels.push(runIdx >= 0 && row[runIdx].trim() !== '' ? row[runIdx].trim() : String(r + 1));
  }
  const unit = columnUnit(table.header[yIdx]);
  return {
    factors,
    response: cols.response,
    ...(unit ? { unit } : {}),
    coded,
    y,
    blocks: bIdx >= 0 ? blocks : null,
    labels,
    messages,
  };
}

/**
 * Low and high of a numeric column without given levels: the most frequent value below the
 * mid-range (min + max) / 2 and the most frequent above it; ties go to the more extreme value.
 * Common practice (the plan's levels are the values most runs were set to). A column with one
 * value gives it twice, which defineFactors refuses with its own message.
 */
export function inferredLevels(values: readonly number[]): [number, number] {
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const mid = (lo + hi) / 2;
  const counts = new Map<number, number>();
  for (const v of values) counts.set(v, (counts.get(v) ?? 0) + 1);
  let low = lo;
  let high = hi;
  let nLow = 0;
  let nHigh = 0;
  for (const [v, c] of counts) {
    if (v < mid && (c > nLow || (c === nLow && v < low))) [low, nLow] = [v, c];
    if (v > mid && (c > nHigh || (c === nHigh && v > high))) [high, nHigh] = [v, c];
  }
  return [low, high];
}
