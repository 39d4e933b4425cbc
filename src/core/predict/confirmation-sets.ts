/**
 * The confirmation runs of a study gathered for a verdict: planned confirmation runs grouped by
 * their block and setting (one set per setting confirmed), each with the logged values, then
 * judged against a model fitted without them (compareConfirmation: the mean of the m runs
 * against the prediction interval for the mean of m new runs; Montgomery, Design and Analysis of
 * Experiments, 8th ed., section 10.6, from memory). One place for the screens, the command line
 * and the exports, so they give the same verdict.
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { transformResponses } from '../fit/response-transform.ts';
import { meanReading, type LoggedRun, type StudyPlan } from '../study/study.ts';
import { compareConfirmation, type ConfirmationComparison } from './confirm-runs.ts';
import { parseSettings } from './parse-settings.ts';

/** One planned confirmation run: its block, number, planned coded setting, and its value (null while not logged, excluded or without a reading). */
export interface ConfirmationRow {
  readonly block: number;
  readonly run: number;
  readonly coded: readonly number[];
  readonly value: number | null;
}

/** The confirmation runs at one setting in one block. */
export interface ConfirmationSet {
  readonly block: number;
  readonly runs: readonly number[];
  readonly coded: readonly number[];
  /** The logged values, in run order. */
  readonly values: readonly number[];
}

/** A set with its verdict: `comparison` null while none is logged; `problem` when it cannot be judged (the core's message). */
export interface JudgedSet {
  readonly set: ConfirmationSet;
  readonly comparison: ConfirmationComparison | null;
  readonly problem: string | null;
}

/**
 * The planned confirmation runs of a study (its plan with the added blocks) and the mean reading
 * of each logged run that is not excluded. Cost O(planned + logged).
 * Example: 3 confirmation runs planned as runs 12 to 14, two logged -> 3 rows, one with value null.
 */
export function confirmationRowsOf(study: StudyPlan, runs: readonly LoggedRun[], responseIndex: number): ConfirmationRow[] {
  const byRun = new Map<number, LoggedRun>();
  for (const r of runs) if (!r.excluded && !byRun.has(r.plannedRun)) byRun.set(r.plannedRun, r);
  return study.design.runs
    .filter((p) => p.kind === 'confirmation')
    .map((p) => {
      const logged = byRun.get(p.run);
      return { block: p.originBlock, run: p.run, coded: p.coded, value: logged ? meanReading(logged.readings[responseIndex] ?? []) : null };
    });
}

/**
 * Groups rows by block and by setting, in order of their first run. Cost O(n log n).
 * Example: runs 12 to 14 in block 3 at one setting -> one set with runs [12, 13, 14].
 */
export function confirmationSets(rows: readonly ConfirmationRow[]): ConfirmationSet[] {
  const sets = new Map<string, { block: number; runs: number[]; coded: readonly number[]; values: number[] }>();
  for (const r of [...rows].sort((a, b) => a.run - b.run)) {
    const key = `${r.block}|${r.coded.join(',')}`;
    let s = sets.get(key);
    if (!s) sets.set(key, (s = { block: r.block, runs: [], coded: r.coded, values: [] }));
    s.runs.push(r.run);
    if (r.value !== null) s.values.push(r.value);
  }
  return [...sets.values()];
}

/**
 * Each set judged against the model: its values put on the model's scale (the model's transform,
 * when it has one), its setting read as the model's factors, then compareConfirmation. A set with
 * no value gets comparison null; one that cannot be judged (a value outside the transform's
 * domain, a setting the model cannot take) gets the message. Cost O(p^2) per set.
 * Example: the set of runs 12 to 14 with values [41.2, 41.8, 41.6] -> comparison with m 3, mean 41.53.
 */
export function judgeConfirmationSets(model: FittedModel, sets: readonly ConfirmationSet[]): JudgedSet[] {
  return sets.map((set) => {
    if (set.values.length === 0) return { set, comparison: null, problem: null };
    try {
      const t = model.transform;
      const values = t && t.lambda !== 1 ? transformResponses(set.values, t.lambda, t.lowerBound ?? 0, model.response) : set.values;
      const settings = parseSettings(model.factors, model.factors.map((f, j) => [f.name, toReal(f, set.coded[j])] as [string, number | string]));
      return { set, comparison: compareConfirmation(model, settings, values), problem: null };
    } catch (err) {
      if (err instanceof InputError) return { set, comparison: null, problem: err.message };
      throw err;
    }
  });
}
