import { describe, expect, it } from 'vitest';
import { num, setting } from '../../../src/ui/lib/format.ts';

// The screens write negative numbers with the minus sign (U+2212), in settings as in figures (common practice in typesetting).
describe('screen number formats', () => {
  it('a negative setting gets the minus sign, as a figure does; positives and labels are unchanged', () => {
    expect(setting(-2, 'mm')).toBe('−2 mm');
    expect(setting(-2, 'mm').slice(1)).toBe(num(2) + ' mm');
    expect(setting(180, '°C')).toBe('180 °C');
    expect(setting('-nitrogen')).toBe('-nitrogen');
    expect(num(-0.5)).toBe('−0.5');
  });
});
