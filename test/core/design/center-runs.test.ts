import { describe, expect, it } from 'vitest';
import { centerSet, spreadOverBlocks } from '../../../src/core/design/center-runs.ts';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';

describe('centerSet', () => {
  it('puts numeric factors at 0 (Montgomery, 8th ed., section 6.8)', () => {
    const f = defineFactors([
      { kind: 'numeric', name: 'Temperature', low: 160, high: 200 },
      { kind: 'numeric', name: 'Time', low: 10, high: 20 },
    ]);
    expect(centerSet(f)).toEqual([[0, 0]]);
  });
  it('repeats a center run at every combination of the categorical levels', () => {
    const f = defineFactors([
      { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
      { kind: 'numeric', name: 'Temperature', low: 160, high: 200 },
      { kind: 'categorical', name: 'Line', levels: ['1', '2'] },
    ]);
    expect(centerSet(f)).toEqual([[-1, 0, -1], [1, 0, -1], [-1, 0, 1], [1, 0, 1]]);
  });
  it('refuses when every factor is categorical (degenerate input)', () => {
    const f = defineFactors([{ kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] }]);
    expect(() => centerSet(f)).toThrow(/need at least one numeric factor; all 1 factors are categorical \(Powder\)/);
  });
});

describe('spreadOverBlocks', () => {
  it('spreads evenly, the first blocks taking any remainder', () => {
    expect(spreadOverBlocks(4, 2)).toEqual([2, 2]);
    expect(spreadOverBlocks(5, 2)).toEqual([3, 2]);
    expect(spreadOverBlocks(3, 4)).toEqual([1, 1, 1, 0]);
  });
  it('handles none and refuses bad counts (degenerate input)', () => {
    expect(spreadOverBlocks(0, 4)).toEqual([0, 0, 0, 0]);
    expect(() => spreadOverBlocks(-1, 2)).toThrow(InputError);
    expect(() => spreadOverBlocks(2, 0)).toThrow(InputError);
  });
});
