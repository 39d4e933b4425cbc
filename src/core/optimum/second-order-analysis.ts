/**
 * The second-order part of an analysis, computed beside the fit (never inside it): the canonical
 * analysis, the ridge analysis out to the design's largest distance from the center, and the
 * best setting inside the tested box for the response's goal, each with fitted values and
 * intervals from the model's compiled predictor, plus the standing caution.
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { isSquare, termOrder } from '../model/term.ts';
import { cachedPredictor } from '../predict/compiled-predictor.ts';
import { CAUTION } from '../predict/caution.ts';
import { boxOptimum, type Goal } from './box-optimum.ts';
import { canonicalAnalysis, type CanonicalAnalysis } from './canonical-analysis.ts';
import { quadraticSurface } from './quadratic-surface.ts';
import { ridgeAnalysis, type RidgePoint } from './ridge-analysis.ts';

export interface BestSetting {
  readonly coded: readonly number[];
  readonly real: readonly number[];
  readonly fit: number;
  /** 95% confidence interval of the mean there; null when the residual df is 0. */
  readonly ci: readonly [number, number] | null;
  /** 95% prediction interval for one new run there; null when the residual df is 0. */
  readonly pi: readonly [number, number] | null;
  readonly method: string;
}

export interface SecondOrderAnalysis {
  readonly goal: Goal;
  readonly canonical: CanonicalAnalysis;
  /** Ridge of highest response for 'max', lowest for 'min', toward the target for a target. */
  readonly ridgeSense: 'max' | 'min';
  readonly ridge: readonly RidgePoint[];
  readonly optimum: BestSetting;
  readonly notes: readonly string[];
  readonly caution: readonly string[];
}

/**
 * True when a model can take a second-order analysis: at least one square, no term above second
 * order, and numeric factors only. Cost O(terms + k).
 * Example: isSecondOrderModel(model of 'quadratic' on numeric factors) -> true; of 'A*B' -> false.
 */
export function isSecondOrderModel(model: FittedModel): boolean {
  return model.terms.some(isSquare) && model.terms.every((t) => termOrder(t) <= 2) && model.factors.every((f) => f.kind === 'numeric');
}

/**
 * The second-order analysis of a fitted quadratic model (see the file comment) for the runs'
 * coded settings `points` (their largest distance from the center bounds the ridge) and a goal.
 * The ridge for a target climbs when the target is above the fit at the center, else descends.
 * Cost O(3^k k^3) for the best setting plus O(k^3) and the ridge table.
 * Throws InputError for a model that is not second order (isSecondOrderModel), no points, or as
 * canonicalAnalysis, ridgeAnalysis and boxOptimum do.
 * Example: for Montgomery 8th ed., Example 11.2 and the goal max: nature 'maximum', stationary
 * point (0.389, 0.306) inside the box, the optimum there, ridge radii 0.1 to 1.4.
 */
export function secondOrderAnalysis(model: FittedModel, points: readonly (readonly number[])[], goal: Goal): SecondOrderAnalysis {
  if (!isSecondOrderModel(model)) {
    throw new InputError('A second-order analysis needs a model with squares, no terms above second order and numeric factors only (such as --terms quadratic)');
  }
  if (points.length === 0) throw new InputError('A second-order analysis needs the runs\' settings, got none');
  const canonical = canonicalAnalysis(model);
  const surface = quadraticSurface(model);
  const maxRadius = Math.max(...points.map((p) => Math.sqrt(p.reduce((s, v) => s + v * v, 0))));
  const ridgeSense = goal.kind === 'target' ? (goal.target >= surface.b0 ? 'max' : 'min') : goal.kind;
  const ridge = maxRadius >= 0.1 ? ridgeAnalysis(model, ridgeSense, maxRadius) : [];
  const best = boxOptimum(surface, goal);
  const iv = cachedPredictor(model).interval(best.coded);
  const optimum: BestSetting = {
    coded: best.coded,
    real: best.coded.map((c, i) => Number((toReal(surface.factors[i], c) as number).toPrecision(12))),
    fit: iv.fit,
    ci: iv.ciLo !== null && iv.ciHi !== null ? [iv.ciLo, iv.ciHi] : null,
    pi: iv.piLo !== null && iv.piHi !== null ? [iv.piLo, iv.piHi] : null,
    method: best.method,
  };
  const notes = [...canonical.notes];
  if (model.terms.filter(isSquare).length < model.factors.length) notes.push('Not every factor has a square in the model: the surface is flat in curvature along those factors.');
  if (ridge.length > 0 && ridge[ridge.length - 1].radius > 1) notes.push('Ridge points beyond radius 1 lie outside the factorial box on some factor; they stay within the design\'s own extent (its axial runs).');
  return { goal, canonical, ridgeSense, ridge, optimum, notes, caution: CAUTION };
}
