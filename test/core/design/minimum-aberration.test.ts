import { describe, expect, it } from 'vitest';
import { columnsToGenerators, minimumAberration, patternOf } from '../../../src/core/design/minimum-aberration.ts';
import { InputError } from '../../../src/core/errors.ts';
import { mask } from './helpers.ts';

describe('patternOf', () => {
  it('the [15,11] Hamming code: A3..A15 = 35,105,168,280,435,435,280,168,105,35,0,0,1 (MacWilliams and Sloane 1977, ch. 1, Hamming weight enumerator)', () => {
    const cols: number[] = [];
    for (let c = 1; c < 16; c++) if (c & (c - 1)) cols.push(c);
    expect(patternOf(15, cols).slice(3)).toEqual([35, 105, 168, 280, 435, 435, 280, 168, 105, 35, 0, 0, 1]);
  });
  it('the 2^(7-3) with E=ABC, F=BCD, G=ACD has 7 words of length 4 (Montgomery, 8th ed., section 8.3)', () => {
    expect(patternOf(7, [mask('ABC'), mask('BCD'), mask('ACD')])).toEqual([0, 0, 0, 0, 7, 0, 0, 0]);
  });
  it('refuses products outside the basic factors and no basic factor (degenerate input)', () => {
    expect(() => patternOf(4, [mask('ABCD')])).toThrow(InputError);
    expect(() => patternOf(1, [1])).toThrow(InputError);
  });
});

describe('minimumAberration', () => {
  it('finds the resolution IV 2^(7-2) with one word of length 4 and two of length 5 (Fries and Hunter 1980, Technometrics 22, 601-608)', () => {
    const r = minimumAberration(7, 2);
    expect(r.pattern.slice(3)).toEqual([0, 1, 2, 0, 0]);
  });
  it('finds the resolution V 2^(8-2): two words of length 5, one of length 6 (NIST/SEMATECH e-Handbook section 5.3.3.4.7: 2^(8-2) resolution V with G=ABCD, H=ABEF, from memory)', () => {
    expect(minimumAberration(8, 2).pattern.slice(3)).toEqual([0, 0, 2, 1, 0, 0]);
  });
  it('with a bound, returns no columns when nothing beats it', () => {
    const best = minimumAberration(9, 5);
    expect(minimumAberration(9, 5, best.pattern).columns).toBeNull();
  });
  it('refuses designs that cannot exist or have no generator (degenerate input)', () => {
    expect(() => minimumAberration(4, 0)).toThrow(InputError);
    expect(() => minimumAberration(8, 5)).toThrow(/8 runs carry at most 7 factors/);
    expect(() => minimumAberration(5, 2, [0, 0])).toThrow(/has 6 entries/);
  });
});

describe('columnsToGenerators', () => {
  it('writes results in letters, basic factors first', () => {
    expect(columnsToGenerators(7, [mask('ABC'), mask('ABD'), mask('ACD')])).toEqual(['E=ABC', 'F=ABD', 'G=ACD']);
    expect(columnsToGenerators(3, [])).toEqual([]);
  });
});
