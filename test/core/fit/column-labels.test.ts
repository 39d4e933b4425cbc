import { describe, expect, it } from 'vitest';
import { columnLabels } from '../../../src/core/fit/column-labels.ts';
import { modelColumns } from '../../../src/core/fit/columns.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Time', low: 10, high: 40, scale: 'log' },
]);

describe('columnLabels', () => {
  it("the intercept, block contrasts and terms, names joined by ':'", () => {
    expect(columnLabels(modelColumns([1, 2], [1, 5]), factors)).toEqual([
      { name: 'Intercept', letters: 'I' },
      { name: 'Block 1', letters: 'Block 1' },
      { name: 'Temperature', letters: 'A' },
      { name: 'Temperature:Time', letters: 'AC' },
    ]);
  });
  it('degenerate input: no columns, no labels', () => {
    expect(columnLabels([], factors)).toEqual([]);
  });
});
