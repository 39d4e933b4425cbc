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
