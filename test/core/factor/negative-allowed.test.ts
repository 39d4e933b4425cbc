import { describe, expect, it } from 'vitest';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { negativeAllowed } from '../../../src/core/factor/negative-allowed.ts';
import type { Response } from '../../../src/core/study/response.ts';

// Invented factors and responses; the rule is our own (documented in negative-allowed.ts).
const [temp, offset, bias, speed, powder, flipped] = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200 },
  { kind: 'numeric', name: 'Offset', low: -2, high: 2, unit: 'mm' },
  { kind: 'numeric', name: 'Bias', low: 0, high: 5, unit: 'V' },
  { kind: 'numeric', name: 'Speed', low: 100, high: 400, scale: 'log' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Trim', low: 3, high: -1 },
]);
const reading = (lowerBound: number | null | undefined): Response => ({ name: 'Gloss', goal: 'maximize', ...(lowerBound === undefined ? {} : { lowerBound }) });

describe('negativeAllowed', () => {
  it('a coded value: always', () => {
    expect(negativeAllowed({ kind: 'coded' })).toBe(true);
  });
  it('a setting: when the range reaches zero or below on a linear scale, whichever end is lower', () => {
    expect(negativeAllowed({ kind: 'setting', factor: temp })).toBe(false);
    expect(negativeAllowed({ kind: 'setting', factor: offset })).toBe(true);
    expect(negativeAllowed({ kind: 'setting', factor: bias })).toBe(true);
    expect(negativeAllowed({ kind: 'setting', factor: flipped })).toBe(true);
  });
  it('a setting on a log scale or of a categorical factor: never', () => {
    expect(negativeAllowed({ kind: 'setting', factor: speed })).toBe(false);
    expect(negativeAllowed({ kind: 'setting', factor: powder })).toBe(false);
  });
  it('a reading: unless its lower bound is at or above zero', () => {
    expect(negativeAllowed({ kind: 'reading', response: reading(0) })).toBe(false);
    expect(negativeAllowed({ kind: 'reading', response: reading(2.5) })).toBe(false);
    expect(negativeAllowed({ kind: 'reading', response: reading(-40) })).toBe(true);
    expect(negativeAllowed({ kind: 'reading', response: reading(null) })).toBe(true);
  });
  it('degenerate: a response with no lower bound field at all allows any sign', () => {
    expect(negativeAllowed({ kind: 'reading', response: reading(undefined) })).toBe(true);
  });
});
