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
  let s = '';
  for (let i = 0; t >> i !== 0; i++) if ((t >> i) & 1) s = s === '' ? factors[i].name : `${s}:${factors[i].name}`;
  return s;
}

/** Letters: the factors' letters run together in declared order ("ABD"); "I" for the intercept. */
export function termLetters(t: Term, factors: readonly Factor[]): string {
  if (t === 0) return 'I';
  let s = '';
  for (let i = 0; t >> i !== 0; i++) if ((t >> i) & 1) s += factors[i].letter;
  return s;
}

/**
 * Model order: by order (main effects, then two-factor interactions, ...), then in declared
 * order of the factors (A, B, C; then AB, AC, AD, BC, ...). Common practice for sequential ANOVA.
 */
export function compareTerms(a: Term, b: Term): number {
  const d = termOrder(a) - termOrder(b);
  if (d !== 0) return d;
  // Same order: compare the factor lists lowest index first, one set bit at a time (no allocation).
  let x = a;
  let y = b;
  while (x !== 0 && y !== 0) {
    const lx = x & -x;
    const ly = y & -y;
    if (lx !== ly) return lx - ly;
    x ^= lx;
    y ^= ly;
  }
  return 0;
}

/** Value of a term's model column at one run: the product of the coded settings. */
export function termValue(t: Term, coded: ArrayLike<number>): number {
  let v = 1;
  for (let i = 0; t >> i !== 0; i++) if ((t >> i) & 1) v *= coded[i];
  return v;
}
