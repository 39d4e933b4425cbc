/**
 * A model term: one column of the model matrix, described by the factors it multiplies.
 *
 * Two kinds of term exist:
 * - a product of distinct factors (the two-level kind): the intercept (no factor), a main effect
 *   (one factor), a two-factor interaction (two), and so on; its column is the product of the
 *   factors' coded columns;
 * - the square of one numeric factor (a pure quadratic term, "A^2"), whose column is x_i^2.
 * Nothing else for now: no cubes, no squares inside interactions.
 *
 * Representation: a Term is a number. Its low bits are the factor set (bit i set: factor i takes
 * part, declared order); the flag bit SQUARE_FLAG means "the square of its single factor". So
 * 0 is the intercept, 0b1 is A, 0b11 is AB and SQUARE_FLAG | 0b1 is A^2.
 * Why a number and not an object: terms are keys of Sets and Maps (de-duplication, p-values by
 * term), equal by ===, stored in Int32Arrays by the compiled predictor, and shared with the
 * design code, whose words are the same factor-set masks; every product term keeps exactly the
 * mask it had before squares existed, so the bit-mask fast paths (Yates' contrasts indexed by
 * mask, the subset-product table, alias words) stay as they are, and a square is told apart by
 * one bit test. An object type would need a key function at every Set and Map.
 * Example: with factors Temperature (A) and Powder (B), mask 0b11 is named "Temperature:Powder",
 * lettered "AB"; squareTerm(0) is named "Temperature^2", lettered "A^2".
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { MAX_FACTORS } from '../factor/letters.ts';

export type Term = number;

/** The flag bit of a square term. Bit 30: above every factor bit (MAX_FACTORS = 25) and still a
 * positive 32-bit integer, so a term fits an Int32Array and survives JavaScript's bit operators. */
export const SQUARE_FLAG = 1 << 30;

/** The bits that hold the factor set. */
export const FACTOR_BITS = SQUARE_FLAG - 1;

if (MAX_FACTORS >= 30) throw new Error('term.ts: the square flag bit must lie above every factor bit');

/** The factor set of a term as a mask (for a square, its single factor's bit). */
export function termMask(t: Term): number {
  return t & FACTOR_BITS;
}

/** True for the square of one factor (x_i^2). */
export function isSquare(t: Term): boolean {
  return (t & SQUARE_FLAG) !== 0;
}

/** True for a product of distinct factors, the intercept (0) included: the two-level kind. */
export function isProduct(t: Term): boolean {
  return (t & SQUARE_FLAG) === 0;
}

/** True for a product of two or more distinct factors (an interaction; never a square). */
export function isInteraction(t: Term): boolean {
  return isProduct(t) && (t & (t - 1)) !== 0;
}

/** True for a main effect: one factor, not squared. */
export function isMainEffect(t: Term): boolean {
  return isProduct(t) && t !== 0 && (t & (t - 1)) === 0;
}

/**
 * The main effect of factor i (0-based, declared order).
 * Throws InputError for an index that is not a whole number from 0 to MAX_FACTORS - 1.
 * Example: mainEffect(2) -> 0b100 (C).
 */
export function mainEffect(i: number): Term {
  checkIndex(i);
  return 1 << i;
}

/**
 * The square of factor i (x_i^2, coded units), a second-order term. Only a numeric factor has a
 * square: a categorical factor has two levels coded -1 and +1, so its square is the constant 1
 * and cannot be told from the intercept (plain algebra; why a second-order design runs each
 * numeric factor at three or more levels). Pass the factors to have that checked.
 * Throws InputError for a bad index, or a factor that is not numeric when the factors are given.
 * Example: squareTerm(0) -> SQUARE_FLAG | 1 (A^2).
 */
export function squareTerm(i: number, factors?: readonly Factor[]): Term {
  checkIndex(i);
  if (factors) {
    if (i >= factors.length) throw new InputError(`A square needs one of the ${factors.length} factors, got factor ${i + 1}`);
    const f = factors[i];
    if (f.kind !== 'numeric') {
      throw new InputError(
        `${f.name} is categorical ("${f.levels[0]}" or "${f.levels[1]}"): its square is the same at both levels, so only a numeric factor can have a square term`,
      );
    }
  }
  return SQUARE_FLAG | (1 << i);
}

function checkIndex(i: number): void {
  if (!Number.isInteger(i) || i < 0 || i >= MAX_FACTORS) throw new InputError(`A factor index must be a whole number from 0 to ${MAX_FACTORS - 1}, got ${i}`);
}

/**
 * Checks that a number describes a term the model can hold with these factors: a product of
 * distinct factors the study has (not the intercept, which is always in the model), or the
 * square of one numeric factor (the terms of a second-order model; common practice). Cost O(1).
 * Throws InputError saying what was needed and what came.
 * Example: checkTerm(SQUARE_FLAG | 0b11, factors) throws (a square has one factor).
 */
export function checkTerm(t: Term, factors: readonly Factor[]): void {
  checkTermBelow(t, factors, 2 ** factors.length);
}

/** checkTerm with 2^k, the first mask beyond the factors, worked out by the caller. */
function checkTermBelow(t: Term, factors: readonly Factor[], limit: number): void {
  if (!Number.isInteger(t) || t <= 0 || t > (SQUARE_FLAG | FACTOR_BITS)) {
    throw new InputError(`A model term must be a product of factors or the square of one, got ${t}`);
  }
  const mask = t & FACTOR_BITS;
  if (mask === 0) throw new InputError(`A model term must name at least one factor, got ${t}`);
  if (mask >= limit) throw new InputError(`Model term ${t} refers to a factor the study does not have (${factors.length} factors)`);
  if (isSquare(t)) {
    if ((mask & (mask - 1)) !== 0) {
      const names = termFactors(mask).map((i) => factors[i].letter).join('');
      throw new InputError(`A square term holds one factor; squares inside interactions (such as ${names} with a square) are not supported, got ${t}`);
    }
    squareTerm(termFactors(mask)[0], factors);
  }
}

/** checkTerm for each term. */
export function checkTerms(terms: readonly Term[], factors: readonly Factor[]): void {
  const limit = 2 ** factors.length;
  for (let i = 0; i < terms.length; i++) checkTermBelow(terms[i], factors, limit);
}

/** Order of a term: the number of factors it multiplies, with repeats (A^2 is second order); 0 for the intercept. */
export function termOrder(t: Term): number {
  return (t & SQUARE_FLAG ? 1 : 0) + bitCount(t & FACTOR_BITS);
}

/** Number of set bits of a 32-bit integer, by the SWAR sums of bit pairs, nibbles and bytes (Warren, Hacker's Delight, 2nd ed., section 5-1). */
function bitCount(m: number): number {
  m = m - ((m >>> 1) & 0x55555555);
  m = (m & 0x33333333) + ((m >>> 2) & 0x33333333);
  return Math.imul((m + (m >>> 4)) & 0x0f0f0f0f, 0x01010101) >>> 24;
}

/** The distinct factor indices of a term, in declared order (A^2 -> [0]). */
export function termFactors(t: Term): number[] {
  const out: number[] = [];
  const m = t & FACTOR_BITS;
  for (let i = 0; m >> i !== 0; i++) if ((m >> i) & 1) out.push(i);
  return out;
}

/** The factor index of each coded column multiplied into the term's column, with repeats (A^2 -> [0, 0]). */
export function termColumnFactors(t: Term): number[] {
  const f = termFactors(t);
  return isSquare(t) ? [f[0], f[0]] : f;
}

/** Name: factor names joined with ':' in declared order, "Temperature^2" for a square; "Intercept" for 0. */
export function termName(t: Term, factors: readonly Factor[]): string {
  if (t === 0) return 'Intercept';
  const m = t & FACTOR_BITS;
  let s = '';
  for (let i = 0; m >> i !== 0; i++) if ((m >> i) & 1) s = s === '' ? factors[i].name : `${s}:${factors[i].name}`;
  return isSquare(t) ? `${s}^2` : s;
}

/** Letters: the factors' letters run together in declared order ("ABD"), "A^2" for a square; "I" for the intercept. */
export function termLetters(t: Term, factors: readonly Factor[]): string {
  if (t === 0) return 'I';
  const m = t & FACTOR_BITS;
  let s = '';
  for (let i = 0; m >> i !== 0; i++) if ((m >> i) & 1) s += factors[i].letter;
  return isSquare(t) ? `${s}^2` : s;
}

/**
 * Model order: by order (main effects, then second-order terms, then third ...); among the
 * second-order terms the two-factor interactions come before the squares; then in declared
 * order of the factors (A, B, C; AB, AC, BC; A^2, B^2; ABC). This is the order in which a
 * second-order model is built up and tested sequentially: first-order terms, then the
 * interactions, then the pure quadratic terms (Myers, Montgomery and Anderson-Cook, Response
 * Surface Methodology, 3rd ed., section 6.2, from memory; common practice for sequential ANOVA).
 * Cost O(1) (no allocation).
 * Example: [A^2, AB, B, A].sort(compareTerms) -> [A, B, AB, A^2].
 */
export function compareTerms(a: Term, b: Term): number {
  const d = termOrder(a) - termOrder(b);
  if (d !== 0) return d;
  const sq = (a & SQUARE_FLAG ? 1 : 0) - (b & SQUARE_FLAG ? 1 : 0);
  if (sq !== 0) return sq;
  // Same order and kind: compare the factor lists lowest index first, one set bit at a time.
  let x = a & FACTOR_BITS;
  let y = b & FACTOR_BITS;
  while (x !== 0 && y !== 0) {
    const lx = x & -x;
    const ly = y & -y;
    if (lx !== ly) return lx - ly;
    x ^= lx;
    y ^= ly;
  }
  return 0;
}

/**
 * The distinct terms in model order (compareTerms), as a new array: a list already in that order
 * without repeats (as formula.ts builds them) is copied after one pass of comparisons, else
 * de-duplicated and sorted. Cost O(p), or O(p log p) for a list out of order.
 * Example: modelOrder([AB, A, A]) -> [A, AB].
 */
export function modelOrder(terms: readonly Term[]): Term[] {
  let ordered = true;
  for (let i = 1; i < terms.length && ordered; i++) if (!(compareTerms(terms[i - 1], terms[i]) < 0)) ordered = false;
  return ordered ? terms.slice() : [...new Set(terms)].sort(compareTerms);
}

/**
 * Value of a term's model column at one run: the product of the coded settings of its factors,
 * or x_i^2 for the square of factor i. Cost O(number of factors). Example: termValue(A^2, [0.5]) -> 0.25.
 */
export function termValue(t: Term, coded: ArrayLike<number>): number {
  const m = t & FACTOR_BITS;
  let v = 1;
  for (let i = 0; m >> i !== 0; i++) if ((m >> i) & 1) v *= coded[i];
  return t & SQUARE_FLAG ? v * v : v;
}
