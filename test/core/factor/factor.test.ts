import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors, findFactor } from '../../../src/core/factor/factor.ts';

// The factors of the 2^2 yield example (Montgomery 8th ed., section 6.2): reactant concentration
// 15 and 25 %, catalyst 1 and 2 lb (test/fixtures/montgomery-8e-ex6-1-yield-2x2.csv).
const specs = [
  { kind: 'numeric', name: ' Concentration ', low: 15, high: 25, unit: '%' },
  { kind: 'numeric', name: 'Catalyst', low: 1, high: 2, unit: 'lb' },
  { kind: 'categorical', name: 'Stirrer', levels: [' paddle', 'turbine '] },
] as const;

describe('defineFactors', () => {
  it('assigns letters in declared order and trims names and level labels', () => {
    const f = defineFactors(specs);
    expect(f.map((x) => x.letter)).toEqual(['A', 'B', 'C']);
    expect(f.map((x) => x.name)).toEqual(['Concentration', 'Catalyst', 'Stirrer']);
    expect(f[2]).toEqual({ kind: 'categorical', name: 'Stirrer', letter: 'C', levels: ['paddle', 'turbine'] });
    expect(f[0]).toMatchObject({ low: 15, high: 25, unit: '%' });
  });
  it('refuses what a plan cannot use, saying what was needed and what came', () => {
    expect(() => defineFactors([])).toThrow(new InputError('A study needs at least one factor, got none'));
    expect(() => defineFactors([{ kind: 'numeric', name: ' ', low: 1, high: 2 }])).toThrow('Factor 1 needs a name, got an empty one');
    expect(() => defineFactors([specs[1], { ...specs[1], name: 'CATALYST' }])).toThrow('Factor names must differ, got "CATALYST" twice (factors 1 and 2)');
    expect(() => defineFactors([{ kind: 'numeric', name: 'T', low: 180, high: 180 }])).toThrow('T needs two different levels, got 180 and 180');
    expect(() => defineFactors([{ kind: 'numeric', name: 'T', low: Number.NaN, high: 1 }])).toThrow(/T needs numeric low and high settings/);
    expect(() => defineFactors([{ kind: 'numeric', name: 'Speed', low: 0, high: 10, scale: 'log' }])).toThrow('Speed on a log scale needs positive settings, got 0 and 10');
    expect(() => defineFactors([{ kind: 'categorical', name: 'Mold', levels: ['steel', ' STEEL'] }])).toThrow('Mold needs two different levels, got "steel" and "STEEL"');
    expect(() => defineFactors([{ kind: 'categorical', name: 'Mold', levels: ['steel', ''] }])).toThrow(/Mold needs two named levels/);
  });
});

describe('findFactor', () => {
  const f = defineFactors(specs);
  it('finds by name (case and spaces ignored) before letter', () => {
    expect(findFactor(f, ' catalyst ')?.letter).toBe('B');
    expect(findFactor(f, 'c')?.name).toBe('Stirrer');
    // A factor named like another's letter is found by its name first.
    const tricky = defineFactors([{ kind: 'numeric', name: 'B', low: 0, high: 1 }, { kind: 'numeric', name: 'Time', low: 0, high: 1 }]);
    expect(findFactor(tricky, 'b')?.letter).toBe('A');
  });
  it('degenerate input: nothing matches, or no factors at all, gives undefined', () => {
    expect(findFactor(f, 'Pressure')).toBeUndefined();
    expect(findFactor([], 'A')).toBeUndefined();
  });
});
