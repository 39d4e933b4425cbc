/**
 * The path of steepest ascent (or descent, for a response to make smaller) from the center of
 * the tested region: the first-order direction of Box and Wilson (1951), as set out in
 * Montgomery, Design and Analysis of Experiments, 8th ed., section 11.2, and Myers, Montgomery
 * and Anderson-Cook, Response Surface Methodology, 4th ed., section 5.1.
 */
import { InputError } from '../errors.ts';
import { centerAndHalfRange, toReal } from '../factor/coding.ts';
import { findFactor } from '../factor/factor.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { isInteraction, isSquare, mainEffect, termLetters } from '../model/term.ts';
import type { Response } from '../study/response.ts';
import { onResponseScale } from './back-transform.ts';
import { CAUTION } from './caution.ts';
import { cachedPredictor, type PointInterval } from './compiled-predictor.ts';
import { isOutside } from './outside-range.ts';
import { formatSetting, parseSettings, type SettingsInput } from './parse-settings.ts';
import { pPhrase } from '../text/p-value.ts';
import { curvatureNote } from '../text/verdict-text.ts';

/** The longest path computed in one call (common practice: a few to a few dozen steps are run). */
export const MAX_PATH_STEPS = 1000;

export type PathSense = 'ascent' | 'descent';

export interface PathOptions {
  /** The base factor (numeric, moving), by name or letter; default: the largest |main effect|. */
  readonly base?: string;
  /**
   * The base factor's real step, a positive number in its units; on a log scale, the ratio by
   * which its setting is multiplied each step (greater than 1).
   */
  readonly step: number;
  /** Number of steps after the origin (1 to MAX_PATH_STEPS). */
  readonly steps: number;
  /** 'ascent' (default) to make the response larger, 'descent' to make it smaller. */
  readonly sense?: PathSense;
  /**
   * Levels of categorical factors (default: the better level by its main effect) and settings
   * of numeric factors to hold still (a numeric factor not given moves along the path).
   */
  readonly at?: SettingsInput;
  /** Confidence level of the prediction intervals; default 0.95. */
  readonly level?: number;
  /** Significance level for the interaction and curvature warnings; default 0.05. */
  readonly alpha?: number;
}

export interface PathFactor {
  readonly name: string;
  readonly letter: string;
  readonly kind: 'numeric' | 'categorical';
  readonly unit?: string;
  readonly scale: 'linear' | 'log';
  /** True for a numeric factor that moves along the path. */
  readonly moving: boolean;
  /** Its main-effect coefficient in coded units (0 when the model has none). */
  readonly coef: number;
}

export interface PathStep {
  /** 0 is the origin (the center of the moving factors). */
  readonly step: number;
  /** Real settings, one per factor (a level label for a categorical factor). */
  readonly real: readonly (number | string)[];
  readonly coded: readonly number[];
  /** Predicted response from the fitted model (all its terms). */
  readonly fit: number;
  /** Prediction interval (at `level`) for one run there; null when the residual df is 0. */
  readonly pi: readonly [number, number] | null;
  /** True once any setting lies outside the tested range: the prediction is an extrapolation. */
  readonly outside: boolean;
}

export interface SteepestPath {
  readonly response: string;
  readonly sense: PathSense;
  /** Confidence level of the prediction intervals. */
  readonly level: number;
  readonly factors: readonly PathFactor[];
  readonly base: { readonly name: string; readonly letter: string; readonly step: number; readonly codedStep: number };
  /** Coded change per step, one per factor (0 for held factors); proportional to the main-effect coefficients. */
  readonly direction: readonly number[];
  /** Real change per step, one per factor (0 for held factors); on a log scale the ratio per step. */
  readonly realStep: readonly number[];
  readonly steps: readonly PathStep[];
  /** First step outside the tested range, or null. */
  readonly firstOutside: number | null;
  readonly messages: readonly string[];
  readonly caution: readonly string[];
}

/**
 * The path sense a response's goal asks for: maximize -> ascent, minimize -> descent.
 * Throws InputError for a target goal, which has no single direction. Common practice.
 * Example: pathSenseForGoal({ name: 'Gloss', goal: 'maximize' }) -> 'ascent'.
 */
export function pathSenseForGoal(response: Response): PathSense {
  if (response.goal === 'maximize') return 'ascent';
  if (response.goal === 'minimize') return 'descent';
  throw new InputError(`${response.name} aims at a target, so the path has no single direction: choose ascent or descent`);
}

function fmt(x: number): string {
  return formatSetting(x);
}

/**
 * Computes the path of steepest ascent (descent) from the first-order part of the fitted model.
 * Method (Box and Wilson 1951, JRSS B 13, 1-45; following Montgomery 8th ed., section 11.2 and
 * Myers, Montgomery and Anderson-Cook, RSM 4th ed., section 5.1): the direction in coded units
 * is proportional to the main-effect coefficients b_i. The base factor's coded step is its real
 * step over its half-range, Delta x_base = step / D_base; each other moving factor steps
 * Delta x_i = b_i / |b_base| x Delta x_base (times -1 for descent), and its real step is
 * Delta x_i x D_i. Step k sits at k Delta x from the center; categorical factors are held at the
 * level given (default: the better level by its main effect) and numeric factors given in `at`
 * are held still. Each step's prediction uses the full fitted model, and a step is marked
 * outside once it leaves the tested range (the point of the path is to leave it). Warns when
 * interactions or curvature are significant, since the first-order direction then points less
 * reliably. With squares in the model the direction is unchanged (at the center the gradient of a
 * second-order model is still the main-effect coefficients, since b_ii x_i^2 and b_ij x_i x_j
 * have zero slope there: plain calculus) and a message says that the surface curves along the
 * path. Worked example (Montgomery 8th ed., section 11.2): yhat = 40.44 + 0.775 x1 +
 * 0.325 x2, base time with a 5 min step -> Delta x1 = 1, Delta x2 = 0.42, about 2 degF per step.
 * Cost O(steps x p) after the model is compiled.
 * Throws InputError for a step that is not a positive number (a ratio above 1 on a log scale), a
 * step count outside 1..MAX_PATH_STEPS, an unknown, categorical or held base factor, a base
 * factor without a main effect, no numeric factor left to move, and as parseSettings does.
 * Example: steepestPath(model, { base: 'Time', step: 5, steps: 2 }).steps[1].real -> [40, 157.1].
 */
export function steepestPath(model: FittedModel, options: PathOptions): SteepestPath {
  const sense = options.sense ?? 'ascent';
  const level = options.level ?? 0.95;
  const alpha = options.alpha ?? 0.05;
  const sgn = sense === 'descent' ? -1 : 1;
  if (sense !== 'ascent' && sense !== 'descent') throw new InputError(`The path goes by ascent or descent, got "${String(sense)}"`);
  const { step, steps } = options;
  if (!Number.isInteger(steps) || steps < 1 || steps > MAX_PATH_STEPS) {
    throw new InputError(`The number of steps must be a whole number from 1 to ${MAX_PATH_STEPS}, got ${steps}`);
  }
  const factors = model.factors;
  const nb = model.blockColumns;
  const mainCoef = factors.map((_, i) => {
    const j = model.terms.indexOf(mainEffect(i));
    return j < 0 ? 0 : model.coef[1 + nb + j];
  });
  const messages: string[] = [];
  const settings = parseSettings(factors, options.at ?? {}, {
    categoricalDefault: (_f, i) => (sgn * mainCoef[i] < 0 ? -1 : 1),
  });
  settings.forEach((s, i) => {
    if (s.source === 'default') {
      const b = mainCoef[i];
      messages.push(
        b === 0
          ? `${s.name} has no main effect in the model; held at ${s.real}.`
          : `${s.name} held at ${s.real}, the better level by its main effect (coefficient ${b > 0 ? '+' : ''}${fmt(b)}).`,
      );
    } else if (s.source === 'given') {
      messages.push(`${s.name} held at ${formatSetting(s.real, s.unit)}, as given${s.kind === 'numeric' ? '; it does not move' : ''}.`);
    }
  });
  const moving = settings.map((s) => s.kind === 'numeric' && s.source === 'center');
  if (!moving.some(Boolean)) throw new InputError('The path needs at least one numeric factor to move; all are categorical or held by --at');

  let baseIdx: number;
  if (options.base !== undefined) {
    const f = findFactor(factors, options.base);
    if (!f) throw new InputError(`No factor is named or lettered "${options.base}"; the factors are ${factors.map((x) => `${x.letter} (${x.name})`).join(', ')}`);
    baseIdx = factors.indexOf(f);
    if (f.kind === 'categorical') throw new InputError(`The base factor must be numeric; ${f.name} is categorical ("${f.levels[0]}" or "${f.levels[1]}")`);
    if (!moving[baseIdx]) throw new InputError(`The base factor must move along the path; ${f.name} is held at a given setting`);
  } else {
    baseIdx = -1;
    for (let i = 0; i < factors.length; i++) if (moving[i] && (baseIdx < 0 || Math.abs(mainCoef[i]) > Math.abs(mainCoef[baseIdx]))) baseIdx = i;
  }
  const base = factors[baseIdx];
  if (base.kind !== 'numeric') throw new InputError(`The base factor must be numeric; ${base.name} is categorical`);
  const bBase = mainCoef[baseIdx];
  if (bBase === 0) {
    let best = -1;
    for (let i = 0; i < factors.length; i++) if (moving[i] && mainCoef[i] !== 0 && (best < 0 || Math.abs(mainCoef[i]) > Math.abs(mainCoef[best]))) best = i;
    throw new InputError(
      `${base.name} has no main effect in the model, so it does not move along the path and cannot be the base` +
        (best >= 0 ? `; choose another (the largest main effect is ${factors[best].name})` : '; no moving factor has a main effect'),
    );
  }
  const log = base.scale === 'log';
  if (typeof step !== 'number' || !Number.isFinite(step) || (log ? step <= 1 : step <= 0)) {
    throw new InputError(
      log
        ? `${base.name} is coded on a log scale, so its step is the ratio by which it is multiplied each step, a number above 1; got ${step}`
        : `The base factor's step must be a positive number of ${base.unit ?? 'its units'}, got ${step}`,
    );
  }
  const { halfRange: dBase } = centerAndHalfRange(base);
  const codedStep = (log ? Math.log(step) : step) / Math.abs(dBase);
  // (b_i / |b_base|) first, so the base factor's step is exactly +-codedStep.
  const direction = factors.map((_, i) => (moving[i] ? sgn * (mainCoef[i] / Math.abs(bBase)) * codedStep + 0 : 0));
  const realStep = factors.map((f, i) => {
    if (f.kind !== 'numeric' || !moving[i]) return 0;
    const { halfRange } = centerAndHalfRange(f);
    const d = direction[i] * halfRange;
    return f.scale === 'log' ? Math.exp(d) : d + 0;
  });
  for (let i = 0; i < factors.length; i++) {
    const f = factors[i];
    if (!moving[i] || f.kind !== 'numeric') continue;
    if (mainCoef[i] === 0) messages.push(`${f.name} has no main effect in the model, so it stays at its center.`);
    else if (f.scale === 'log') messages.push(`${f.name} is coded on a log scale: its setting is multiplied by ${fmt(realStep[i])} each step.`);
  }

  const predictor = cachedPredictor(model, level);
  const origin = settings.map((s) => s.coded);
  const x = new Float64Array(factors.length);
  const out: PathStep[] = [];
  const buf: PointInterval = { fit: 0, se: null, ciLo: null, ciHi: null, piLo: null, piHi: null };
  let firstOutside: number | null = null;
  const scaleMessages = new Set<string>();
  for (let k = 0; k <= steps; k++) {
    let outside = false;
    for (let i = 0; i < factors.length; i++) {
      x[i] = origin[i] + k * direction[i];
      if (factors[i].kind === 'numeric' && isOutside(x[i])) outside = true;
    }
    predictor.interval(x, buf);
    if (outside && firstOutside === null) firstOutside = k;
    // In the response's units (back-transform.ts); the direction is the same on either scale.
    const sc = onResponseScale(model, { fit: buf.fit, se: buf.se, ci: null, pi: buf.piLo !== null && buf.piHi !== null ? [buf.piLo, buf.piHi] : null });
    for (const m of sc.messages) scaleMessages.add(m);
    out.push({
      step: k,
      real: factors.map((f, i) => toReal(f, x[i])),
      coded: Array.from(x),
      fit: sc.fit,
      pi: sc.pi,
      outside,
    });
  }
  messages.push(...scaleMessages);
  if (firstOutside !== null) {
    const leaving = factors.filter((f, i) => f.kind === 'numeric' && isOutside(out[firstOutside!].coded[i])).map((f) => f.name);
    messages.push(
      `${firstOutside === 0 ? 'The origin lies' : `From step ${firstOutside} the path lies`} outside the tested range (${leaving.join(', ')}): the predictions there are extrapolations of the fitted model. That is the point of the path, but confirm each step with a run and stop when the response stops ${sense === 'ascent' ? 'rising' : 'falling'}.`,
    );
  }
  if (model.dfResidual <= 0 || model.sigma === null) {
    messages.push('No runs are left over to estimate the noise (residual df 0): the significance of interactions and curvature cannot be judged, and there are no intervals.');
  }
  const significantOf = (keep: (t: number) => boolean) =>
    model.terms
      .filter(keep)
      .map((t) => ({ t, p: model.pValues.get(t) ?? null }))
      .filter((e): e is { t: number; p: number } => e.p !== null && e.p < alpha);
  const significant = significantOf(isInteraction);
  if (significant.length > 0) {
    messages.push(
      `Interactions are significant (${significant.map((e) => `${termLetters(e.t, factors)} ${pPhrase(e.p)}`).join(', ')}): the response surface twists, so the path from the main effects points less reliably.`,
    );
  }
  const squares = model.terms.filter(isSquare);
  if (squares.length > 0) {
    const sig = significantOf(isSquare);
    messages.push(
      `The model holds squares (${squares.map((t) => termLetters(t, factors)).join(', ')}): the path still starts in the direction of steepest ${sense} at the center (the gradient there is the main-effect coefficients), but the fitted surface curves, so a straight path may pass a peak or a valley; the predictions along it use every term` +
        (sig.length > 0 ? `, and the squares ${sig.map((e) => `${termLetters(e.t, factors)} ${pPhrase(e.p)}`).join(', ')} are significant` : '') +
        '. With a second-order model, its stationary point and canonical analysis describe the surface better than a straight path.',
    );
  }
  if (model.curvatureP !== null && model.curvatureP < alpha) {
    messages.push(curvatureNote(model.curvatureP, 'path'));
  }
  if (nb > 0) messages.push('Predictions are for an average block.');
  return {
    response: model.response,
    sense,
    level,
    factors: factors.map((f, i) => ({
      name: f.name,
      letter: f.letter,
      kind: f.kind,
      ...(f.kind === 'numeric' && f.unit ? { unit: f.unit } : {}),
      scale: f.kind === 'numeric' ? (f.scale ?? 'linear') : 'linear',
      moving: moving[i],
      coef: mainCoef[i],
    })),
    base: { name: base.name, letter: base.letter, step, codedStep },
    direction,
    realStep,
    steps: out,
    firstOutside,
    messages,
    caution: CAUTION,
  };
}
