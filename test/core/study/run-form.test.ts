import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { blankForm, formFromValues, parseReadings, parseRunForm } from '../../../src/core/study/run-form.ts';
import { study } from '../records/revision-helpers.ts';

// The invented helper plan (test/store/helpers.ts): 2^3 in standard order, then 2 center runs.
describe('blankForm', () => {
  it('starts from the planned settings in real units, with no readings', () => {
    const f = blankForm(study, 2); // standard order run 2: A high, B and C low
    expect(f.actual).toEqual(['200', '2', '30']);
    expect(f.readings).toEqual(['', '']);
    expect([f.loggedAt, f.operator, f.notes, f.excluded, f.reason]).toEqual(['', '', '', false, '']);
  });
  it('degenerate input: a run the plan does not have is refused', () => {
    expect(() => blankForm(study, 99)).toThrow(InputError);
  });
});

describe('parseReadings', () => {
  it('reads repeat readings split by spaces or semicolons (the three yield readings of corner (1), Montgomery 8th ed. section 6.2)', () => {
    expect(parseReadings('28 25; 27', 'Yield')).toEqual([28, 25, 27]);
    expect(parseReadings(' 28;;25 ', 'Yield')).toEqual([28, 25]);
  });
  it('refuses a decimal comma with a hint, and text that is not a number', () => {
    expect(() => parseReadings('62,9', 'Film thickness')).toThrow('Film thickness: reading 1 needs a number, got "62,9" (separate readings with spaces or ;, and use a point or one comma for decimals)');
    expect(() => parseReadings('28 2S', 'Yield')).toThrow('Yield: reading 2 needs a number, got "2S"');
  });
  it('degenerate input: an empty text is no readings', () => {
    expect(parseReadings('', 'Yield')).toEqual([]);
    expect(parseReadings(' ; ', 'Yield')).toEqual([]);
  });
});

describe('parseRunForm and formFromValues', () => {
  it('turns a typed form into checked values and back into the same text', () => {
    const typed = { ...blankForm(study, 3), actual: [' 160 ', '4', '30'], readings: ['68.1 68.4', '80.2'], operator: 'Shift A (invented)', notes: 'first panel' };
    const values = parseRunForm(study, typed);
    expect(values).toEqual({ actual: [160, 4, 30], readings: [[68.1, 68.4], [80.2]], loggedAt: null, operator: 'Shift A (invented)', notes: 'first panel', excluded: false, reason: '' });
    expect(formFromValues(values)).toEqual({ ...typed, actual: ['160', '4', '30'] });
  });
  it('refuses a setting the reader refuses, naming the field', () => {
    expect(() => parseRunForm(study, { ...blankForm(study, 1), actual: ['18,5,1', '2', '30'] })).toThrow('Oven temperature: the actual setting needs a number (digits, with a point or a comma for decimals), got "18,5,1"');
    expect(() => parseRunForm(study, { ...blankForm(study, 1), excluded: true })).toThrow('Excluded: an excluded run needs a reason, got none');
  });
  it('degenerate input: a form with the wrong number of fields', () => {
    expect(() => parseRunForm(study, { ...blankForm(study, 1), actual: [] })).toThrow('Actual settings: needs one per factor (3), got 0');
    expect(() => parseRunForm(study, { ...blankForm(study, 1), readings: [''] })).toThrow('Readings: needs one per response (2), got 1');
  });
});
