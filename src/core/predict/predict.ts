/**
 * Prediction at real settings: what the technician checks before changing a setting on the
 * machine. The coded value of every factor, the fitted value with its standard error, the 95%
 * confidence interval for the mean response and the 95% prediction interval for one new run, the
 * baseline (intercept) and each term's contribution, the tested-range check, and the caution.
 */
import { InputError } from '../errors.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { tIntervals } from '../fit/t-intervals.ts';
import { isSquare, termLetters, termName, termValue, type Term } from '../model/term.ts';
import { onResponseScale } from './back-transform.ts';
import { CAUTION } from './caution.ts';
import { cachedPredictor } from './compiled-predictor.ts';
import { outsideRange, type OutsideSetting } from './outside-range.ts';
import { formatSetting, parseSettings, type FactorSetting, type SettingsInput } from './parse-settings.ts';
import { curvatureNote } from '../text/verdict-text.ts';

export interface Contribution {
  readonly term: Term;
  readonly name: string;
  readonly letters: string;
  /** When the runs cannot separate this term from others: the combination it stands for ("C + AB"). */
  readonly estimates?: string;
  readonly coef: number;
  /** Product of the term's coded settings (for a square, the coded setting squared). */
  readonly product: number;
  /** coef x product: what this term adds to the baseline at these settings. */
  readonly value: number;
}

export interface Prediction {
  readonly response: string;
  readonly settings: readonly FactorSetting[];
  readonly fit: number;
  /** Standard error of the fitted mean; null when the residual df is 0. */
  readonly se: number | null;
  /** Confidence level of ci and pi (0.95 unless asked). */
  readonly level: number;
  /** Confidence interval for the mean response at these settings. */
  readonly ci: readonly [number, number] | null;
  /** Prediction interval for one new run at these settings. */
  readonly pi: readonly [number, number] | null;
  /** The intercept: the fitted value at the center (for an average block). */
  readonly baseline: number;
  /** One per model term, largest |value| first; baseline + the values in this order = fit exactly. */
  readonly contributions: readonly Contribution[];
  /** True when some numeric setting lies outside the tested range (|coded| > 1). */
  readonly outside: boolean;
  readonly outsideFactors: readonly OutsideSetting[];
  readonly messages: readonly string[];
  readonly caution: readonly string[];
  /** With a transform: fit, se and intervals on the transformed scale (fit, ci, pi above are in the response's units). */
  readonly transformed?: { readonly fit: number; readonly se: number | null; readonly ci: readonly [number, number] | null; readonly pi: readonly [number, number] | null };
}

export interface PredictOptions {
  /** Confidence level of the intervals; default 0.95. */
  readonly level?: number;
  /** Significance level for the curvature note; default 0.05 (common practice). */
  readonly alpha?: number;
}

/**
 * The notes a prediction from this model carries: no residual df (so no intervals), an average
 * block, and significant curvature (p < alpha from the center runs; Montgomery, Design and
 * Analysis of Experiments, 8th ed., section 6.8), which biases a model without squares and is
 * allowed for by one with them. Cost O(terms).
 * Example: modelNotes({ ...model, curvatureP: 0.2 }, 0.05) -> [] for an unblocked model with residual df.
 */
export function modelNotes(model: FittedModel, alpha: number): string[] {
  const out: string[] = [];
  if (model.dfResidual <= 0 || model.sigma === null) {
    out.push(
      'No runs are left over to estimate the noise (residual df 0), so the standard error and the intervals are not available; refit with fewer terms, or add runs, to get them.',
    );
  }
  if (model.blockColumns > 0) out.push('The prediction is for an average block.');
  if (model.curvatureP !== null && model.curvatureP < alpha) {
    out.push(curvatureNote(model.curvatureP, 'prediction', model.terms.filter(isSquare).map((t) => termLetters(t, model.factors))));
  }
  return out;
}

/**
 * One note per numeric factor held at its center because it was not given. Cost O(k).
 * Example: a setting { name: 'Time', real: 35, unit: 'min', source: 'center' } ->
 * ['Time was not given: held at its center, 35 min.'].
 */
export function centerNotes(settings: readonly FactorSetting[]): string[] {
  return settings.filter((s) => s.source === 'center').map((s) => `${s.name} was not given: held at its center, ${formatSetting(s.real, s.unit)}.`);
}

type TermLabel = { name: string; letters: string; estimates?: string };
const labelCache = new WeakMap<FittedModel, TermLabel[]>();

/** Term names and letters of a model, built once per model object. */
function termLabels(model: FittedModel): TermLabel[] {
  let labels = labelCache.get(model);
  if (!labels) {
    labels = model.terms.map((t, j) => ({
      name: termName(t, model.factors),
      letters: termLetters(t, model.factors),
      ...(model.estimates?.[j] ? { estimates: model.estimates[j]! } : {}),
    }));
    labelCache.set(model, labels);
  }
  return labels;
}

/**
 * Prediction at already resolved settings (see parseSettings), so that several responses can share
 * one resolution. Same method, source and cost as predict.
 * Throws InputError when the number of settings does not match the model's factors.
 * Example: predictSettings(model, parseSettings(model.factors, { A: 40, B: 150 })).fit -> 40.89
 * (Montgomery 8th ed., section 6.8 data).
 */
export function predictSettings(model: FittedModel, settings: readonly FactorSetting[], options: PredictOptions = {}): Prediction {
  const level = options.level ?? 0.95;
  const alpha = options.alpha ?? 0.05;
  const predictor = cachedPredictor(model, level);
  if (settings.length !== model.factors.length) {
    throw new InputError(`A prediction needs one setting per factor (${model.factors.length}), got ${settings.length}`);
  }
  const x = settings.map((s) => s.coded);
  const nb = model.blockColumns;
  const labels = termLabels(model);
  const contributions: Contribution[] = model.terms.map((t, j) => {
    const coef = model.coef[1 + nb + j];
    const product = termValue(t, x);
    return { term: t, name: labels[j].name, letters: labels[j].letters, ...(labels[j].estimates ? { estimates: labels[j].estimates } : {}), coef, product, value: coef * product + 0 };
  });
  contributions.sort((a, b) => Math.abs(b.value) - Math.abs(a.value));
  const baseline = model.coef[0];
  let fit = baseline;
  for (const c of contributions) fit += c.value;
  const known = predictor.sigma !== null && predictor.tValue !== null;
  const r = tIntervals(fit, known ? predictor.varianceFactor(x) : 0, predictor.sigma, predictor.tValue);
  const se = r.se;
  const zci: [number, number] | null = r.ciLo !== null && r.ciHi !== null ? [r.ciLo, r.ciHi] : null;
  const zpi: [number, number] | null = r.piLo !== null && r.piHi !== null ? [r.piLo, r.piHi] : null;
  const scale = onResponseScale(model, { fit, se, ci: zci, pi: zpi });
  const outsideFactors = outsideRange(model.factors, x, model.extent);
  const messages = [...centerNotes(settings), ...outsideFactors.map((o) => o.message)];
  if (outsideFactors.length > 0) {
    messages.push('Outside the tested range the prediction is an extrapolation of the fitted model: confirm it with runs before relying on it.');
  }
  messages.push(...modelNotes(model, alpha), ...scale.messages);
  return {
    response: model.response,
    settings,
    fit: scale.fit,
    se: scale.transformed ? null : se,
    level,
    ci: scale.ci,
    pi: scale.pi,
    baseline,
    contributions,
    outside: outsideFactors.length > 0,
    outsideFactors,
    messages,
    caution: CAUTION,
    ...(scale.transformed ? { transformed: scale.transformed } : {}),
  };
}

/**
 * Predicts one response at real settings, given by factor name or letter. A numeric factor not
 * given is held at its center; a categorical factor must be given (see parseSettings).
 * Method: coded x0, fit = b0 + sum_t b_t prod_{i in t} x0_i (x0_i^2 for a square); se_fit = sigma sqrt(x0'(X'X)^-1 x0);
 * CI = fit +- t_{0.025,df} se_fit (mean response) and PI = fit +- t_{0.025,df} sigma
 * sqrt(1 + x0'(X'X)^-1 x0) (one new run), by tIntervals (Montgomery, Design and Analysis of Experiments, 8th
 * ed., section 10.6, Eqs. 10.39-10.41). Each term's contribution is b_t x its product of coded
 * values; the fit is summed as baseline + contributions in the order listed, so they agree
 * exactly. With residual df 0 se, ci and pi are null and a message says why.
 * Cost O(p^2) for the first prediction from a model (compiling), then O(p log p) (the sort).
 * Throws InputError as parseSettings does (unknown factor, level not there, value between two
 * levels, categorical factor not given) and for an inconsistent model.
 * Example: for yhat = 40.44 + 0.775 x1 + 0.325 x2 (time 30..40 min, temperature 150..160 degF;
 * Montgomery 8th ed., section 6.8 data), predict(model, { Time: 40, Temperature: 150 }).fit ->
 * 40.89, contributions [time 0.775, temperature -0.325].
 */
export function predict(model: FittedModel, settings: SettingsInput, options: PredictOptions = {}): Prediction {
  return predictSettings(model, parseSettings(model.factors, settings), options);
}
