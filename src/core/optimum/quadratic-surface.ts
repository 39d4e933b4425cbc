/**
 * A fitted second-order model as a quadratic surface in coded units:
 * y-hat(x) = b0 + x'b + x'Bx, where b holds the main-effect coefficients and B is the symmetric
 * matrix with the square coefficients b_ii on its diagonal and half of each interaction
 * coefficient b_ij / 2 off it (Montgomery, Design and Analysis of Experiments, 8th ed., section
 * 11.3.2, Eq. 11.6, from memory; Box and Wilson 1951). Block contrasts drop out: the surface is
 * for an average block.
 */
import { InputError } from '../errors.ts';
import type { NumericFactor } from '../factor/factor.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { isInteraction, isMainEffect, isSquare, termFactors, termLetters, termOrder } from '../model/term.ts';

export interface QuadraticSurface {
  /** The model's factors, all numeric, in declared order. */
  readonly factors: readonly NumericFactor[];
  readonly b0: number;
  /** First-order coefficients, one per factor. */
  readonly b: readonly number[];
  /** Second-order matrix, k x k symmetric (rows). */
  readonly B: readonly (readonly number[])[];
}

/**
 * The quadratic surface of a fitted model whose terms are main effects, two-factor interactions
 * and squares (any subset; a term the model lacks has coefficient 0). Cost O(k^2 + terms).
 * Throws InputError when a factor is categorical (a surface needs a continuum of settings), or a
 * term is of third order or more (not a quadratic).
 * Example: for yhat = 80 + 1 x1 + 0.5 x2 + 0.25 x1x2 - 1.4 x1^2 - x2^2 -> b = [1, 0.5],
 * B = [[-1.4, 0.125], [0.125, -1]].
 */
export function quadraticSurface(model: FittedModel): QuadraticSurface {
  const cats = model.factors.filter((f) => f.kind !== 'numeric');
  if (cats.length > 0) {
    throw new InputError(
      `A response surface needs numeric factors only; ${cats.map((f) => f.name).join(', ')} ${cats.length === 1 ? 'is' : 'are'} categorical (analyze each level on its own, or leave ${cats.length === 1 ? 'it' : 'them'} out)`,
    );
  }
  const high = model.terms.filter((t) => termOrder(t) > 2);
  if (high.length > 0) {
    throw new InputError(`A quadratic surface holds terms of order 1 and 2 only, got ${high.map((t) => termLetters(t, model.factors)).join(', ')}`);
  }
  const k = model.factors.length;
  const nb = model.blockColumns;
  const b = new Array<number>(k).fill(0);
  const B = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  model.terms.forEach((t, j) => {
    const c = model.coef[1 + nb + j];
    const f = termFactors(t);
    if (isSquare(t)) B[f[0]][f[0]] = c;
    else if (isMainEffect(t)) b[f[0]] = c;
    else if (isInteraction(t)) B[f[0]][f[1]] = B[f[1]][f[0]] = c / 2;
  });
  return { factors: model.factors as readonly NumericFactor[], b0: model.coef[0], b, B };
}

/** y-hat = b0 + x'b + x'Bx at coded x. Cost O(k^2). Example: surfaceValue(s, [0, 0]) -> s.b0. */
export function surfaceValue(s: QuadraticSurface, x: readonly number[]): number {
  let v = s.b0;
  for (let i = 0; i < s.b.length; i++) {
    v += s.b[i] * x[i];
    for (let j = 0; j < s.b.length; j++) v += x[i] * s.B[i][j] * x[j];
  }
  return v;
}

/** Gradient b + 2Bx at coded x. Cost O(k^2). Example: surfaceGradient(s, [0, 0]) -> s.b. */
export function surfaceGradient(s: QuadraticSurface, x: readonly number[]): number[] {
  return s.b.map((bi, i) => bi + 2 * s.B[i].reduce((acc, bij, j) => acc + bij * x[j], 0));
}
