import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import {
  checkTerm,
  compareTerms,
  isInteraction,
  isMainEffect,
  isProduct,
  isSquare,
  mainEffect,
  SQUARE_FLAG,
  squareTerm,
  termColumnFactors,
  termFactors,
  termLetters,
  termMask,
  termName,
  termOrder,
  modelOrder,
  termValue,
} from '../../../src/core/model/term.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200 },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Time', low: 10, high: 20 },
]);
const A = 1, B = 2, C = 4, AB = 3, AC = 5, BC = 6, ABC = 7;
const A2 = squareTerm(0, factors);
const C2 = squareTerm(2, factors);

// The terms of a second-order model y = b0 + sum b_i x_i + sum b_ij x_i x_j + sum b_ii x_i^2
// (Montgomery, Design and Analysis of Experiments, 8th ed., section 11.1, from memory); the
// names, letters and orders below follow from that definition by hand.
describe('model terms: products of distinct factors and squares of one numeric factor', () => {
  it('names and letters', () => {
    expect(termName(A2, factors)).toBe('Temperature^2');
    expect(termLetters(A2, factors)).toBe('A^2');
    expect(termLetters(C2, factors)).toBe('C^2');
    expect(termName(AC, factors)).toBe('Temperature:Time');
    expect(termLetters(ABC, factors)).toBe('ABC');
    expect(termName(0, factors)).toBe('Intercept');
    expect(termLetters(0, factors)).toBe('I');
  });

  it('a square is second order, with one distinct factor used twice', () => {
    expect(termOrder(A2)).toBe(2);
    expect(termOrder(AB)).toBe(2);
    expect(termOrder(ABC)).toBe(3);
    expect(termOrder(0)).toBe(0);
    expect(termFactors(A2)).toEqual([0]);
    expect(termColumnFactors(A2)).toEqual([0, 0]);
    expect(termColumnFactors(AC)).toEqual([0, 2]);
    expect(termMask(C2)).toBe(C);
  });

  it('predicates tell the kinds apart', () => {
    expect([isSquare(A2), isProduct(A2), isInteraction(A2), isMainEffect(A2)]).toEqual([true, false, false, false]);
    expect([isSquare(AB), isProduct(AB), isInteraction(AB), isMainEffect(AB)]).toEqual([false, true, true, false]);
    expect([isSquare(B), isProduct(B), isInteraction(B), isMainEffect(B)]).toEqual([false, true, false, true]);
    expect(isMainEffect(0)).toBe(false);
    expect(mainEffect(2)).toBe(C);
  });

  it('value: x_i^2 for a square, the product for the rest (by hand)', () => {
    expect(termValue(A2, [0.5, -1, 2])).toBe(0.25);
    expect(termValue(C2, [0.5, -1, -1.414])).toBeCloseTo(1.999396, 12);
    expect(termValue(ABC, [0.5, -1, 2])).toBe(-1);
    expect(termValue(0, [0.5, -1, 2])).toBe(1);
  });

  it('property: a square equals the main effect times itself at any coded point (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 3, maxLength: 3 }), (x) => {
        expect(termValue(A2, x)).toBe(termValue(A, x) * termValue(A, x));
        expect(termValue(C2, x)).toBe(x[2] * x[2]);
      }),
    );
  });

  it('model order: main effects, two-factor interactions, squares, then higher interactions (common practice)', () => {
    const sorted = [C2, ABC, A2, BC, AB, C, A, B, AC].sort(compareTerms).map((t) => termLetters(t, factors));
    expect(sorted).toEqual(['A', 'B', 'C', 'AB', 'AC', 'BC', 'A^2', 'C^2', 'ABC']);
  });

  it('refuses the square of a categorical factor, a square of two factors and terms beyond the factors', () => {
    expect(() => squareTerm(1, factors)).toThrow(InputError);
    expect(() => squareTerm(1, factors)).toThrow(/Powder is categorical \("matte" or "gloss"\): its square is the same at both levels/);
    expect(() => squareTerm(3, factors)).toThrow(/one of the 3 factors, got factor 4/);
    expect(() => squareTerm(-1)).toThrow(/whole number from 0 to 24, got -1/);
    expect(() => mainEffect(1.5)).toThrow(InputError);
    expect(() => checkTerm(A2 | B, factors)).toThrow(/squares inside interactions/);
    expect(() => checkTerm(8, factors)).toThrow(/refers to a factor the study does not have \(3 factors\)/);
    expect(() => checkTerm(0, factors)).toThrow(/product of factors or the square of one, got 0/);
    expect(() => checkTerm(A2 & ~A, factors)).toThrow(/at least one factor/);
    expect(() => checkTerm(squareTerm(1), factors)).toThrow(/Powder is categorical/);
    expect(() => checkTerm(Number.NaN, factors)).toThrow(InputError);
    expect(() => checkTerm(A2, factors)).not.toThrow();
    expect(() => checkTerm(ABC, factors)).not.toThrow();
  });
});

describe('termOrder counts factors by bit sums (Hacker\'s Delight, section 5-1): the same as counting them one by one', () => {
  it('every mask of up to 25 factors, with and without the square flag (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 25 - 1 }), (m) => {
        let n = 0;
        for (let i = 0; i < 25; i++) n += (m >> i) & 1;
        expect(termOrder(m)).toBe(n);
        expect(termOrder(SQUARE_FLAG | m)).toBe(n + 1);
      }),
    );
  });
});

describe('modelOrder: the distinct terms in model order, with a one-pass copy for a list already in order', () => {
  it('equals de-duplicating and sorting by compareTerms, on lists in order, out of order and with repeats (fast-check)', () => {
    const term = fc.oneof(fc.integer({ min: 1, max: 63 }), fc.integer({ min: 0, max: 5 }).map((i) => SQUARE_FLAG | (1 << i)));
    fc.assert(
      fc.property(fc.array(term, { maxLength: 40 }), fc.boolean(), (list, presort) => {
        const input = presort ? [...new Set(list)].sort(compareTerms) : list;
        const got = modelOrder(input);
        expect(got).toEqual([...new Set(input)].sort(compareTerms));
        expect(got).not.toBe(input);
      }),
    );
  });
});
