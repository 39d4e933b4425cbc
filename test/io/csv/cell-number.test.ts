import { describe, expect, it } from 'vitest';
import { cellNumber, isNonFiniteNumberText, whyNotANumber } from '../../../src/io/csv/cell-number.ts';

describe('cellNumber and whyNotANumber', () => {
  it('reads finite numbers only; 1e308 is finite, 1e400 is above the largest double (about 1.797e308, IEEE 754 binary64)', () => {
    expect(cellNumber('12.5')).toBe(12.5);
    expect(cellNumber('1e308')).toBe(1e308);
    for (const t of ['1e400', '-1e400', 'NaN', 'Infinity', '12,5', '', 'seven']) expect(cellNumber(t)).toBeNaN();
  });
  it('says why, with what to do', () => {
    expect(whyNotANumber('1e400')).toMatch(/1e400 is beyond the largest number a calculation can carry \(about 1.8e308\): give it in a larger unit/);
    expect(whyNotANumber('NaN')).toMatch(/"NaN" is not a measurement \(in a file, leave the cell empty/);
    expect(whyNotANumber('-Infinity')).toMatch(/"-Infinity" is not a measurement/);
    expect(whyNotANumber('12,5', ',')).toMatch(/a decimal comma is read only in a file separated by semicolons or tabs, and this file is separated by ",": write 12.5/);
    expect(whyNotANumber('12,5', ';')).toMatch(/mixes decimal commas and points/);
    expect(whyNotANumber('seven')).toBe('');
  });
  it('tells number-like text that cannot be carried from words', () => {
    for (const t of ['1e400', 'nan', 'INF', '+infinity', ' -1e999 ']) expect(isNonFiniteNumberText(t)).toBe(true);
    for (const t of ['12', 'matte', 'Nancy', '', '1e308']) expect(isNonFiniteNumberText(t)).toBe(false);
  });
});
