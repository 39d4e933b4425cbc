/**
 * Canonical analysis of a fitted second-order surface y-hat = b0 + x'b + x'Bx (coded units):
 * the stationary point x_s = -B^-1 b / 2, where the gradient b + 2Bx vanishes, with its fitted
 * value y_s = b0 + x_s'b / 2; the eigenvalues lambda_i of B, whose signs tell a maximum (all
 * negative), a minimum (all positive) or a saddle (mixed), and whose unit eigenvectors are the
 * principal axes, so that y-hat = y_s + sum lambda_i w_i^2 in the rotated coordinates
 * w = V'(x - x_s). Source: Box and Wilson (1951), Journal of the Royal Statistical Society B 13,
 * 1-45; Montgomery, Design and Analysis of Experiments, 8th ed., section 11.3.2, Eqs. 11.7-11.9
 * (from memory).
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { symmetricEigen } from '../linalg/symmetric-eigen.ts';
import { cachedPredictor } from '../predict/compiled-predictor.ts';
import { SETTING_TOLERANCE, SINGULAR_TOLERANCE, SURFACE_AGREEMENT_TOLERANCE } from '../tolerance.ts';
import { quadraticSurface, surfaceValue, type QuadraticSurface } from './quadratic-surface.ts';

/**
 * The surface is called a ridge when its smallest eigenvalue in magnitude is below this fraction
 * of its largest: along that axis the response hardly changes, so a line or plane of nearly equal
 * settings exists. The rule and its 0.05 are the project's (common practice: a "small"
 * eigenvalue; Myers, Montgomery and Anderson-Cook, Response Surface Methodology, 3rd ed., section
 * 6.4, on ridge systems, from memory).
 */
export const RIDGE_RATIO = 0.05;

export type SurfaceNature = 'maximum' | 'minimum' | 'saddle' | 'ridge';

export interface StationaryPoint {
  /** Coded settings, declared order. */
  readonly coded: readonly number[];
  /** Real settings, declared order. */
  readonly real: readonly number[];
  readonly fit: number;
  /** True when every coded setting lies in [-1, 1] (the factorial box), within rounding. */
  readonly inside: boolean;
}

export interface CanonicalAnalysis {
  readonly surface: QuadraticSurface;
  /** Eigenvalues of B, largest first (signed). */
  readonly eigenvalues: readonly number[];
  /** Unit eigenvectors (one per eigenvalue), largest-magnitude entry positive. */
  readonly eigenvectors: readonly (readonly number[])[];
  readonly nature: SurfaceNature;
  /** null when B is singular (an eigenvalue is zero): no single stationary point exists. */
  readonly stationary: StationaryPoint | null;
  readonly notes: readonly string[];
}

/**
 * The nature of a surface from the eigenvalues of B: "ridge" when min |lambda| < RIDGE_RATIO x
 * max |lambda|; otherwise "maximum" (all negative), "minimum" (all positive), "saddle" (mixed).
 * Throws InputError for no eigenvalues or all of them zero (a flat, first-order surface).
 * Example: surfaceNature([-0.96, -1.41]) -> 'maximum'; surfaceNature([1, -0.01]) -> 'ridge'.
 */
export function surfaceNature(eigenvalues: readonly number[]): SurfaceNature {
  if (eigenvalues.length === 0) throw new InputError('The nature of a surface needs at least one eigenvalue, got none');
  const abs = eigenvalues.map(Math.abs);
  const most = Math.max(...abs);
  if (!(most > 0)) throw new InputError('Every eigenvalue of B is zero: the fitted surface has no second-order part, so it has no maximum, minimum or saddle');
  if (Math.min(...abs) < RIDGE_RATIO * most) return 'ridge';
  if (eigenvalues.every((l) => l < 0)) return 'maximum';
  if (eigenvalues.every((l) => l > 0)) return 'minimum';
  return 'saddle';
}

/**
 * The canonical analysis of a fitted quadratic model (see the file comment). The stationary
 * point is found in the eigenbasis, x_s = -sum_i (v_i'b / (2 lambda_i)) v_i, and is null when
 * some |lambda_i| is below SINGULAR_TOLERANCE of the largest. Its fit comes from the model's
 * compiled predictor (for an average block). Cost O(k^3).
 * Throws InputError as quadraticSurface does (categorical factor, third-order term) and when B is
 * zero (see surfaceNature).
 * Example: for Montgomery 8th ed., Example 11.2 (yield), x_s = (0.389, 0.306) coded, 86.95 min and
 * 176.53 degF, y_s = 80.21, eigenvalues -0.9634 and -1.4141: a maximum (from memory).
 */
export function canonicalAnalysis(model: FittedModel): CanonicalAnalysis {
  const surface = quadraticSurface(model);
  const k = surface.b.length;
  const { values, vectors } = symmetricEigen(surface.B);
  const nature = surfaceNature(values);
  const notes: string[] = [];
  const most = Math.max(...values.map(Math.abs));
  let stationary: StationaryPoint | null = null;
  if (values.every((l) => Math.abs(l) > SINGULAR_TOLERANCE * most)) {
    const x = new Array<number>(k).fill(0);
    values.forEach((l, i) => {
      const g = vectors[i].reduce((s, v, j) => s + v * surface.b[j], 0);
      for (let j = 0; j < k; j++) x[j] -= (g / (2 * l)) * vectors[i][j];
    });
    const fit = cachedPredictor(model).fit(x);
    stationary = {
      coded: x,
      real: x.map((c, i) => toReal(surface.factors[i], c) as number),
      fit,
      inside: x.every((c) => Math.abs(c) <= 1 + SETTING_TOLERANCE),
    };
    if (Math.abs(fit - surfaceValue(surface, x)) > SURFACE_AGREEMENT_TOLERANCE * Math.max(1, Math.abs(fit))) {
      throw new InputError('The model and its quadratic surface disagree at the stationary point; the model is inconsistent');
    }
    if (!stationary.inside) notes.push('The stationary point lies outside the factorial box [-1, 1] on some factor: the prediction there is an extrapolation.');
  } else {
    notes.push('B is singular: the surface has a line (or plane) of stationary points or none, so no single stationary point is reported; see the ridge analysis.');
  }
  if (nature === 'ridge') notes.push('One eigenvalue is near zero: the surface is a ridge, so settings along its axis give nearly the same response.');
  if (nature === 'saddle') notes.push('The eigenvalues have mixed signs: the stationary point is a saddle (a minimax), neither the best nor the worst setting.');
  return { surface, eigenvalues: values, eigenvectors: vectors, nature, stationary, notes };
}
