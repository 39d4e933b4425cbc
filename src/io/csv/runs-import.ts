/**
 * A CSV of runs made elsewhere (factor columns and response columns) becomes a new study, after
 * a mapping step: inspectRunsCsv proposes which column is what, the person confirms or changes
 * it, and mapRunsCsv checks every cell and builds the study's plan (one planned run per row, in
 * file order, coded from the row's settings) and one logged run per row. Any cell that cannot
 * be read stops the import with a message naming its row and column; nothing is half made.
 * Example: "Temperature (degC),Gloss\n160,80\n200,91\n" maps to a study with the factor
 * Temperature (160 to 200 degC) and the response Gloss, with two runs.
 * When every factor also has a column of planned settings (a Trialbook export's "<name> planned",
 * or a column the person maps as one), the plan is those planned settings and the logged runs
 * keep their actual settings, exactly as runs logged on the phone: the plan then decides what can
 * be estimated (core/fit/nominal-settings.ts), as when the command line reads the same file
 * (exported-csv.ts). A Trialbook export is recognised by its columns and mapped that way at once.
 */
import { InputError } from '../../core/errors.ts';
import { parseNumber, toCoded } from '../../core/factor/coding.ts';
import { defineFactors, type Factor, type FactorSpec } from '../../core/factor/factor.ts';
import type { DesignRun } from '../../core/design/design.ts';
import type { Response } from '../../core/study/response.ts';
import { parseReadings } from '../../core/study/run-form.ts';
import { checkRunValues, type RunValues, type StudyPlan } from '../../core/study/study.ts';
import { SETTING_TOLERANCE } from '../../core/tolerance.ts';
import { MAX_TEXT, MAX_TIME } from '../../core/records/field-checks.ts';
import { checkNewFactor } from '../../core/factor/new-factor.ts';
import { cellNumber, isNonFiniteNumberText, responseMagnitudeProblem, whyNotANumber } from './cell-number.ts';
import { bareColumnName, columnUnit, readTable, rowNumber, type Table } from './read-table.ts';
import { exportedCsvLayout, factorSpec } from './exported-csv.ts';
import { RUN_KINDS, type RunKind } from '../../core/design/design.ts';
import {
  IMPORTED_WITH_PLAN_NOTE,
  importedWithPlanSummary,
  plannedCellMissing,
  plannedCellUnreadable,
  plannedColumnsPartial,
  runKindUnknown,
  unloggedRowsNote,
  wholeNumberNeeded,
} from '../../core/text/imported-plan-text.ts';

export type ColumnRole = 'factor' | 'planned' | 'response' | 'block' | 'kind' | 'standardOrder' | 'replicate' | 'notes' | 'excluded' | 'reason' | 'operator' | 'time' | 'ignore';

export interface FactorColumn {
  readonly column: string;
  /** Name of the factor; the column name without its unit when not given. */
  readonly name?: string;
  readonly unit?: string;
  /** Low and high settings; the column's minimum and maximum when not given. */
  readonly low?: number;
  readonly high?: number;
  /** Two level labels for a categorical factor; the column's two labels in file order when not given. */
  readonly levels?: readonly [string, string];
  readonly scale?: 'linear' | 'log';
  /**
   * The column of the factor's planned settings (same units or labels as its actual settings),
   * when the file has one; then low and high default to the planned settings' minimum and maximum.
   */
  readonly planned?: string;
}

export interface ResponseColumn {
  readonly column: string;
  readonly name?: string;
  readonly unit?: string;
  readonly goal: Response['goal'];
  readonly target?: number;
  /** The lowest value the response can take (0: cannot be negative); none when not given. */
  readonly lowerBound?: number | null;
}

export interface CsvMapping {
  readonly title: string;
  readonly purpose?: string;
  readonly factors: readonly FactorColumn[];
  readonly responses: readonly ResponseColumn[];
  readonly block?: string;
  /** The column of each run's kind (factorial, center, axial, path, confirmation); from its settings when not given. */
  readonly kind?: string;
  /** The columns of each run's standard order (empty for none) and replicate; from its settings when not given. */
  readonly standardOrder?: string;
  readonly replicate?: string;
  readonly notes?: string;
  readonly excluded?: string;
  readonly reason?: string;
  readonly operator?: string;
  readonly time?: string;
}

export interface ColumnInfo {
  readonly header: string;
  /** The column name without its unit. */
  readonly name: string;
  readonly unit?: string;
  /** True when every non-empty cell is a number (a response cell may hold several readings). */
  readonly numeric: boolean;
  /** Distinct values, at most 5, for the mapping screen. */
  readonly sample: readonly string[];
  readonly distinct: number;
  readonly empty: number;
  /** What the column looks like it is. */
  readonly role: ColumnRole;
}

export interface CsvInspection {
  readonly rows: number;
  readonly columns: readonly ColumnInfo[];
  /** A mapping from the guessed roles, to show and let the person change. */
  readonly suggestion: CsvMapping;
  /** What reading did that the person should know (decimal commas read as points). */
  readonly messages: readonly string[];
}

export interface CsvRunsImport {
  readonly plan: StudyPlan;
  readonly runs: readonly { readonly plannedRun: number; readonly values: RunValues }[];
}

const ROLE_WORDS: [RegExp, ColumnRole][] = [
  [/^(run|run no\.?|run number|std order|standard order|order|#)$/, 'ignore'],
  [/^block$/, 'block'],
  [/^(notes?|comments?|remarks?)$/, 'notes'],
  [/^excluded$/, 'excluded'],
  [/^(reason|exclusion reason)$/, 'reason'],
  [/^(operator|logged by|who)$/, 'operator'],
  [/^(time|logged at|date|timestamp)$/, 'time'],
];

function isNumberCell(v: string): boolean {
  return Number.isFinite(cellNumber(v));
}

/** Looks at a CSV of runs and guesses each column's role (last numeric columns are responses). */
export function inspectRunsCsv(text: string, title = 'Imported runs'): CsvInspection {
  const table = readTable(text);
  if (table.rows.length === 0) throw new InputError('The CSV file has a header but no runs');
  const exported = exportedInspection(table, title);
  if (exported) return exported;
  const columns: ColumnInfo[] = table.header.map((header, c) => {
    const cells = table.rows.map((r) => r[c].trim());
    const filled = cells.filter((v) => v !== '');
    const distinctSet = [...new Set(filled)];
    const numeric = filled.length > 0 && filled.every((v) => v.split(/[\s;]+/).every(isNumberCell));
    const bare = bareColumnName(header);
    const word = ROLE_WORDS.find(([re]) => re.test(bare));
    const unit = columnUnit(header);
    return {
      header,
      name: header.replace(/\s*\([^)]*\)\s*/g, ' ').trim() || header,
      ...(unit ? { unit } : {}),
      numeric,
      sample: distinctSet.slice(0, 5),
      distinct: distinctSet.length,
      empty: cells.length - filled.length,
      role: word ? word[1] : 'factor',
    };
  });
  // A factor column has two levels (or a few settings) and no blanks; a numeric column with
  // many distinct values, or with blanks, reads as a response.
  const n = table.rows.length;
  const guessed = columns.map((col) => {
    if (col.role !== 'factor') return col;
    if (!col.numeric) return { ...col, role: col.distinct === 2 && col.empty === 0 ? ('factor' as const) : ('ignore' as const) };
    const looksLikeFactor = col.empty === 0 && col.distinct <= Math.max(3, Math.floor(n / 2));
    return { ...col, role: looksLikeFactor ? ('factor' as const) : ('response' as const) };
  });
  if (!guessed.some((c) => c.role === 'response')) {
    const last = [...guessed].reverse().find((c) => c.role === 'factor' && c.numeric);
    if (last) guessed[guessed.indexOf(last)] = { ...last, role: 'response' };
  }
  const pick = (role: ColumnRole) => guessed.find((c) => c.role === role)?.header;
  const suggestion: CsvMapping = {
    title,
    factors: guessed.filter((c) => c.role === 'factor').map((c) => ({ column: c.header })),
    responses: guessed.filter((c) => c.role === 'response').map((c) => ({ column: c.header, goal: 'maximize' as const })),
    ...(pick('block') ? { block: pick('block') } : {}),
    ...(pick('notes') ? { notes: pick('notes') } : {}),
    ...(pick('excluded') ? { excluded: pick('excluded') } : {}),
    ...(pick('reason') ? { reason: pick('reason') } : {}),
    ...(pick('operator') ? { operator: pick('operator') } : {}),
    ...(pick('time') ? { time: pick('time') } : {}),
  };
  return { rows: n, columns: guessed, suggestion, messages: table.messages ?? [] };
}

/** The column facts shown on the mapping screen, with the given role. */
function columnInfo(table: Table, c: number, role: ColumnRole): ColumnInfo {
  const header = table.header[c];
  const cells = table.rows.map((r) => r[c].trim());
  const filled = cells.filter((v) => v !== '');
  const distinctSet = [...new Set(filled)];
  const unit = columnUnit(header);
  return {
    header,
    name: header.replace(/\s*\([^)]*\)\s*/g, ' ').trim() || header,
    ...(unit ? { unit } : {}),
    numeric: filled.length > 0 && filled.every((v) => v.split(/[\s;]+/).every(isNumberCell)),
    sample: distinctSet.slice(0, 5),
    distinct: distinctSet.length,
    empty: cells.length - filled.length,
    role,
  };
}

/**
 * A Trialbook export's mapping: each factor's actual column with its planned column and the
 * coding recovered from its coded column, each response's readings column (every reading kept),
 * and Block, Kind, Logged at, Operator, Notes, Excluded and Reason. Null for any other file, or
 * when the coding cannot be recovered (the file was changed): the plain guess then applies.
 */
function exportedInspection(table: Table, title: string): CsvInspection | null {
  const layout = exportedCsvLayout(table);
  if (!layout || layout.factors.some((f) => f.planned < 0)) return null;
  const bare = table.header.map(bareColumnName);
  const readings = layout.responses.map((r) => bare.indexOf(`${bareColumnName(table.header[r.value])} readings`));
  if (readings.some((c) => c < 0)) return null;
  const all = table.rows.map((_, i) => i);
  let specs: ReturnType<typeof factorSpec>[];
  try {
    specs = layout.factors.map((f) => factorSpec(table, f, all));
  } catch (err) {
    if (err instanceof InputError) return null;
    throw err;
  }
  const roles = new Map<number, ColumnRole>();
  layout.factors.forEach((f) => {
    roles.set(f.actual, 'factor');
    roles.set(f.planned, 'planned');
  });
  readings.forEach((c) => roles.set(c, 'response'));
  roles.set(layout.kind, 'kind');
  if (layout.block >= 0) roles.set(layout.block, 'block');
  const stdOrder = bare.indexOf('std order');
  const replicate = bare.indexOf('replicate');
  if (stdOrder >= 0) roles.set(stdOrder, 'standardOrder');
  if (replicate >= 0) roles.set(replicate, 'replicate');
  const named = (role: ColumnRole, word: string) => {
    const c = bare.indexOf(word);
    if (c >= 0 && !roles.has(c)) roles.set(c, role);
    return c >= 0 && roles.get(c) === role ? table.header[c] : undefined;
  };
  const optional = { notes: named('notes', 'notes'), excluded: named('excluded', 'excluded'), reason: named('reason', 'reason'), operator: named('operator', 'operator'), time: named('time', 'logged at') };
  const suggestion: CsvMapping = {
    title,
    factors: layout.factors.map((f, j) => {
      const s = specs[j];
      const unit = columnUnit(table.header[f.actual]);
      const base = { column: table.header[f.actual], name: s.name, planned: table.header[f.planned], ...(unit ? { unit } : {}) };
      return s.kind === 'categorical' ? { ...base, levels: [s.levels[0], s.levels[1]] as const } : { ...base, low: s.low, high: s.high, ...(s.scale ? { scale: s.scale } : {}) };
    }),
    responses: layout.responses.map((r, j) => {
      const unit = columnUnit(table.header[r.value]);
      return { column: table.header[readings[j]], name: r.name, ...(unit ? { unit } : {}), goal: 'maximize' as const };
    }),
    ...(layout.block >= 0 ? { block: table.header[layout.block] } : {}),
    kind: table.header[layout.kind],
    ...(stdOrder >= 0 ? { standardOrder: table.header[stdOrder] } : {}),
    ...(replicate >= 0 ? { replicate: table.header[replicate] } : {}),
    ...Object.fromEntries(Object.entries(optional).filter(([, v]) => v !== undefined)),
  };
  const columns = table.header.map((_, c) => columnInfo(table, c, roles.get(c) ?? 'ignore'));
  return { rows: table.rows.length, columns, suggestion, messages: table.messages ?? [] };
}

function columnIndex(table: Table, name: string, what: string): number {
  const exact = table.header.findIndex((h) => h === name);
  const c = exact >= 0 ? exact : table.header.findIndex((h) => h.toLowerCase() === name.trim().toLowerCase());
  if (c < 0) throw new InputError(`The ${what} column "${name}" is not in the file (columns: ${table.header.join(', ')})`);
  return c;
}

const cellAt = (row: number, table: Table, c: number) => `Row ${rowNumber(table, row)}, column ${c + 1} ("${table.header[c]}")`;

const YES = new Set(['yes', 'y', 'true', '1', 'x', 'excluded']);
const NO = new Set(['', 'no', 'n', 'false', '0']);

/** Builds the study and its runs from a CSV and a confirmed mapping; throws naming row and column. */
export function mapRunsCsv(text: string, mapping: CsvMapping): CsvRunsImport {
  const table = readTable(text);
  if (table.rows.length === 0) throw new InputError('The CSV file has a header but no runs');
  if (mapping.title.trim() === '') throw new InputError('The new study needs a title, got none');
  if (mapping.factors.length === 0) throw new InputError('Map at least one column to a factor');
  if (mapping.responses.length === 0) throw new InputError('Map at least one column to a response');
  const used = new Map<number, string>();
  const claim = (name: string, what: string) => {
    const c = columnIndex(table, name, what);
    if (used.has(c)) throw new InputError(`Column ${c + 1} ("${table.header[c]}") is mapped twice (as ${used.get(c)} and as ${what})`);
    used.set(c, what);
    return c;
  };
  const fIdx = mapping.factors.map((f) => claim(f.column, 'factor'));
  // The planned settings: for every factor or for none (a plan needs each run's whole point).
  const withPlan = mapping.factors.some((f) => f.planned !== undefined);
  if (withPlan && mapping.factors.some((f) => f.planned === undefined)) {
    throw new InputError(plannedColumnsPartial(mapping.factors.filter((f) => f.planned === undefined).map((f) => f.name ?? f.column)));
  }
  const pIdx = mapping.factors.map((f) => (f.planned === undefined ? -1 : claim(f.planned, 'planned setting')));
  const rIdx = mapping.responses.map((r) => claim(r.column, 'response'));
  const opt = (name: string | undefined, what: string) => (name === undefined ? -1 : claim(name, what));
  const bIdx = opt(mapping.block, 'block');
  const kIdx = opt(mapping.kind, 'kind');
  const sIdx = opt(mapping.standardOrder, 'standard order');
  const repIdx = opt(mapping.replicate, 'replicate');
  /** A whole number from 1 in a cell (empty allowed where `blank` says so), or a message naming the cell. */
  const wholeCell = (i: number, c: number, what: string, blank: boolean): number | null => {
    const v = table.rows[i][c].trim();
    if (v === '' && blank) return null;
    const n = parseNumber(v);
    if (!Number.isInteger(n) || n < 1) throw new InputError(wholeNumberNeeded(cellAt(i, table, c), what, v, blank));
    return n;
  };
  const nIdx = opt(mapping.notes, 'notes');
  const xIdx = opt(mapping.excluded, 'excluded');
  const reIdx = opt(mapping.reason, 'reason');
  const oIdx = opt(mapping.operator, 'operator');
  const tIdx = opt(mapping.time, 'time');

  // With a plan, a row with no actual setting and no reading is a planned run not yet logged
  // (the export writes one for each), kept in the plan without a logged run.
  const unlogged = table.rows.map((r) => withPlan && fIdx.every((c) => r[c].trim() === '') && rIdx.every((c) => r[c].trim() === ''));
  const specs: FactorSpec[] = mapping.factors.map((f, j) => {
    const c = fIdx[j];
    const header = table.header[c];
    const name = (f.name ?? header.replace(/\s*\([^)]*\)\s*/g, ' ')).trim();
    const unit = f.unit ?? columnUnit(header);
    // With a plan, the levels come from the planned settings, never from the noise in the actual ones.
    const source = withPlan ? pIdx[j] : c;
    const cells = table.rows.map((r, i) => {
      const v = r[source].trim();
      if (v === '' && withPlan) throw new InputError(plannedCellMissing(cellAt(i, table, source), name));
      if (v === '') throw new InputError(`${cellAt(i, table, c)}: ${name} has no setting`);
      if (isNonFiniteNumberText(v)) throw new InputError(`${cellAt(i, table, source)}: ${name} needs a number, got "${v}"${whyNotANumber(v, table.delimiter)}`);
      return v;
    });
    // Given low and high make the factor numeric: then every cell must be a number.
    const numeric = f.levels === undefined && (f.low !== undefined || f.high !== undefined || cells.every(isNumberCell));
    const notNumber = numeric ? cells.findIndex((v) => !isNumberCell(v)) : -1;
    if (notNumber >= 0) {
      const v = cells[notNumber];
      const why = `${name} needs a number, got "${v}"${whyNotANumber(v, table.delimiter)}`;
      const at = cellAt(notNumber, table, source);
      throw new InputError(withPlan ? plannedCellUnreadable(at, why) : `${at}: ${why}`);
    }
    if (numeric) {
      const values = cells.map(parseNumber);
      return {
        kind: 'numeric',
        name,
        low: f.low ?? Math.min(...values),
        high: f.high ?? Math.max(...values),
        ...(unit ? { unit } : {}),
        ...(f.scale ? { scale: f.scale } : {}),
      };
    }
    if (f.levels) return { kind: 'categorical', name, levels: [f.levels[0], f.levels[1]] };
    const labels: string[] = [];
    for (const v of cells) if (!labels.some((l) => l.toLowerCase() === v.toLowerCase())) labels.push(v);
    if (labels.length !== 2) {
      const bad = cells.findIndex((v) => !isNumberCell(v));
      throw new InputError(
        `${cellAt(bad, table, source)}: ${name} needs numbers in every row, or exactly two level labels, got ${labels.length} labels (${labels.slice(0, 5).join(', ')})${whyNotANumber(cells[bad], table.delimiter)}`,
      );
    }
    return { kind: 'categorical', name, levels: [labels[0], labels[1]] };
  });
  let factors: Factor[];
  try {
    // A new study: its names and levels must be usable by every command (checkNewFactor).
    specs.forEach(checkNewFactor);
    factors = defineFactors(specs);
  } catch (err) {
    throw err instanceof InputError ? new InputError(`Factor columns: ${err.message}`) : err;
  }
  const responses: Response[] = mapping.responses.map((r, j) => {
    const header = table.header[rIdx[j]];
    const unit = r.unit ?? columnUnit(header);
    const name = (r.name ?? header.replace(/\s*\([^)]*\)\s*/g, ' ')).trim();
    if (r.goal === 'target' && (r.target === undefined || !Number.isFinite(r.target))) throw new InputError(`${name}: the goal "target" needs a target value`);
    return { name, goal: r.goal, ...(unit ? { unit } : {}), ...(r.goal === 'target' ? { target: r.target } : {}), ...(r.lowerBound != null ? { lowerBound: r.lowerBound } : {}) };
  });

  const designRuns: DesignRun[] = [];
  const runs: { plannedRun: number; values: RunValues }[] = [];
  const seenPoints = new Map<string, number>();
  const plan0 = { title: mapping.title.trim(), purpose: mapping.purpose ?? '', factors, responses };
  let notLogged = 0;
  table.rows.forEach((row, i) => {
    const plannedCoded = withPlan
      ? factors.map((f, j) => {
          try {
            return toCoded(f, row[pIdx[j]].trim());
          } catch (err) {
            throw err instanceof InputError ? new InputError(plannedCellUnreadable(cellAt(i, table, pIdx[j]), err.message)) : err;
          }
        })
      : null;
    const actual = unlogged[i] ? [] : factors.map((f, j) => {
      const cell = row[fIdx[j]].trim();
      if (cell === '') throw new InputError(`${cellAt(i, table, fIdx[j])}: ${f.name} has no setting`);
      if (f.kind === 'categorical') return cell;
      const x = parseNumber(cell);
      if (!Number.isFinite(x)) throw new InputError(`${cellAt(i, table, fIdx[j])}: ${f.name} needs a number, got "${cell}"`);
      return x;
    });
    const actualCoded = actual.map((v, j) => {
      try {
        return toCoded(factors[j], v);
      } catch (err) {
        throw err instanceof InputError ? new InputError(`${cellAt(i, table, fIdx[j])}: ${err.message}`) : err;
      }
    });
    const coded = plannedCoded ?? actualCoded;
    const readings = unlogged[i] ? [] : responses.map((r, j) => {
      // A reading that is a decimal comma, 1e400, NaN or Infinity gets the file's own advice.
      const parts = row[rIdx[j]].split(/[\s;]+/).filter((t) => t !== '');
      const k = parts.findIndex((t) => !isNumberCell(t) && whyNotANumber(t, table.delimiter) !== '');
      if (k >= 0) throw new InputError(`${cellAt(i, table, rIdx[j])}: ${r.name}: reading ${k + 1} needs a number, got "${parts[k]}"${whyNotANumber(parts[k], table.delimiter)}`);
      let values: number[];
      try {
        values = parseReadings(row[rIdx[j]], r.name);
      } catch (err) {
        throw err instanceof InputError ? new InputError(`${cellAt(i, table, rIdx[j])}: ${err.message}`) : err;
      }
      const big = values.findIndex((v) => responseMagnitudeProblem(v) !== '');
      if (big >= 0) throw new InputError(`${cellAt(i, table, rIdx[j])}: ${r.name}: reading ${big + 1} ${responseMagnitudeProblem(values[big])}`);
      return values;
    });
    let block = 1;
    if (bIdx >= 0) {
      const b = row[bIdx].trim();
      const n = parseNumber(b);
      if (!Number.isInteger(n) || n < 1) throw new InputError(`${cellAt(i, table, bIdx)}: the block needs a whole number from 1, got "${b}"`);
      block = n;
    }
    let excluded = false;
    if (xIdx >= 0) {
      const x = row[xIdx].trim().toLowerCase();
      if (YES.has(x)) excluded = true;
      else if (!NO.has(x)) throw new InputError(`${cellAt(i, table, xIdx)}: Excluded needs yes or no, got "${row[xIdx]}"`);
    }
    const reason = reIdx >= 0 ? row[reIdx].trim() : '';
    const time = tIdx >= 0 && row[tIdx].trim() !== '' ? row[tIdx].trim() : null;
    if (time !== null && (Number.isNaN(Date.parse(time)) || time.length > MAX_TIME)) {
      throw new InputError(`${cellAt(i, table, tIdx)}: the time needs a date and time (ISO 8601, e.g. 2024-05-02T14:30), got "${time.length > 60 ? time.slice(0, 60) + '...' : time}"`);
    }
    for (const [c, what] of [[nIdx, 'the notes'], [reIdx, 'the reason'], [oIdx, 'the operator']] as const) {
      if (c >= 0 && row[c].length > MAX_TEXT) throw new InputError(`${cellAt(i, table, c)}: ${what} can hold at most ${MAX_TEXT} characters, got ${row[c].length}`);
    }
    const corner = coded.every((v) => Math.abs(Math.abs(v) - 1) <= SETTING_TOLERANCE);
    // A center run has every numeric factor at 0 (a categorical one stays at a level).
    const center = withPlan
      ? factors.some((f) => f.kind === 'numeric') && coded.every((v, j) => factors[j].kind === 'categorical' || Math.abs(v) <= SETTING_TOLERANCE)
      : coded.every((v) => Math.abs(v) <= SETTING_TOLERANCE);
    let kind: RunKind = center ? 'center' : 'factorial';
    if (kIdx >= 0) {
      const k = row[kIdx].trim().toLowerCase();
      if (!(RUN_KINDS as readonly string[]).includes(k)) throw new InputError(runKindUnknown(cellAt(i, table, kIdx), row[kIdx].trim(), RUN_KINDS));
      kind = k as RunKind;
    }
    const key = coded.map((v) => v.toPrecision(12)).join(',');
    const counted = (seenPoints.get(key) ?? 0) + 1;
    seenPoints.set(key, counted);
    const replicate = repIdx >= 0 ? wholeCell(i, repIdx, 'the replicate', false)! : counted;
    const standardOrder = sIdx >= 0 ? wholeCell(i, sIdx, 'the standard order', true) : corner ? 1 + coded.reduce((s, v, j) => s + (v > 0 ? 2 ** j : 0), 0) : null;
    designRuns.push({
      run: i + 1,
      standardOrder,
      replicate,
      block,
      originBlock: block,
      kind,
      coded,
    });
    if (unlogged[i]) return void notLogged++;
    const raw: RunValues = {
      actual,
      readings,
      loggedAt: time,
      operator: oIdx >= 0 && row[oIdx].trim() !== '' ? row[oIdx].trim() : null,
      notes: nIdx >= 0 ? row[nIdx] : '',
      excluded,
      reason: excluded ? reason || 'excluded in the imported file' : '',
    };
    try {
      runs.push({ plannedRun: i + 1, values: checkRunValues(plan0, raw) });
    } catch (err) {
      throw err instanceof InputError ? new InputError(`Row ${rowNumber(table, i)}: ${err.message}`) : err;
    }
  });
  const messages = [...(table.messages ?? []), ...(notLogged > 0 ? [unloggedRowsNote(notLogged)] : [])];
  const plan: StudyPlan = {
    ...plan0,
    design: {
      runs: designRuns,
      generators: [],
      definingRelation: [],
      resolution: null,
      wordLengths: {},
      aliases: [],
      blockWords: [],
      seed: null,
      summary: withPlan ? importedWithPlanSummary(table.rows.length) : `Imported from a CSV file of ${table.rows.length} runs; the planned settings are the settings in the file.`,
      notes: [withPlan ? IMPORTED_WITH_PLAN_NOTE : 'The runs were made elsewhere: their order and settings are as the file gives them, not a plan made here.', ...messages],
    },
  };
  return { plan, runs };
}
