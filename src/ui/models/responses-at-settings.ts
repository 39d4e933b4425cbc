/**
 * Every response of a study at one setting, for the quick card: each one's prediction from the
 * model chosen for it on the Effects screen (the study's shared analysis), its desirability d
 * with the starting limits of the several-responses screen (defaultDesirabilityEntry: the
 * study's goal, limits from the logged values), and the overall D (Derringer and Suich 1980,
 * via the core's desirabilityAt). A response without a usable model or limits gets a plain word
 * instead of a number, and then there is no overall D: it would weigh only some responses.
 */
import type { FittedModel } from '../../core/fit/analysis.ts';
import { defaultDesirabilityEntry, desirabilityEntryProblem, readDesirabilityEntry } from '../../core/optimum/desirability-entry.ts';
import { desirabilityAt } from '../../core/optimum/desirability-search.ts';
import type { DesirabilitySpec } from '../../core/optimum/desirability.ts';
import { cachedPredictor } from '../../core/predict/compiled-predictor.ts';
import { noValueWord, overallMissing } from '../../core/text/responses-at-settings-text.ts';
import { problemOf } from '../lib/problem.ts';
import type { ResponseAnalysis } from './study-analysis-model.ts';

export interface ResponseAtSettings {
  readonly name: string;
  readonly unit?: string;
  /** The prediction, or null with `fitWord` in its place. */
  readonly fit: number | null;
  readonly fitWord: string | null;
  /** The desirability d, or null with `dWord` in its place. */
  readonly d: number | null;
  readonly dWord: string | null;
}

export interface ResponsesAtSettings {
  readonly rows: readonly ResponseAtSettings[];
  /** The overall desirability, or null with `missing` saying why. */
  readonly D: number | null;
  readonly missing: string | null;
}

/**
 * The block's rows at the coded settings `coded` (one per factor). Cost: one prediction per
 * response, O(m p). Never throws: a problem of the core comes back as `missing`.
 */
export function responsesAtSettings(responses: readonly ResponseAnalysis[], coded: readonly number[]): ResponsesAtSettings {
  const rows: ResponseAtSettings[] = [];
  const used: { row: number; model: FittedModel; spec: DesirabilitySpec }[] = [];
  for (const ra of responses) {
    const name = ra.response.name;
    const unit = ra.response.unit ? { unit: ra.response.unit } : {};
    const result = ra.result.value;
    const gone = !result.ok ? noValueWord('not-fitted') : ra.settings.value.transform !== 'none' ? noValueWord('transformed') : null;
    if (!result.ok || gone !== null) {
      rows.push({ name, ...unit, fit: null, fitWord: gone, d: null, dWord: gone });
      continue;
    }
    const entry = defaultDesirabilityEntry(ra.response, result.data.y);
    const spec = desirabilityEntryProblem(name, entry) === null ? readDesirabilityEntry(name, entry) : null;
    if (spec === null) {
      rows.push({ name, ...unit, fit: cachedPredictor(result.analysis.model).fit(coded), fitWord: null, d: null, dWord: noValueWord('no-limits') });
      continue;
    }
    used.push({ row: rows.length, model: result.analysis.model, spec });
    rows.push({ name, ...unit, fit: cachedPredictor(result.analysis.model).fit(coded), fitWord: null, d: null, dWord: noValueWord('not-available') });
  }
  if (used.length === 0) return { rows, D: null, missing: rows.length ? overallMissing(rows.map((r) => r.name)) : null };
  try {
    const at = desirabilityAt(used.map((u) => u.model), used.map((u) => u.spec), coded);
    used.forEach((u, i) => (rows[u.row] = { ...rows[u.row], fit: at.responses[i].fit, d: at.responses[i].d, dWord: null }));
    const without = rows.filter((r) => r.d === null).map((r) => r.name);
    return { rows, D: without.length === 0 ? at.D : null, missing: without.length ? overallMissing(without) : null };
  } catch (err) {
    return { rows, D: null, missing: problemOf(err).message };
  }
}
