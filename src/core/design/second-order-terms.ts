/**
 * The columns of the full second-order model in k factors, as a design sees them before any
 * response exists: main effects, two-factor interactions and squares, in model order
 * (Montgomery, Design and Analysis of Experiments, 8th ed., section 11.1, Eq. 11.2, from memory).
 */
import { InputError } from '../errors.ts';
import { compareTerms, mainEffect, squareTerm, type Term } from '../model/term.ts';

/**
 * The k main effects, k(k-1)/2 two-factor interactions and k squares of a full quadratic model,
 * in model order (the intercept is not among them). Cost O(k^2).
 * Throws InputError for k that is not a whole number from 1 to 25.
 * Example: fullQuadraticTerms(2) -> [A, B, AB, A^2, B^2] as terms.
 */
export function fullQuadraticTerms(k: number): Term[] {
  if (!Number.isInteger(k) || k < 1 || k > 25) throw new InputError(`A quadratic model needs a whole number of factors from 1 to 25, got ${k}`);
  const out: Term[] = [];
  for (let i = 0; i < k; i++) {
    out.push(mainEffect(i), squareTerm(i));
    for (let j = i + 1; j < k; j++) out.push(mainEffect(i) | mainEffect(j));
  }
  return out.sort(compareTerms);
}
