import { describe, expect, it } from 'vitest';
import { combinationLabel } from '../../../src/core/fit/combination-label.ts';

// The trade's usual way of writing aliased combinations (e.g. Montgomery, 8th ed., section 8.2: "A + BCD").
describe('combinationLabel', () => {
  it('writes unit weights without a number and signs between terms', () => {
    expect(combinationLabel([{ letters: 'C', weight: 1 }, { letters: 'AB', weight: 1 }])).toBe('C + AB');
    expect(combinationLabel([{ letters: 'A', weight: 1 }, { letters: 'BCD', weight: -1 }])).toBe('A - BCD');
    expect(combinationLabel([{ letters: 'A', weight: -1 }])).toBe('-A');
    expect(combinationLabel([{ letters: 'A', weight: 1 }, { letters: 'BC', weight: 0.5 }])).toBe('A + 0.5 BC');
    expect(combinationLabel([{ letters: 'I', weight: 1 }, { letters: 'AB', weight: 1 + 1e-12 }])).toBe('I + AB');
  });
  it('an empty combination is empty', () => {
    expect(combinationLabel([])).toBe('');
  });
});
