import { describe, expect, it } from 'vitest';
import { defaultTerms, parseTerms, quadraticTerms, termsUpToOrder } from '../../../src/core/model/formula.ts';
import { InputError } from '../../../src/core/errors.ts';
import { termLetters, termName } from '../../../src/core/model/term.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200 },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Time', low: 10, high: 20 },
]);
const letters = (text: string) => parseTerms(text, factors).map((t) => termLetters(t, factors));

// Wilkinson and Rogers (1973), Applied Statistics 22, 392-399: the operators + : * ^ and -.
describe('parseTerms (Wilkinson-Rogers notation)', () => {
  it('sums and colons', () => {
    expect(letters('A + B + A:B')).toEqual(['A', 'B', 'AB']);
    expect(letters('Temperature + Powder:Time')).toEqual(['A', 'BC']);
  });
  it('crossing expands to every product, in model order', () => {
    expect(letters('A*B*C')).toEqual(['A', 'B', 'C', 'AB', 'AC', 'BC', 'ABC']);
  });
  it('a power limits the order', () => {
    expect(letters('(A+B+C)^2')).toEqual(['A', 'B', 'C', 'AB', 'AC', 'BC']);
  });
  it('minus removes a term', () => {
    expect(letters('A*B*C - A:B:C')).toEqual(['A', 'B', 'C', 'AB', 'AC', 'BC']);
  });
  it('a run of letters is an interaction', () => {
    expect(letters('A + B + AB')).toEqual(['A', 'B', 'AB']);
  });
  it('names terms by factor names joined with ":" in declared order', () => {
    const [t] = parseTerms('Time:Temperature', factors);
    expect(termName(t, factors)).toBe('Temperature:Time');
  });
  it('refuses unknown factors and broken formulas with a clear message', () => {
    expect(() => parseTerms('A + Pressure', factors)).toThrow(/unknown factor "Pressure"/);
    expect(() => parseTerms('A +', factors)).toThrow(/at the end/);
    expect(() => parseTerms('(A + B', factors)).toThrow(/closing/);
    expect(() => parseTerms('', factors)).toThrow(/empty/);
    expect(() => parseTerms('A - A', factors)).toThrow(/no terms/);
  });
});

describe('termsUpToOrder and defaultTerms', () => {
  it('counts C(k,1) + ... + C(k,order) terms', () => {
    expect(termsUpToOrder(4, 2)).toHaveLength(4 + 6);
    expect(termsUpToOrder(7, 7)).toHaveLength(127);
    expect(defaultTerms(3).map((t) => termLetters(t, factors))).toEqual(['A', 'B', 'C', 'AB', 'AC', 'BC']);
  });
  it('refuses order 0', () => {
    expect(() => termsUpToOrder(3, 0)).toThrow(/order/);
  });
});

// Squares: the second-order model y = b0 + sum b_i x_i + sum b_ij x_i x_j + sum b_ii x_i^2
// (Montgomery, Design and Analysis of Experiments, 8th ed., section 11.1, from memory). A power of
// one factor's name is its square; a power of a parenthesised sum keeps the Wilkinson-Rogers crossing.
describe('parseTerms: squares and the quadratic model', () => {
  it('a power of one name is its square, by name or letter; a power of a sum is still a crossing', () => {
    expect(letters('A + A^2')).toEqual(['A', 'A^2']);
    expect(letters('Temperature^2 + Time^2 + A:C')).toEqual(['AC', 'A^2', 'C^2']);
    expect(letters('(A+B+C)^2')).toEqual(['A', 'B', 'C', 'AB', 'AC', 'BC']);
    expect(letters('A^1')).toEqual(['A']);
    expect(letters('A^2 - A^2 + C')).toEqual(['C']);
  });
  it('quadratic: main effects, two-factor interactions and the squares of the numeric factors', () => {
    expect(letters('quadratic')).toEqual(['A', 'B', 'C', 'AB', 'AC', 'BC', 'A^2', 'C^2']);
    expect(letters('quadratic - A:B - C^2')).toEqual(['A', 'B', 'C', 'AC', 'BC', 'A^2']);
    expect(quadraticTerms(factors)).toEqual(parseTerms('quadratic', factors));
  });
  it('refuses cubes, squares inside interactions and squares of categorical factors, saying why', () => {
    expect(() => parseTerms('A^3', factors)).toThrow(/cubes and higher powers of a factor are not supported/);
    expect(() => parseTerms('A^2:C', factors)).toThrow(/A\^2:C would put a square inside an interaction/);
    expect(() => parseTerms('A^2*C', factors)).toThrow(/square inside an interaction/);
    expect(() => parseTerms('(A^2 + C)^2', factors)).toThrow(/square inside an interaction/);
    expect(() => parseTerms('A^2:A', factors)).toThrow(/three times or more/);
    expect(() => parseTerms('AC^2', factors)).toThrow(/AC\^2 would put a square inside an interaction/);
    expect(() => parseTerms('Powder^2', factors)).toThrow(/Powder is categorical \("matte" or "gloss"\)/);
    expect(() => parseTerms('B^2', factors)).toThrow(InputError);
  });
  it('degenerate: quadraticTerms of no factors', () => {
    expect(() => quadraticTerms([])).toThrow(/at least one factor, got none/);
  });
});
