import { describe, expect, it } from 'vitest';
import { defaultTerms, parseTerms, termsUpToOrder } from '../../../src/core/model/formula.ts';
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
