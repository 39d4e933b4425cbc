/**
 * The file and model options shared by analyze, predict, solve and path: which file, which
 * factor and response columns, their coding, the model terms and the block column.
 */
import { InputError } from '../core/errors.ts';
import { parseTerms, termsUpToOrder, defaultTerms } from '../core/model/formula.ts';
import type { Term } from '../core/model/term.ts';
import { parseTransform, type ResponseTransform } from '../core/fit/response-transform.ts';
import type { ResponseData } from '../core/study/response-data.ts';
import { readTable } from '../io/csv/read-table.ts';
import { tableResponseData } from '../io/csv/table-response-data.ts';
import { exportedCsvLayout, exportedCsvResponseData } from '../io/csv/exported-csv.ts';
import { backupResponseDataOf } from '../io/backup/select-study.ts';
import { readBackupFile } from './read-backup-file.ts';
import { parseAssignments, type OptionSpec } from './args.ts';
import { readTextFile } from './read-text-file.ts';
import { withLowerBound } from './lower-bound-option.ts';
import { supportsQuadratic } from '../core/design/supports-quadratic.ts';
import { quadraticNotSupported } from '../core/text/second-order-text.ts';

export const modelOptionSpec = {
  factors: { type: 'string' },
  response: { type: 'string' },
  levels: { type: 'string' },
  terms: { type: 'string' },
  order: { type: 'string' },
  block: { type: 'string' },
  transform: { type: 'string' },
  'lower-bound': { type: 'string' },
  study: { type: 'string' },
  json: { type: 'boolean' },
} as const satisfies OptionSpec;

export const modelOptionUsage = `  FILE                 a CSV with a header row (factor columns hold real settings or level labels)
  --factors A,B,C      the factor columns, in the order that gives their letters A, B, C ...
  --response NAME      the response column
  --levels A=low:high,B=labelLow:labelHigh
                       the coding; without it a numeric factor's low and high are its most frequent
                       values below and above the column's mid-range (ties: the more extreme), and
                       a categorical factor's first label in the file is -1
  --terms "A*B*C"      model terms in Wilkinson-Rogers notation (A + B + A:B, A*B*C, (A+B+C)^2;
                       A^2 is the square of a numeric factor, quadratic the full second-order model)
  --order N            or: all terms up to order N (default: main effects and two-factor interactions)
  --block COLUMN       a column holding each run's block, fitted as a fixed effect
  --transform none|log|sqrt|inverse|power=L
                       fit (y'^L - 1)/L, y' = the response minus its lower bound (log at L = 0;
                       default none); predictions come back in the response's units (the median)
  --lower-bound NAME=L the lowest value the response can take (NAME=0: it cannot be negative);
                       transforms apply to the response minus L, the report says what the bound
                       means and the Box-Cox power of the response minus L, and predictions warn
                       when they or their intervals cross it (a backup's study carries its own)
  --study ID-OR-NAME   with a Trialbook backup (.json): the study to analyze; its own factors,
                       coding and blocks are used. A Trialbook CSV export needs no --factors:
                       its actual settings and coding are read from its columns; excluded runs
                       are skipped and the report says how many
  --json               one JSON object on stdout instead of the report`;

type Values = { [K in keyof typeof modelOptionSpec]?: (typeof modelOptionSpec)[K]['type'] extends 'boolean' ? boolean : string };

export interface ModelInput {
  readonly data: ResponseData;
  readonly terms: Term[];
  /** True when a plain CSV was coded without --levels: each categorical factor's first label in file order is -1. */
  readonly codingFromFileOrder: boolean;
  readonly transform: ResponseTransform;
}

export function loadModelInput(positionals: string[], values: Values): ModelInput {
  if (positionals.length !== 1) throw new InputError(`Give one file to analyze, got ${positionals.length === 0 ? 'none' : positionals.join(', ')}`);
  const [path] = positionals;
  if (!values.response) throw new InputError('Name the response with --response NAME');
  // A .json file is a backup, measured before it is read; other text is sniffed after reading.
  const text = /\.json$/i.test(path) ? '' : readTextFile(path);
  const factors = values.factors?.split(',').map((f) => f.trim()).filter((f) => f !== '');
  let data: ResponseData;
  let codingFromFileOrder = false;
  if (/\.json$/i.test(path) || /^\s*\{/.test(text)) {
    // A Trialbook backup: the study's own factors and coding.
    if (!values.study) throw new InputError('A backup can hold several studies: name one with --study ID-OR-NAME');
    if (values.levels) throw new InputError('A backup carries its own coding: leave out --levels');
    data = backupResponseDataOf(readBackupFile(path), values.study, values.response);
  } else {
    const table = readTable(text);
    if (exportedCsvLayout(table) && !values.levels) {
      // A Trialbook CSV export: actual settings, coding recovered from its coded columns.
      data = exportedCsvResponseData(text, values.response, factors);
    } else {
      if (!factors || factors.length === 0) throw new InputError('Name the factor columns with --factors A,B,C');
      const levels: Record<string, [string, string]> = {};
      if (values.levels) {
        for (const [name, range] of parseAssignments(values.levels, '--levels')) {
          const parts = range.split(':');
          if (parts.length !== 2 || parts.some((p) => p.trim() === '')) throw new InputError(`--levels: expected ${name}=low:high, got "${name}=${range}"`);
          levels[name] = [parts[0].trim(), parts[1].trim()];
        }
      }
      data = tableResponseData(table, { factors, response: values.response, levels, ...(values.block ? { block: values.block } : {}) });
      codingFromFileOrder = !values.levels;
    }
  }
  data = withLowerBound(data, values['lower-bound']);
  return { data, terms: modelTerms(data, values), codingFromFileOrder, transform: parseTransform(values.transform) };
}

export function modelTerms(data: ResponseData, values: Values): Term[] {
  if (values.terms && values.order) throw new InputError('Give either --terms or --order, not both');
  if (values.terms) {
    const terms = parseTerms(values.terms, data.factors);
    // The keyword asks for the full second-order model: refused, saying why, for runs that
    // cannot estimate it (judged on the plan where the file has one, as the screen does).
    const keyword = /(^|[^\p{L}\p{N}_])quadratic([^\p{L}\p{N}_]|$)/iu.test(values.terms) && !data.factors.some((f) => f.name.toLowerCase() === 'quadratic');
    const points = data.coded.map((row, i) => data.planned?.[i] ?? row);
    if (keyword && !supportsQuadratic(data.factors, points)) throw new InputError(quadraticNotSupported('command'));
    return terms;
  }
  if (values.order) {
    const order = Number(values.order);
    if (!Number.isInteger(order) || order < 1) throw new InputError(`--order needs a whole number of 1 or more, got "${values.order}"`);
    return termsUpToOrder(data.factors.length, Math.min(order, data.factors.length));
  }
  // A Plackett-Burman study: main effects (its interactions are only partly aliased with them).
  if (data.screening) return Array.from({ length: data.factors.length }, (_, i) => 1 << i);
  return defaultTerms(data.factors.length);
}
