/**
 * Solve for one numeric factor: the real setting that gives a target response with the other
 * factors held. With the others held the model is linear in that factor (every term holds it at
 * most once), so the answer is exact.
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import { findFactor } from '../factor/factor.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { termLetters, termValue } from '../model/term.ts';
import { SETTING_TOLERANCE } from '../tolerance.ts';
import { CAUTION } from './caution.ts';
import { cachedPredictor } from './compiled-predictor.ts';
import { outsideRange, type OutsideSetting } from './outside-range.ts';
import { formatSetting, parseSettings, type FactorSetting, type SettingsInput } from './parse-settings.ts';
import { centerNotes, modelNotes } from './predict.ts';
import { ZERO_SLOPE_TOLERANCE } from '../tolerance.ts';

export interface SolveOptions {
  /** The numeric factor to solve for, by name or letter. */
  readonly factor: string;
  readonly target: number;
  /** The other factors' settings (numeric ones not given are held at their center). */
  readonly at?: SettingsInput;
  /** Confidence level of the intervals; default 0.95. */
  readonly level?: number;
  /** Significance level for the curvature note; default 0.05. */
  readonly alpha?: number;
}

export interface Solution {
  readonly response: string;
  readonly factor: { readonly name: string; readonly letter: string; readonly unit?: string };
  readonly target: number;
  /** The real setting: the exact answer when reachable, else the nearest setting inside the range. */
  readonly setting: number;
  readonly coded: number;
  /** True when a setting inside the tested range gives the target. */
  readonly reachable: boolean;
  /** Prediction at `setting` (equals the target when reachable). */
  readonly fit: number;
  readonly se: number | null;
  readonly level: number;
  readonly ci: readonly [number, number] | null;
  readonly pi: readonly [number, number] | null;
  /** Change of the fit per coded unit of the factor, at the held settings. */
  readonly slope: number;
  /** Fit with the factor at its -1 and +1 settings: the span the tested range reaches. */
  readonly reach: readonly [number, number];
  /** The setting the model would need outside the tested range (an extrapolation); null otherwise. */
  readonly needed: { readonly real: number | null; readonly coded: number } | null;
  /** Every factor's setting, the solved one included. */
  readonly settings: readonly FactorSetting[];
  /** True when a held setting lies outside the tested range. */
  readonly outside: boolean;
  readonly outsideFactors: readonly OutsideSetting[];
  readonly messages: readonly string[];
  readonly caution: readonly string[];
}

function fmt(x: number): string {
  return formatSetting(x);
}

function signed(x: number): string {
  return `${x > 0 ? '+' : x < 0 ? '-' : ''}${fmt(Math.abs(x))}`;
}

/**
 * Finds the real setting of one numeric factor that gives the target response, the others held.
 * Method: with the others held at coded values, every term either omits factor j (adding a
 * constant) or holds it once, so yhat(x_j) = a + s x_j with a = b0 + sum_{t not containing j} b_t
 * prod_t x and s = sum_{t containing j} b_t prod_{t \ j} x; then x_j = (target - a) / s, mapped to
 * real units (common practice for a model linear in each factor; Montgomery, Design and
 * Analysis of Experiments, 8th ed., section 6.7, on coded and real units). When |x_j| > 1 the
 * target lies outside what the tested range reaches: the result gives the nearest end of the
 * range (reachable false) and the setting that would be needed. When s is 0 at the held settings
 * no setting changes the fit: the center is given. The fit, CI and PI at the setting follow
 * Montgomery section 10.6 (see compilePredictor).
 * Cost O(p) after the model is compiled.
 * Throws InputError for a non-finite target, an unknown factor, a categorical factor (it has no
 * settings between its levels; the message gives the fit at each level), a setting given for
 * the factor solved for, and as parseSettings does.
 * Example: for yhat = 40.44 + 0.775 x1 + 0.325 x2 (time 30..40 min; Montgomery 8th ed., section 6.8
 * data), solveForTarget(model, { factor: 'Time', target: 41, at: { Temperature: 155 } }).setting
 * -> 38.59 (x1 = 0.717).
 */
export function solveForTarget(model: FittedModel, options: SolveOptions): Solution {
  const { target } = options;
  const level = options.level ?? 0.95;
  const alpha = options.alpha ?? 0.05;
  if (typeof target !== 'number' || !Number.isFinite(target)) throw new InputError(`The target needs to be a finite number, got ${target}`);
  const f = findFactor(model.factors, options.factor);
  if (!f) {
    throw new InputError(
      `No factor is named or lettered "${options.factor}"; the factors are ${model.factors.map((x) => `${x.letter} (${x.name})`).join(', ')}`,
    );
  }
  const j = model.factors.indexOf(f);
  const predictor = cachedPredictor(model, level);
  if (f.kind === 'categorical') {
    const plain = `${f.name} is categorical ("${f.levels[0]}" or "${f.levels[1]}", nothing between), so it cannot be solved for`;
    let settings: FactorSetting[];
    try {
      settings = parseSettings(model.factors, options.at ?? {}, { free: [j] });
    } catch {
      throw new InputError(`${plain}; predict at each of its levels instead`);
    }
    const x = settings.map((s) => s.coded);
    const at = (c: number) => ((x[j] = c), predictor.fit(x));
    throw new InputError(`${plain}; at the given settings the model predicts ${fmt(at(-1))} at ${f.levels[0]} and ${fmt(at(1))} at ${f.levels[1]}`);
  }
  const held = parseSettings(model.factors, options.at ?? {}, { free: [j] });
  const x = held.map((s) => s.coded);
  x[j] = 0;
  const nb = model.blockColumns;
  const bit = 1 << j;
  let a = model.coef[0];
  let s = 0;
  let scale = Math.abs(a);
  const partners: string[] = [];
  model.terms.forEach((t, i) => {
    const coef = model.coef[1 + nb + i];
    if (t & bit) {
      const other = termValue(t & ~bit, x);
      s += coef * other;
      scale += Math.abs(coef * other);
      if (t !== bit && coef !== 0) partners.push(termLetters(t, model.factors));
    } else {
      const v = coef * termValue(t, x);
      a += v;
      scale += Math.abs(v);
    }
  });
  const reach: [number, number] = [a - s, a + s];
  const unit = f.unit;
  const messages: string[] = [...centerNotes(held)];
  let coded: number;
  let reachable: boolean;
  let needed: Solution['needed'] = null;
  const lo = Math.min(reach[0], reach[1]);
  const hi = Math.max(reach[0], reach[1]);
  const span = `${fmt(lo)} to ${fmt(hi)}`;
  if (Math.abs(s) <= ZERO_SLOPE_TOLERANCE * scale) {
    coded = 0;
    reachable = Math.abs(target - a) <= ZERO_SLOPE_TOLERANCE * scale;
    messages.push(
      reachable
        ? `${f.name} has no effect at these settings (slope 0) and the fit already equals the target: every setting in the tested range gives ${fmt(a)}; its center is shown.`
        : `${f.name} has no effect at these settings (slope 0): every setting in the tested range gives ${fmt(a)}, so the target ${fmt(target)} cannot be reached by ${f.name}; its center is shown.`,
    );
  } else {
    const xs = (target - a) / s;
    if (Math.abs(xs) <= 1 + SETTING_TOLERANCE) {
      coded = Math.max(-1, Math.min(1, xs));
      reachable = true;
      messages.push(`To reach ${fmt(target)}, set ${f.name} to ${formatSetting(toReal(f, coded) as number, unit)} (coded ${signed(coded)}).`);
    } else {
      coded = Math.sign(xs);
      reachable = false;
      const real = toReal(f, xs) as number;
      needed = { real: Number.isFinite(real) ? real : null, coded: xs };
      const nearest = toReal(f, coded) as number;
      messages.push(
        `The target ${fmt(target)} lies outside what the tested range of ${f.name} reaches at these settings (${span})` +
          (needed.real !== null ? `; the model would need ${f.name} = ${formatSetting(needed.real, unit)} (coded ${signed(xs)}), an extrapolation` : '; the model would need a setting far outside the range') +
          `. The nearest setting inside the range is ${formatSetting(nearest, unit)} (the ${coded > 0 ? 'high' : 'low'} setting).`,
      );
    }
  }
  if (partners.length > 0) {
    messages.push(`${f.name} interacts with other factors in the model (${partners.join(', ')}), so this answer holds only at the settings held here.`);
  }
  x[j] = coded;
  const r = predictor.interval(x);
  const outsideFactors = outsideRange(model.factors, x);
  messages.push(...outsideFactors.map((o) => o.message));
  if (outsideFactors.length > 0) messages.push('With a held setting outside the tested range, the answer is an extrapolation of the fitted model.');
  messages.push(...modelNotes(model, alpha));
  const setting = toReal(f, coded) as number;
  const settings = held.map((h, i) =>
    i === j ? { ...h, real: setting, coded, source: 'free' as const } : h,
  );
  return {
    response: model.response,
    factor: { name: f.name, letter: f.letter, ...(unit ? { unit } : {}) },
    target,
    setting,
    coded,
    reachable,
    fit: r.fit,
    se: r.se,
    level,
    ci: r.ciLo !== null && r.ciHi !== null ? [r.ciLo, r.ciHi] : null,
    pi: r.piLo !== null && r.piHi !== null ? [r.piLo, r.piHi] : null,
    slope: s,
    reach,
    needed,
    settings,
    outside: outsideFactors.length > 0,
    outsideFactors,
    messages,
    caution: CAUTION,
  };
}
