import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { flipSign, isNegativeText } from '../../../src/core/factor/flip-sign.ts';
import { parseTypedNumber } from '../../../src/core/factor/read-setting.ts';

// Reading rules of our own (no published source needed); the numbers read back through the
// app's own parser (read-setting.ts), so the button and the field agree.
describe('flipSign', () => {
  it('puts a minus in front and keeps a decimal comma as typed', () => {
    expect(flipSign('3,74')).toBe('-3,74');
    expect(flipSign('0.5')).toBe('-0.5');
    expect(flipSign('3,')).toBe('-3,');
  });
  it('removes a leading minus of either kind (hyphen-minus or U+2212)', () => {
    expect(flipSign('-3')).toBe('3');
    expect(flipSign('\u22122')).toBe('2');
    expect(flipSign('  -1,5')).toBe('1,5');
  });
  it('turns a leading plus into a minus and leaves an exponent\'s sign alone', () => {
    expect(flipSign('+4')).toBe('-4');
    expect(flipSign('1e-3')).toBe('-1e-3');
    expect(flipSign('-1e-3')).toBe('1e-3');
  });
  it('degenerate: empty text becomes a lone minus, and a lone minus becomes empty again', () => {
    expect(flipSign('')).toBe('-');
    expect(flipSign('-')).toBe('');
    expect(flipSign('   ')).toBe('-');
  });
  it('property: twice is the text without leading spaces or plus, and the number read is negated', () => {
    const typed = fc.tuple(fc.constantFrom('', '-', '\u2212', '+'), fc.nat(99999), fc.nat(999), fc.constantFrom('.', ',')).map(([s, a, b, mark]) => `${s}${a}${mark}${b}`);
    fc.assert(
      fc.property(typed, (t) => {
        const once = flipSign(t);
        expect(isNegativeText(once)).toBe(!isNegativeText(t));
        // "+ 0" makes -0 and 0 one value (Object.is tells them apart).
        expect(parseTypedNumber(once) + 0).toBe(-parseTypedNumber(t) + 0);
        // A Unicode minus comes back as the keyboard's one; a plus is dropped.
        expect(flipSign(once)).toBe(isNegativeText(t) ? `-${t.slice(1)}` : t.replace(/^\+/, ''));
      }),
    );
  });
});

describe('isNegativeText', () => {
  it('sees a leading minus of either kind, leading spaces ignored', () => {
    expect(isNegativeText('-3,74')).toBe(true);
    expect(isNegativeText(' \u22122')).toBe(true);
    expect(isNegativeText('3')).toBe(false);
    expect(isNegativeText('1e-3')).toBe(false);
  });
  it('degenerate: empty text is not negative', () => {
    expect(isNegativeText('')).toBe(false);
  });
});
