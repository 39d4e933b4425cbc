import { describe, expect, it } from 'vitest';
import { defaultDesirabilityEntry, desirabilityEntryProblem, readDesirabilityEntry, type DesirabilityEntry } from '../../../src/core/optimum/desirability-entry.ts';
import { checkDesirability, desirability } from '../../../src/core/optimum/desirability.ts';
import { InputError } from '../../../src/core/errors.ts';

// The mapping of acceptable and ideal values onto LOW, HIGH and T follows the definitions of
// Derringer and Suich (1980), Journal of Quality Technology 12, 214-219: d = 0 at the acceptable
// value and 1 at the ideal one. Expected values worked by hand from those definitions.
const base: DesirabilityEntry = { goal: 'max', acceptable: '60', ideal: '75', highest: '', weight: '1', shape: '1', shapeAbove: '1' };

describe('readDesirabilityEntry', () => {
  it('maximize: acceptable is LOW (d = 0), ideal is HIGH (d = 1)', () => {
    const s = readDesirabilityEntry('Gloss', base)!;
    expect(s).toEqual({ name: 'Gloss', goal: 'max', low: 60, high: 75, weight: 1, r: 1 });
    expect(desirability(s, 60)).toBe(0);
    expect(desirability(s, 75)).toBe(1);
  });

  it('minimize: ideal is LOW (d = 1), acceptable is HIGH (d = 0); a comma reads as the decimal mark', () => {
    const s = readDesirabilityEntry('Scrap', { ...base, goal: 'min', acceptable: '8', ideal: '2,5', weight: '2', shape: '0,5' })!;
    expect(s).toEqual({ name: 'Scrap', goal: 'min', low: 2.5, high: 8, weight: 2, r: 0.5 });
    expect(desirability(s, 2.5)).toBe(1);
    expect(desirability(s, 8)).toBe(0);
    expect(() => checkDesirability(s)).not.toThrow();
  });

  it('target: lowest, target and highest, with shapes s below and t above', () => {
    const s = readDesirabilityEntry('Thickness', { ...base, goal: 'target', acceptable: '60', ideal: '70', highest: '85', shape: '2', shapeAbove: '0.5' })!;
    expect(s).toEqual({ name: 'Thickness', goal: 'target', low: 60, target: 70, high: 85, weight: 1, s: 2, t: 0.5 });
    expect(desirability(s, 65)).toBeCloseTo(0.25, 14); // ((65 - 60) / 10)^2
    expect(desirability(s, 81.25)).toBeCloseTo(0.5, 14); // ((85 - 81.25) / 15)^0.5
  });

  it('ignore gives no settings', () => {
    expect(readDesirabilityEntry('Gloss', { ...base, goal: 'ignore', acceptable: 'junk' })).toBeNull();
  });

  it('refuses, in plain words naming the response and field, what cannot be used', () => {
    expect(() => readDesirabilityEntry('Gloss', { ...base, acceptable: '' })).toThrow('Gloss: the acceptable value needs a number, got nothing');
    expect(() => readDesirabilityEntry('Gloss', { ...base, ideal: '7x' })).toThrow('Gloss: the ideal value needs a number (digits, with a point or a comma for decimals), got "7x"');
    expect(() => readDesirabilityEntry('Gloss', { ...base, acceptable: '80', ideal: '70' })).toThrow('Gloss: to maximize, the ideal value must be above the acceptable one, got acceptable 80 and ideal 70. Type an ideal value above 80.');
    expect(() => readDesirabilityEntry('Gloss', { ...base, ideal: '60' })).toThrow(/must be above/); // equal values
    expect(() => readDesirabilityEntry('Scrap', { ...base, goal: 'min', acceptable: '2', ideal: '8' })).toThrow(/to minimize, the ideal value must be below/);
    expect(() => readDesirabilityEntry('T', { ...base, goal: 'target', acceptable: '60', ideal: '90', highest: '85' })).toThrow('T: the target must lie between the lowest and the highest acceptable values, got 60, 90 and 85.');
    expect(() => readDesirabilityEntry('T', { ...base, goal: 'target', acceptable: '60', ideal: '70', highest: '' })).toThrow('T: the highest acceptable value needs a number, got nothing');
    expect(() => readDesirabilityEntry('Gloss', { ...base, weight: '0' })).toThrow('Gloss: the importance must be a number above 0, got 0. 1 is the usual choice.');
    expect(() => readDesirabilityEntry('Gloss', { ...base, shape: '-1' })).toThrow(InputError);
    expect(() => readDesirabilityEntry('T', { ...base, goal: 'target', acceptable: '60', ideal: '70', highest: '80', shapeAbove: '0' })).toThrow(/the shape above the target must be a number above 0/);
  });
});

describe('desirabilityEntryProblem', () => {
  it('names the field of the first problem in screen order, "order" for values out of order, null when the entry reads', () => {
    expect(desirabilityEntryProblem('Gloss', base)).toBeNull();
    expect(desirabilityEntryProblem('Gloss', { ...base, goal: 'ignore', ideal: 'x' })).toBeNull();
    expect(desirabilityEntryProblem('Gloss', { ...base, ideal: 'x', weight: '0' })).toEqual({ field: 'ideal', message: 'Gloss: the ideal value needs a number (digits, with a point or a comma for decimals), got "x"' });
    expect(desirabilityEntryProblem('Gloss', { ...base, weight: '0' })?.field).toBe('weight');
    expect(desirabilityEntryProblem('Gloss', { ...base, shape: '0' })?.field).toBe('shape');
    expect(desirabilityEntryProblem('T', { ...base, goal: 'target', acceptable: '60', ideal: '70', highest: '80', shapeAbove: '-2' })?.field).toBe('shapeAbove');
    expect(desirabilityEntryProblem('T', { ...base, goal: 'target', acceptable: '60', ideal: '70', highest: '' })?.field).toBe('highest');
    const order = desirabilityEntryProblem('Gloss', { ...base, acceptable: '80', ideal: '70' });
    expect(order?.field).toBe('order');
    // The same message as the reader gives.
    expect(() => readDesirabilityEntry('Gloss', { ...base, acceptable: '80', ideal: '70' })).toThrow(order!.message);
  });
});

describe('defaultDesirabilityEntry', () => {
  it("maximize and minimize span the logged values; the study's goal is kept", () => {
    expect(defaultDesirabilityEntry({ name: 'Gloss', goal: 'maximize' }, [71, 88.123456, 80])).toMatchObject({ goal: 'max', acceptable: '71', ideal: '88.12', weight: '1', shape: '1' });
    expect(defaultDesirabilityEntry({ name: 'Scrap', goal: 'minimize' }, [3, 9, 5])).toMatchObject({ goal: 'min', acceptable: '9', ideal: '3' });
  });

  it('a target sits in the middle of a range that holds every logged value', () => {
    // T = 70, logged 64 to 73: largest distance 6, so 64 to 76.
    const e = defaultDesirabilityEntry({ name: 'Thickness', goal: 'target', target: 70 }, [64, 73, 69]);
    expect(e).toMatchObject({ goal: 'target', acceptable: '64', ideal: '70', highest: '76' });
    expect(() => readDesirabilityEntry('Thickness', e)).not.toThrow();
  });

  it('another goal picked: its own starting values; a target without one in the study sits mid-range; ignore keeps the values', () => {
    const gloss = { name: 'Gloss', goal: 'maximize' as const };
    expect(defaultDesirabilityEntry(gloss, [71, 89], 'min')).toMatchObject({ goal: 'min', acceptable: '89', ideal: '71' });
    expect(defaultDesirabilityEntry(gloss, [71, 89], 'target')).toMatchObject({ goal: 'target', acceptable: '71', ideal: '80', highest: '89' });
    expect(defaultDesirabilityEntry(gloss, [71, 89], 'ignore')).toMatchObject({ goal: 'ignore', acceptable: '71', ideal: '89' });
    expect(defaultDesirabilityEntry(gloss, [], 'target')).toMatchObject({ goal: 'target', acceptable: '', ideal: '' });
  });

  it('degenerate: no values, or all equal, leave the value fields empty for the person', () => {
    expect(defaultDesirabilityEntry({ name: 'Gloss', goal: 'maximize' }, [])).toMatchObject({ acceptable: '', ideal: '' });
    expect(defaultDesirabilityEntry({ name: 'Gloss', goal: 'maximize' }, [5, 5, Number.NaN])).toMatchObject({ acceptable: '', ideal: '' });
    expect(defaultDesirabilityEntry({ name: 'T', goal: 'target', target: 70 }, [70, 70])).toMatchObject({ acceptable: '', ideal: '70', highest: '' });
  });
});
