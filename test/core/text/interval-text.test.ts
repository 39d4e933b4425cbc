import { describe, expect, it } from 'vitest';
import { intervalText, valueText } from '../../../src/core/text/interval-text.ts';
import { shortNumber } from '../../../src/core/text/number-text.ts';

describe('intervalText: open ends in words, never "Infinity"', () => {
  it('a finite interval reads lo to hi, with the unit once', () => {
    expect(intervalText([1.23456, 2], shortNumber, ' µm')).toBe('1.235 to 2 µm');
  });
  it('an open upper end (a back-transform beyond the inverse transform; back-transform.ts) reads "no upper limit"', () => {
    const t = intervalText([2, Infinity], shortNumber, ' µm');
    expect(t).toBe('2 µm or more (no upper limit)');
    expect(t).not.toMatch(/Infinity/);
  });
  it('an open lower end and both ends', () => {
    expect(intervalText([-Infinity, 3], shortNumber)).toBe('3 or less (no lower limit)');
    expect(intervalText([-Infinity, Infinity], shortNumber)).toBe('no finite value');
  });
  it('degenerate input: null gives the missing mark', () => {
    expect(intervalText(null, shortNumber)).toBe('-');
    expect(intervalText(null, shortNumber, '', 'not available')).toBe('not available');
    expect(valueText(null, shortNumber)).toBe('-');
    expect(valueText(Infinity, shortNumber)).toBe('no finite value');
    expect(valueText(4, shortNumber, ' mm')).toBe('4 mm');
  });
});
