import { describe, expect, it } from 'vitest';
import { columnLabels } from '../../../src/core/fit/column-labels.ts';
import { modelColumns } from '../../../src/core/fit/columns.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { squareTerm, termLetters, termName } from '../../../src/core/model/term.ts';

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

describe('columnLabels writes each term as termName and termLetters do (model/term.ts), built one factor at a time', () => {
  it('every product of up to 5 factors and the squares, in any column order', () => {
    const five = defineFactors(['Speed', 'Feed', 'Depth', 'Coolant', 'Tool'].map((name) => ({ kind: 'numeric' as const, name, low: 1, high: 2 })));
    const terms = [...Array.from({ length: 31 }, (_, i) => 31 - i), squareTerm(2, five), squareTerm(0, five)];
    const labels = columnLabels(modelColumns([], terms), five);
    expect(labels[0]).toEqual({ name: 'Intercept', letters: 'I' });
    terms.forEach((t, i) => expect(labels[i + 1]).toEqual({ name: termName(t, five), letters: termLetters(t, five) }));
    expect(labels[1]).toEqual({ name: 'Speed:Feed:Depth:Coolant:Tool', letters: 'ABCDE' });
  });
});
