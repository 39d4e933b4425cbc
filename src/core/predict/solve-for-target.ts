/**
 * Solve for one numeric factor: the real setting that gives a target response with the other
 * factors held. With the others held the model is linear in that factor (every product term
 * holds it at most once), or quadratic when the model holds its square, so the answer is exact:
 * one root of a line, or up to two roots of a parabola.
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import { findFactor } from '../factor/factor.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { isSquare, termLetters, termMask, termValue } from '../model/term.ts';
import { SETTING_TOLERANCE } from '../tolerance.ts';
import { backTransform, transformValue } from '../fit/response-transform.ts';
import { onResponseScale } from './back-transform.ts';
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
  /** The response's unit, written after the target and the response values the messages quote ("To reach 72 µm"). */
  readonly responseUnit?: string;
}

export interface Solution {
  readonly response: string;
  readonly factor: { readonly name: string; readonly letter: string; readonly unit?: string };
  readonly target: number;
  /**
   * The real setting: the exact answer when reachable (when two settings give the target, the
   * one nearer the center), else the setting inside the range whose fit comes nearest the target.
   */
  readonly setting: number;
  readonly coded: number;
  /** True when a setting inside the tested range gives the target. */
  readonly reachable: boolean;
  /** Prediction at `setting` in the response's own units (equals the target when reachable). */
  readonly fit: number;
  /** Standard error of the fit; null under a transform (it is given in `transformed`). */
  readonly se: number | null;
  readonly level: number;
  readonly ci: readonly [number, number] | null;
  readonly pi: readonly [number, number] | null;
  /** Every setting inside the tested range that gives the target, low to high (up to two with a
   * square; empty when none does, or when the factor has no effect at all). */
  readonly solutions: readonly { readonly setting: number; readonly coded: number }[];
  /** Change of the fit per coded unit of the factor at its center, the others held (s in a + s x + q x^2); on the transformed scale under a transform. */
  readonly slope: number;
  /** Coefficient q of the factor's coded square at the held settings (transformed scale under a transform); 0 when the model has no square of it. */
  readonly quadratic: number;
  /** Where the fit turns (x = -s / 2q) when quadratic is not 0, inside the range or not (fit in the response's units); else null. */
  readonly stationary: { readonly real: number | null; readonly coded: number; readonly fit: number } | null;
  /** Fit with the factor at its -1 and +1 settings (with a square the fit between may go beyond them). */
  readonly reach: readonly [number, number];
  /** The lowest and highest fit over the tested range of the factor, the others held: what it can reach. */
  readonly span: readonly [number, number];
  /** The setting the model would need outside the tested range (an extrapolation); null otherwise. */
  readonly needed: { readonly real: number | null; readonly coded: number } | null;
  /** Every factor's setting, the solved one included. */
  readonly settings: readonly FactorSetting[];
  /** True when a held setting lies outside the tested range. */
  readonly outside: boolean;
  readonly outsideFactors: readonly OutsideSetting[];
  readonly messages: readonly string[];
  readonly caution: readonly string[];
  /** Under a transform: the target, fit, se and intervals on the transformed scale, where the solve is made. */
  readonly transformed?: { readonly target: number; readonly fit: number; readonly se: number | null; readonly ci: readonly [number, number] | null; readonly pi: readonly [number, number] | null };
}

function fmt(x: number): string {
  return formatSetting(x);
}

function signed(x: number): string {
  return `${x > 0 ? '+' : x < 0 ? '-' : ''}${fmt(Math.abs(x))}`;
}

/**
 * Finds the real setting of one numeric factor that gives the target response, the others held.
 * Method: with the others held at coded values, every product term either omits factor j
 * (adding a constant) or holds it once, and the square of j (when the model has it) holds it
 * twice, so yhat(x_j) = a + s x_j + q x_j^2 with a = b0 + sum_{t not containing j} b_t prod_t x,
 * s = sum_{products t containing j} b_t prod_{t \ j} x and q = b_jj. With q = 0 (no square of j),
 * x_j = (target - a) / s, mapped to real units (common practice for a model linear in each
 * factor; Montgomery, Design and Analysis of Experiments, 8th ed., section 6.7, on coded and real
 * units). When |x_j| > 1 the target lies outside what the tested range reaches: the result gives
 * the nearest end of the range (reachable false) and the setting that would be needed. When s is
 * 0 at the held settings no setting changes the fit: the center is given. With q not 0 the roots
 * of q x^2 + s x + (a - target) = 0 are taken (a cancellation-free formula, see quadraticRoots):
 * every root inside the range is listed in `solutions` and the one nearer the center is the
 * answer; with none inside, the answer is the setting in the range whose fit comes nearest the
 * target (an end, or the turning point x = -s / 2q), and `needed` is the root nearest the range,
 * or null when the parabola never reaches the target. The fit, CI and PI at the setting follow
 * Montgomery section 10.6 (see compilePredictor). Under a transform (fit/response-transform.ts)
 * the same solve is made on the transformed scale, for the transformed target g(T - L); the
 * transform is monotone increasing, so roots, the reach and the nearest setting carry over, and
 * every figure reported (the fit, its intervals, the reach, the turning point's fit) is brought
 * back to the response's own units (back-transform.ts); slope and quadratic stay on the
 * transformed scale, and `transformed` holds the figures there.
 * Cost O(p) after the model is compiled.
 * Throws InputError for a non-finite target, a target outside what the transform allows (at or
 * below the bound for log and negative powers, below it for positive ones), an unknown factor, a categorical factor (it has no
 * settings between its levels; the message gives the fit at each level), a setting given for
 * the factor solved for, and as parseSettings does.
 * Example: for yhat = 40.44 + 0.775 x1 + 0.325 x2 (time 30..40 min; Montgomery 8th ed., section 6.8
 * data), solveForTarget(model, { factor: 'Time', target: 41, at: { Temperature: 155 } }).setting
 * -> 38.59 (x1 = 0.717). For yhat = 10 + x1 - 4 x1^2 (invented), target 9.5: solutions at
 * x1 = -0.25 and 0.5, and the answer is x1 = -0.25.
 */
export function solveForTarget(model: FittedModel, options: SolveOptions): Solution {
  const { target } = options;
  const level = options.level ?? 0.95;
  const alpha = options.alpha ?? 0.05;
  if (typeof target !== 'number' || !Number.isFinite(target)) throw new InputError(`The target needs to be a finite number, got ${target}`);
  const tr = model.transform && model.transform.lambda !== 1 ? model.transform : null;
  const bound = tr ? (tr.lowerBound ?? 0) : 0;
  if (tr && (target < bound || (target === bound && tr.lambda <= 0))) {
    const what = tr.lowerBound === null ? (tr.lambda > 0 ? '0 or more' : 'above 0') : tr.lambda > 0 ? `at or above its lower bound ${bound}` : `above its lower bound ${bound}`;
    throw new InputError(`With the ${tr.token} transform the target for ${model.response} needs to be ${what}, got ${fmt(target)}; give a target ${model.response} can reach`);
  }
  // The solve runs on the fitted scale: z for the target, and every figure it quotes is shown back in the response's units.
  const zTarget = tr ? transformValue(target - bound, tr.lambda) : target;
  const back = (z: number): number => {
    if (!tr) return z;
    const b = backTransform(z, tr.lambda);
    return b === null ? Infinity : bound + b;
  };
  const unitOfY = options.responseUnit;
  const show = (z: number): string => {
    const v = back(z);
    return Number.isFinite(v) ? formatSetting(v, unitOfY) : 'a value with no finite limit';
  };
  const goal = formatSetting(target, unitOfY);
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
    throw new InputError(`${plain}; at the given settings the model predicts ${show(at(-1))} at ${f.levels[0]} and ${show(at(1))} at ${f.levels[1]}`);
  }
  const held = parseSettings(model.factors, options.at ?? {}, { free: [j] });
  const x = held.map((s) => s.coded);
  x[j] = 0;
  const nb = model.blockColumns;
  const bit = 1 << j;
  // yhat(x_j) = a + s x_j + q x_j^2 with the others held.
  let a = model.coef[0];
  let s = 0;
  let q = 0;
  let scale = Math.abs(a);
  const partners: string[] = [];
  model.terms.forEach((t, i) => {
    const coef = model.coef[1 + nb + i];
    if (isSquare(t) && termMask(t) === bit) {
      q += coef;
      scale += Math.abs(coef);
    } else if (!isSquare(t) && t & bit) {
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
  const quadratic = Math.abs(q) > ZERO_SLOPE_TOLERANCE * scale;
  if (!quadratic) q = 0;
  const fitAt = (c: number) => a + s * c + q * c * c;
  const reach: [number, number] = [fitAt(-1), fitAt(1)];
  const unit = f.unit;
  const messages: string[] = [...centerNotes(held)];
  let coded: number;
  let reachable: boolean;
  let needed: Solution['needed'] = null;
  let solutions: { setting: number; coded: number }[] = [];
  let stationary: Solution['stationary'] = null;
  let spanLoHi: [number, number];
  const inRange = (c: number) => Math.abs(c) <= 1 + SETTING_TOLERANCE;
  const clamp = (c: number) => Math.max(-1, Math.min(1, c));
  const realOf = (c: number) => toReal(f, c) as number;
  const at = (c: number) => `${formatSetting(realOf(c), unit)} (coded ${signed(c)})`;
  if (!quadratic) {
    const lo = Math.min(reach[0], reach[1]);
    const hi = Math.max(reach[0], reach[1]);
    const span = `${show(lo)} to ${show(hi)}`;
    spanLoHi = [lo, hi];
    if (Math.abs(s) <= ZERO_SLOPE_TOLERANCE * scale) {
      coded = 0;
      reachable = Math.abs(zTarget - a) <= ZERO_SLOPE_TOLERANCE * scale;
      messages.push(
        reachable
          ? `${f.name} has no effect at these settings (slope 0) and the fit already equals the target: every setting in the tested range gives ${show(a)}; its center is shown.`
          : `${f.name} has no effect at these settings (slope 0): every setting in the tested range gives ${show(a)}, so the target ${goal} cannot be reached by ${f.name}; its center is shown.`,
      );
    } else {
      const xs = (zTarget - a) / s;
      if (inRange(xs)) {
        coded = clamp(xs);
        reachable = true;
        solutions = [{ setting: realOf(coded), coded }];
        messages.push(`To reach ${goal}, set ${f.name} to ${formatSetting(realOf(coded), unit)} (coded ${signed(coded)}).`);
      } else {
        coded = Math.sign(xs);
        reachable = false;
        const real = realOf(xs);
        needed = { real: Number.isFinite(real) ? real : null, coded: xs };
        messages.push(
          `The target ${goal} lies outside what the tested range of ${f.name} reaches at these settings (${span})` +
            (needed.real !== null ? `; the model would need ${f.name} = ${formatSetting(needed.real, unit)} (coded ${signed(xs)}), an extrapolation` : '; the model would need a setting far outside the range') +
            `. The nearest setting inside the range is ${formatSetting(realOf(coded), unit)} (the ${coded > 0 ? 'high' : 'low'} setting).`,
        );
      }
    }
  } else {
    const xv = -s / (2 * q);
    const yv = a - (s * s) / (4 * q);
    const vReal = realOf(xv);
    stationary = { real: Number.isFinite(vReal) ? vReal : null, coded: xv, fit: yv };
    // The span the range reaches: the ends, and the turning point when it lies inside.
    const ends = inRange(xv) ? [-1, 1, clamp(xv)] : [-1, 1];
    let cLo = ends[0];
    let cHi = ends[0];
    for (const c of ends) {
      if (fitAt(c) < fitAt(cLo)) cLo = c;
      if (fitAt(c) > fitAt(cHi)) cHi = c;
    }
    spanLoHi = [fitAt(cLo), fitAt(cHi)];
    const span = `${show(spanLoHi[0])} to ${show(spanLoHi[1])}`;
    const roots = quadraticRoots(q, s, a - zTarget);
    const inside = roots.filter(inRange).map(clamp);
    messages.push(
      `The model is quadratic in ${f.name} (coefficient of its square ${signed(q)} in coded units${tr ? ` on the ${tr.token} scale` : ''}): at these settings the fit turns ${q < 0 ? 'down' : 'up'} at ${f.name} = ` +
        (stationary.real !== null ? formatSetting(stationary.real, unit) : 'a setting far outside the range') +
        ` (coded ${signed(xv)}), where it is ${show(yv)}${inRange(xv) ? '' : ', outside the tested range'}.`,
    );
    if (inside.length > 0) {
      reachable = true;
      solutions = inside.map((c) => ({ setting: realOf(c), coded: c }));
      coded = inside.reduce((best, c) => (Math.abs(c) < Math.abs(best) ? c : best));
      messages.push(
        inside.length === 1
          ? `To reach ${goal}, set ${f.name} to ${at(coded)}.`
          : `Two settings of ${f.name} inside the tested range give ${goal}: ${at(inside[0])} and ${at(inside[1])}; the one nearer the center is shown.`,
      );
    } else {
      reachable = false;
      coded = zTarget > fitAt(cHi) ? cHi : cLo;
      const where = coded === 1 ? 'the high setting' : coded === -1 ? 'the low setting' : `where the fit turns`;
      let need = '';
      if (roots.length > 0) {
        const r = roots.reduce((best, c) => (Math.abs(c) < Math.abs(best) ? c : best));
        const real = realOf(r);
        needed = { real: Number.isFinite(real) ? real : null, coded: r };
        need =
          needed.real !== null
            ? `; the model would need ${f.name} = ${formatSetting(needed.real, unit)} (coded ${signed(r)}), an extrapolation`
            : '; the model would need a setting far outside the range';
      } else {
        need = `; no setting of ${f.name} reaches it in the fitted model, whose fit ${q < 0 ? 'peaks' : 'bottoms out'} at ${show(yv)}`;
      }
      messages.push(
        `The target ${goal} lies outside what the tested range of ${f.name} reaches at these settings (${span})${need}. ` +
          `The nearest setting inside the range is ${formatSetting(realOf(coded), unit)} (${where}).`,
      );
    }
  }
  if (partners.length > 0) {
    messages.push(`${f.name} interacts with other factors in the model (${partners.join(', ')}), so this answer holds only at the settings held here.`);
  }
  x[j] = coded;
  const r = predictor.interval(x);
  const zci: [number, number] | null = r.ciLo !== null && r.ciHi !== null ? [r.ciLo, r.ciHi] : null;
  const zpi: [number, number] | null = r.piLo !== null && r.piHi !== null ? [r.piLo, r.piHi] : null;
  const onScale = onResponseScale(model, { fit: r.fit, se: r.se, ci: zci, pi: zpi });
  const outsideFactors = outsideRange(model.factors, x, model.extent);
  messages.push(...outsideFactors.map((o) => o.message));
  if (outsideFactors.length > 0) messages.push('With a held setting outside the tested range, the answer is an extrapolation of the fitted model.');
  messages.push(...modelNotes(model, alpha), ...onScale.messages);
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
    fit: onScale.fit,
    se: tr ? null : r.se,
    level,
    ci: onScale.ci,
    pi: onScale.pi,
    solutions,
    slope: s,
    quadratic: q,
    stationary: stationary && { ...stationary, fit: back(stationary.fit) },
    reach: [back(reach[0]), back(reach[1])],
    span: [back(spanLoHi[0]), back(spanLoHi[1])],
    needed,
    settings,
    outside: outsideFactors.length > 0,
    outsideFactors,
    messages,
    caution: CAUTION,
    ...(tr ? { transformed: { target: zTarget, fit: r.fit, se: r.se, ci: zci, pi: zpi } } : {}),
  };
}

/**
 * Real roots of q x^2 + s x + c = 0 (q not 0), low to high; a double root once. Method: the
 * cancellation-free form x1 = w / q, x2 = c / w with w = -(s + sign(s) sqrt(s^2 - 4qc)) / 2
 * (Press, Teukolsky, Vetterling and Flannery, Numerical Recipes, 3rd ed., section 5.6). A
 * discriminant below 0 by no more than rounding (ZERO_SLOPE_TOLERANCE relative to s^2 + |4qc|)
 * counts as 0: the target sits at the turning point.
 */
function quadraticRoots(q: number, s: number, c: number): number[] {
  let disc = s * s - 4 * q * c;
  if (disc < 0) {
    if (-disc > ZERO_SLOPE_TOLERANCE * (s * s + Math.abs(4 * q * c))) return [];
    disc = 0;
  }
  const w = -0.5 * (s + (s >= 0 ? 1 : -1) * Math.sqrt(disc));
  if (w === 0) return [0]; // s = 0 and c = 0: the double root at 0
  const x1 = w / q;
  const x2 = c / w;
  if (disc === 0) return [x1];
  return x1 < x2 ? [x1, x2] : [x2, x1];
}
