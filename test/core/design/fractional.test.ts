import { describe, expect, it } from 'vitest';
import { basicFactors, fractionalFactorial, parseFraction } from '../../../src/core/design/fractional.ts';
import { parseGenerators } from '../../../src/core/design/generators.ts';
import { InputError } from '../../../src/core/errors.ts';
import { numericFactors } from './helpers.ts';

describe('fractionalFactorial', () => {
  it('the 2^(4-1) with D = ABC (Montgomery, 8th ed., Table 8.3: runs (1), ad, bd, ab, cd, ac, bc, abcd)', () => {
    const f = numericFactors(4);
    const runs = fractionalFactorial(4, parseGenerators(['D=ABC'], f));
    const names = runs.map((r) => r.coded.map((x, j) => (x > 0 ? 'abcd'[j] : '')).join('') || '(1)');
    expect(names).toEqual(['(1)', 'ad', 'bd', 'ab', 'cd', 'ac', 'bc', 'abcd']);
    expect(runs.map((r) => r.standardOrder)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
  });
  it('switches signs of a sign-reversed generator (D = -ABC, the alternate fraction)', () => {
    const f = numericFactors(4);
    const runs = fractionalFactorial(4, parseGenerators(['D=-ABC'], f));
    expect(runs.every((r) => r.coded[0] * r.coded[1] * r.coded[2] * r.coded[3] === -1)).toBe(true);
  });
  it('is the full factorial with no generators, and refuses no factors (degenerate input)', () => {
    expect(fractionalFactorial(2, []).map((r) => r.coded)).toEqual([[-1, -1], [1, -1], [-1, 1], [1, 1]]);
    expect(() => fractionalFactorial(0, [])).toThrow(InputError);
  });
});

describe('basicFactors', () => {
  it('are the factors no generator defines', () => {
    const f = numericFactors(5);
    expect(basicFactors(5, parseGenerators(['A=BCDE'], f))).toEqual([1, 2, 3, 4]);
    expect(basicFactors(3, [])).toEqual([0, 1, 2]);
  });
  it('refuses a generator outside the design', () => {
    const g = parseGenerators(['E=ABCD'], numericFactors(5));
    expect(() => basicFactors(3, g)).toThrow(InputError);
  });
});

describe('parseFraction', () => {
  it('reads 1/2, 1/4, 1/8 as the number of generators', () => {
    expect(['1/2', '1/4', ' 1 / 8 '].map(parseFraction)).toEqual([1, 2, 3]);
  });
  it('refuses what is not one over a power of two', () => {
    for (const t of ['', '1/1', '1/3', '2/4', '0.5', 'half']) expect(() => parseFraction(t)).toThrow(/1\/2, 1\/4/);
  });
});
