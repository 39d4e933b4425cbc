import { describe, expect, it } from 'vitest';
import { codingRows } from '../../../src/core/fit/coding-rows.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Time', low: 10, high: 40, scale: 'log' },
]);

describe('codingRows', () => {
  it('one row per factor: real settings at -1 and +1, scale and unit (README, analysis conventions)', () => {
    expect(codingRows(factors)).toEqual([
      { name: 'Temperature', letter: 'A', kind: 'numeric', low: 160, high: 200, scale: 'linear', unit: 'degC' },
      { name: 'Powder', letter: 'B', kind: 'categorical', low: 'matte', high: 'gloss', scale: 'linear' },
      { name: 'Time', letter: 'C', kind: 'numeric', low: 10, high: 40, scale: 'log' },
    ]);
  });
  it('degenerate input: no factors, no rows', () => {
    expect(codingRows([])).toEqual([]);
  });
});
