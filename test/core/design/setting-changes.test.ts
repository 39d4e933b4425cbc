import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { settingChanges } from '../../../src/core/design/setting-changes.ts';
import { InputError } from '../../../src/core/errors.ts';

const runs = (...a: number[]) => a.map((x) => ({ coded: [x, 0] }));
const four = ['Oven', 'Speed', 'Feed', 'Gap'].map((name) => ({ kind: 'numeric' as const, name, low: 0, high: 10 }));

describe('settingChanges: how often a factor changes between consecutive runs', () => {
  it('counts the changes of a hand-written order (counted by hand)', () => {
    expect(settingChanges(runs(-1, -1, 1, -1, 0, 0, 1), 0)).toBe(4);
    expect(settingChanges(runs(-1, -1, 1, -1), 1)).toBe(0);
  });

  it('standard (Yates) order changes A at every run and D once in a 2^4 (Montgomery, 8th ed., section 6.2, from memory)', () => {
    const d = buildDesign({ factors: four, randomize: false });
    expect(settingChanges(d.runs, 0)).toBe(15);
    expect(settingChanges(d.runs, 3)).toBe(1);
  });

  it('a factor kept sorted changes once per block between its two levels, twice with center runs (low, center, high), whatever the seed', () => {
    for (const seed of [1, 2, 3, 4242]) {
      expect(settingChanges(buildDesign({ factors: four, seed, sortBy: ['A'] }).runs, 0)).toBe(1);
      expect(settingChanges(buildDesign({ factors: four, seed, sortBy: ['A'], centerRuns: 3 }).runs, 0)).toBe(2);
    }
  });

  it('an empty or one-run list has no changes (degenerate input); a factor outside the runs is refused', () => {
    expect(settingChanges([], 0)).toBe(0);
    expect(settingChanges(runs(1), 0)).toBe(0);
    expect(() => settingChanges(runs(1, -1), 2)).toThrow(InputError);
  });
});
