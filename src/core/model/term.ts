/**
 * A model term is a set of factors, held as a bit mask over the declared order: bit i set means
 * factor i takes part. 0 is the intercept, a single bit a main effect, two bits a two-factor
 * interaction, and so on. Its model column is the product of the coded columns of its factors.
 * Example: with factors Temperature (A) and Powder (B), mask 0b11 is named "Temperature:Powder",
 * lettered "AB".
 */
import type { Factor } from '../factor/factor.ts';

export type Term = number;

/** Number of factors in the term (its order); 0 for the intercept. */
export function termOrder(t: Term): number {
  let n = 0;
  for (let m = t; m !== 0; m &= m - 1) n++;
  return n;
}

/** Factor indices of a term, in declared order. */
export function termFactors(t: Term): number[] {
  const out: number[] = [];
  for (let i = 0; t >> i !== 0; i++) if ((t >> i) & 1) out.push(i);
  return out;
}

/** Name: factor names joined with ':' in declared order; "Intercept" for 0. */
export function termName(t: Term, factors: readonly Factor[]): string {
  if (t === 0) return 'Intercept';
  return termFactors(t).map((i) => factors[i].name).join(':');
}

/** Letters: the factors' letters run together in declared order ("ABD"); "I" for the intercept. */
export function termLetters(t: Term, factors: readonly Factor[]): string {
  if (t === 0) return 'I';
  return termFactors(t).map((i) => factors[i].letter).join('');
}

/**
 * Model order: by order (main effects, then two-factor interactions, ...), then in declared
 * order of the factors (A, B, C; then AB, AC, AD, BC, ...). Common practice for sequential ANOVA.
 */
export function compareTerms(a: Term, b: Term): number {
  const d = termOrder(a) - termOrder(b);
  if (d !== 0) return d;
  const fa = termFactors(a);
  const fb = termFactors(b);
  for (let i = 0; i < fa.length; i++) if (fa[i] !== fb[i]) return fa[i] - fb[i];
  return 0;
}

/** Value of a term's model column at one run: the product of the coded settings. */
export function termValue(t: Term, coded: ArrayLike<number>): number {
  let v = 1;
  for (let i = 0; t >> i !== 0; i++) if ((t >> i) & 1) v *= coded[i];
  return v;
}
