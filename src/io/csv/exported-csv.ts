/**
 * Reading back a CSV that Trialbook exported (study-csv.ts) for the analysis, with no options
 * needed: the factors are the "<name> coded" columns; each factor's coding (low and high, linear
 * or log scale, or its two level names) is recovered exactly from its actual settings and their
 * coded values; the actual settings are used, excluded runs skipped, runs without a value for the
 * response skipped, and the messages say how many. The "<name> planned" columns, when every
 * factor has one, are the nominal plan (ResponseData.planned): the plan, not the noise in the
 * actual settings, decides what can be estimated, as for the same runs read from a backup. Factor and response columns are matched by name
 * with a unit in parentheses ignored.
 * Example: exportedCsvResponseData(studyCsv(study, runs), 'Gloss').y -> the Gloss means of the runs used.
 */
import { InputError } from '../../core/errors.ts';
import { parseNumber, toCoded } from '../../core/factor/coding.ts';
import { defineFactors, type FactorSpec } from '../../core/factor/factor.ts';
import type { ResponseData } from '../../core/study/response-data.ts';
import { JUDGED_KINDS, judgedKeptOut } from '../../core/study/run-data.ts';
import { cellNumber, isNonFiniteNumberText, responseMagnitudeProblem, whyNotANumber } from './cell-number.ts';
import { bareColumnName, columnUnit, readTable, rowNumber, uniqueColumn, type Table } from './read-table.ts';

/** Relative agreement needed between a coded value and the one the recovered coding gives. */
const CODING_TOLERANCE = 1e-6;

export interface ExportedCsvLayout {
  /** Factor names in declared order, with their actual-settings and coded column indices. */
  readonly factors: readonly { readonly name: string; readonly actual: number; readonly coded: number; readonly planned: number }[];
  /** Response names, with the value (mean) column index. */
  readonly responses: readonly { readonly name: string; readonly value: number }[];
  readonly excluded: number;
  readonly run: number;
  readonly block: number;
  readonly kind: number;
}

/** The columns of a Trialbook export, or null when the table is not one. */
export function exportedCsvLayout(table: Table): ExportedCsvLayout | null {
  const bare = table.header.map(bareColumnName);
  const at = (name: string) => bare.indexOf(name);
  const factors = table.header.flatMap((h, c) => {
    const m = /^(.*) coded$/.exec(bare[c]);
    if (!m) return [];
    const actual = at(`${m[1]} actual`);
    return actual >= 0 ? [{ name: h.replace(/ coded$/, '').trim(), actual, coded: c, planned: at(`${m[1]} planned`) }] : [];
  });
  const responses = table.header.flatMap((h, c) => {
    const m = /^(.*) readings$/.exec(bare[c]);
    if (!m) return [];
    // The value column is the readings column's own name without " readings" (units included).
    const own = table.header.indexOf(h.replace(/\s+readings$/i, ''));
    const value = own >= 0 ? own : at(m[1]);
    return value >= 0 ? [{ name: h.replace(/\s*\([^)]*\)\s*/g, ' ').replace(/ readings$/, '').trim(), value }] : [];
  });
  const excluded = at('excluded');
  if (factors.length === 0 || excluded < 0 || at('run') < 0 || at('kind') < 0) return null;
  return { factors, responses, excluded, run: at('run'), block: at('block'), kind: at('kind') };
}

const round12 = (x: number) => Number(x.toPrecision(12));

function cell(table: Table, r: number, c: number): string {
  return table.rows[r][c].trim();
}

function where(table: Table, r: number, c: number): string {
  return `Row ${rowNumber(table, r)}, column ${c + 1} ("${table.header[c]}")`;
}

/** Recovers one factor's coding from the rows' actual settings and coded values (also used by runs-import.ts). */
export function factorSpec(table: Table, f: ExportedCsvLayout['factors'][number], rows: readonly number[]): FactorSpec {
  const pairs = rows
    .filter((r) => cell(table, r, f.actual) !== '')
    .map((r) => {
      const coded = cellNumber(cell(table, r, f.coded));
      if (!Number.isFinite(coded)) throw new InputError(`${where(table, r, f.coded)}: needs the coded setting as a number, got "${table.rows[r][f.coded]}"${whyNotANumber(table.rows[r][f.coded], table.delimiter)}`);
      const text = cell(table, r, f.actual);
      if (isNonFiniteNumberText(text)) throw new InputError(`${where(table, r, f.actual)}: ${f.name} needs a number, got "${text}"${whyNotANumber(text, table.delimiter)}`);
      return { r, text, coded };
    });
  if (pairs.length === 0) throw new InputError(`Column "${table.header[f.actual]}": ${f.name} has no actual settings in the runs used`);
  const numeric = pairs.every((p) => Number.isFinite(parseNumber(p.text)));
  if (!numeric) {
    const low = pairs.find((p) => p.coded === -1)?.text;
    const high = pairs.find((p) => p.coded === 1)?.text;
    const bad = pairs.find((p) => p.coded !== -1 && p.coded !== 1);
    if (bad) throw new InputError(`${where(table, bad.r, f.coded)}: a categorical factor is coded -1 or +1, got ${bad.coded}`);
    if (low === undefined || high === undefined) throw new InputError(`Column "${table.header[f.actual]}": ${f.name} needs runs at both of its levels`);
    return { kind: 'categorical', name: f.name, levels: [low, high] };
  }
  const pts = pairs.map((p) => ({ ...p, u: parseNumber(p.text) }));
  const lo = pts.reduce((a, b) => (b.coded < a.coded ? b : a));
  const hi = pts.reduce((a, b) => (b.coded > a.coded ? b : a));
  if (hi.coded - lo.coded <= CODING_TOLERANCE) throw new InputError(`Column "${table.header[f.coded]}": ${f.name} needs runs at two different settings`);
  const unit = columnUnit(table.header[f.actual]);
  const fit = (t: (u: number) => number) => {
    const d = (t(hi.u) - t(lo.u)) / (hi.coded - lo.coded);
    const m = t(lo.u) - lo.coded * d;
    const ok = pts.every((p) => Math.abs((t(p.u) - m) / d - p.coded) <= CODING_TOLERANCE * Math.max(1, Math.abs(p.coded)));
    return { ok, low: m - d, high: m + d };
  };
  const linear = fit((u) => u);
  if (linear.ok) return { kind: 'numeric', name: f.name, low: round12(linear.low), high: round12(linear.high), ...(unit ? { unit } : {}) };
  if (pts.every((p) => p.u > 0)) {
    const log = fit(Math.log);
    if (log.ok) return { kind: 'numeric', name: f.name, low: round12(Math.exp(log.low)), high: round12(Math.exp(log.high)), scale: 'log', ...(unit ? { unit } : {}) };
  }
  throw new InputError(`Column "${table.header[f.coded]}": the coded settings of ${f.name} do not follow its actual settings on a linear or a log scale; the file was changed after export`);
}

/**
 * The analysis data of one response from a Trialbook CSV export. `factorNames` picks and orders
 * the factors (names matched with any unit ignored); all of them in the file's order by default.
 * Throws InputError when the file is not a Trialbook export, or naming row and column for a cell
 * that cannot be read.
 */
export function exportedCsvResponseData(csvText: string, responseName: string, factorNames?: readonly string[]): ResponseData {
  const table = readTable(csvText);
  const layout = exportedCsvLayout(table);
  if (!layout) {
    throw new InputError('This CSV is not a Trialbook export: it needs the columns Run, Kind and Excluded, and for each factor "<name> actual" and "<name> coded"');
  }
  // The column named in full first ("Gloss (GU)"), else the one response whose bare name matches.
  const key = bareColumnName(responseName);
  const full = layout.responses.find((r) => table.header[r.value].toLowerCase() === responseName.trim().toLowerCase());
  const responses = full ? [full] : layout.responses.filter((r) => bareColumnName(r.name) === key);
  if (responses.length > 1) {
    throw new InputError(`The response "${responseName}" matches ${responses.length} columns: ${responses.map((r) => `"${table.header[r.value]}" (column ${r.value + 1})`).join(' and ')}; name it in full, unit included`);
  }
  const response = responses[0];
  if (!response) throw new InputError(`The export has no response "${responseName}"; its responses are ${layout.responses.map((r) => `"${r.name}"`).join(', ') || 'none'}`);
  const chosen = factorNames
    ? factorNames.map((n) => {
        const c = uniqueColumn(table, n, 'factor', (h, col) => layout.factors.some((x) => x.actual === col && bareColumnName(x.name) === bareColumnName(n)));
        const f = layout.factors.find((x) => x.actual === c);
        if (!f) throw new InputError(`The export has no factor "${n}"; its factors are ${layout.factors.map((x) => `"${x.name}"`).join(', ')}`);
        return f;
      })
    : layout.factors;
  let excluded = 0;
  let missing = 0;
  let judged = 0;
  const used: number[] = [];
  table.rows.forEach((_, r) => {
    // Path and confirmation runs are judged against the model, never fitted into it (as in the app).
    if ((JUDGED_KINDS as readonly string[]).includes(cell(table, r, layout.kind))) return void judged++;
    const ex = cell(table, r, layout.excluded).toLowerCase();
    if (ex === 'yes') return void excluded++;
    if (ex !== 'no' && ex !== '') throw new InputError(`${where(table, r, layout.excluded)}: needs yes or no, got "${table.rows[r][layout.excluded]}"`);
    if (cell(table, r, response.value) === '') return void missing++;
    used.push(r);
  });
  const factors = defineFactors(chosen.map((f) => factorSpec(table, f, used)));
  const coded = used.map((r) =>
    factors.map((f, j) => {
      const c = chosen[j].actual;
      const v = cell(table, r, c);
      if (v === '') throw new InputError(`${where(table, r, c)}: ${f.name} has no actual setting`);
      try {
        return toCoded(f, v);
      } catch (err) {
        throw err instanceof InputError ? new InputError(`${where(table, r, c)}: ${err.message}`) : err;
      }
    }),
  );
  const y = used.map((r) => {
    const v = cellNumber(cell(table, r, response.value));
    if (!Number.isFinite(v)) throw new InputError(`${where(table, r, response.value)}: ${response.name} needs a number, got "${table.rows[r][response.value]}"${whyNotANumber(table.rows[r][response.value], table.delimiter)}`);
    const big = responseMagnitudeProblem(v);
    if (big) throw new InputError(`${where(table, r, response.value)}: ${response.name} ${big}`);
    return v;
  });
  // The planned settings ("<name> planned") are the nominal plan that decides what the runs can
  // estimate (core/fit/nominal-settings.ts); an older export without them is read as before.
  const withPlan = chosen.every((f) => f.planned >= 0);
  const planned = withPlan
    ? used.map((r) =>
        factors.map((f, j) => {
          const c = chosen[j].planned;
          const v = cell(table, r, c);
          if (v === '') throw new InputError(`${where(table, r, c)}: ${f.name} has no planned setting; give the run's planned setting, or remove the "${table.header[c]}" column to read the runs without a plan`);
          try {
            return toCoded(f, v);
          } catch (err) {
            throw err instanceof InputError ? new InputError(`${where(table, r, c)}: ${err.message}`) : err;
          }
        }),
      )
    : null;
  const blocks = layout.block >= 0 ? used.map((r) => parseNumber(cell(table, r, layout.block))) : null;
  if (blocks) blocks.forEach((b, i) => {
    if (!Number.isInteger(b) || b < 1) throw new InputError(`${where(table, used[i], layout.block)}: the block needs a whole number from 1, got "${table.rows[used[i]][layout.block]}"`);
  });
  const messages: string[] = [...(table.messages ?? [])];
  if (judged > 0) messages.push(judgedKeptOut(judged));
  if (excluded > 0) messages.push(`${excluded} excluded run${excluded === 1 ? '' : 's'} skipped`);
  if (missing > 0) messages.push(`${missing} run${missing === 1 ? '' : 's'} without a value for ${response.name} skipped`);
  const unit = columnUnit(table.header[response.value]);
  return {
    factors,
    response: response.name,
    ...(unit ? { unit } : {}),
    coded,
    y,
    blocks: blocks && blocks.some((b) => b !== 1) ? blocks : null,
    // Runs planned at the same settings are repeats of one point (pure error), whatever their actuals.
    points: withPlan ? used.map((r) => chosen.map((f) => cell(table, r, f.planned)).join('|')) : null,
    ...(planned ? { planned } : {}),
    labels: used.map((r) => cell(table, r, layout.run)),
    messages,
  };
}
