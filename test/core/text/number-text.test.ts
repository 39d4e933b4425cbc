import { describe, expect, it } from 'vitest';
import { shortNumber } from '../../../src/core/text/number-text.ts';

describe('shortNumber', () => {
  it('four significant digits, trailing zeros dropped', () => {
    expect(shortNumber(40.4625)).toBe('40.46');
    expect(shortNumber(3)).toBe('3');
    expect(shortNumber(-0.035)).toBe('-0.035');
    expect(shortNumber(2.625)).toBe('2.625');
    expect(shortNumber(123456.7)).toBe('123500');
    expect(shortNumber(2.57312, 3)).toBe('2.57');
  });
  it('exponent form for very large and very small magnitudes', () => {
    expect(shortNumber(2e-5)).toBe('2.000e-5');
    expect(shortNumber(1234567)).toBe('1.235e+6');
  });
  it('zero and non-finite values (degenerate input)', () => {
    expect(shortNumber(0)).toBe('0');
    expect(shortNumber(-0)).toBe('0');
    expect(shortNumber(Number.NaN)).toBe('NaN');
    expect(shortNumber(Infinity)).toBe('Infinity');
  });
});
