import { describe, expect, it } from 'vitest';
import { defineResponses } from '../../../src/core/study/define-responses.ts';

// Rules, not numbers: every response is named, names differ, a target goal has a target (common practice).
describe('defineResponses', () => {
  it('trims names and units, drops an empty unit, keeps a target only with the target goal', () => {
    expect(
      defineResponses([
        { name: ' Gloss ', unit: ' GU ', goal: 'maximize', target: '5' },
        { name: 'Thickness', unit: '  ', goal: 'target', target: ' 70.5 ' },
        { name: 'Haze', goal: 'target', target: 2 },
      ]),
    ).toEqual([
      { name: 'Gloss', unit: 'GU', goal: 'maximize' },
      { name: 'Thickness', goal: 'target', target: 70.5 },
      { name: 'Haze', goal: 'target', target: 2 },
    ]);
  });
  it('refuses none, an empty name and a repeated name (case ignored)', () => {
    expect(() => defineResponses([])).toThrow('A study needs at least one response (what you will measure), got none');
    expect(() => defineResponses([{ name: ' ', goal: 'maximize' }])).toThrow('Response 1 needs a name');
    expect(() => defineResponses([{ name: 'Gloss', goal: 'maximize' }, { name: 'gloss', goal: 'minimize' }])).toThrow('Response names must differ, got "gloss" twice (responses 1 and 2)');
  });
  it('a target goal needs a readable, finite target', () => {
    expect(() => defineResponses([{ name: 'Gloss', goal: 'target', target: '' }])).toThrow('Gloss: the goal is a target, so it needs a target value');
    expect(() => defineResponses([{ name: 'Gloss', goal: 'target' }])).toThrow('Gloss: the goal is a target, so it needs a target value');
    expect(defineResponses([{ name: 'Gloss', goal: 'target', target: '7,5' }])[0].target).toBe(7.5); // a decimal comma, as a phone keypad gives it
    expect(() => defineResponses([{ name: 'Gloss', goal: 'target', target: '7,5,0' }])).toThrow('Gloss: the target needs a number (digits, with a point or a comma for decimals), got "7,5,0"');
    expect(() => defineResponses([{ name: 'Gloss', goal: 'target', target: Number.POSITIVE_INFINITY }])).toThrow('needs a finite number');
  });
  it('refuses an unknown goal', () => {
    expect(() => defineResponses([{ name: 'Gloss', goal: 'biggest' as never }])).toThrow('the goal is maximize, minimize or target, got "biggest"');
  });
});

// Rules, not numbers (common practice): a response may have a lowest value it can take.
describe('defineResponses: the lowest value a response can take', () => {
  it('"cannot be negative" is a lower bound of 0; another bound is read from typed text; empty means none', () => {
    const r = defineResponses([
      { name: 'Roughness', goal: 'minimize', lowerBound: 0 },
      { name: 'Temperature rise', goal: 'minimize', lowerBound: ' 20,5 ' },
      { name: 'Gloss', goal: 'maximize', lowerBound: '' },
      { name: 'Haze', goal: 'maximize', lowerBound: null },
    ]);
    expect(r.map((x) => x.lowerBound)).toEqual([0, 20.5, undefined, undefined]);
  });
  it('refuses a bound that is not a number, and a target below the bound', () => {
    expect(() => defineResponses([{ name: 'Roughness', goal: 'minimize', lowerBound: 'zero' }])).toThrow('Roughness: the lowest value needs a number');
    expect(() => defineResponses([{ name: 'Roughness', goal: 'target', target: '-1', lowerBound: 0 }])).toThrow(
      'Roughness: the target -1 is below the lowest value it can take (0); raise the target or change the lowest value',
    );
    expect(defineResponses([{ name: 'Roughness', goal: 'target', target: '0', lowerBound: 0 }])[0]).toEqual({ name: 'Roughness', goal: 'target', target: 0, lowerBound: 0 });
  });
});
