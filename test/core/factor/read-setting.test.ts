import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseNumber } from '../../../src/core/factor/coding.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { readNumber, readSetting } from '../../../src/core/factor/read-setting.ts';

// Invented factors (no published data needed: these are reading rules, not numbers).
const [temp, powder, speed] = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Speed', low: 100, high: 400, scale: 'log' },
]);

describe('readNumber', () => {
  it('reads a number with a point for decimals, spaces around ignored', () => {
    expect(readNumber(' 12.5 ', 'Target')).toBe(12.5);
    expect(readNumber('-3e2', 'Target')).toBe(-300);
  });
  it('takes one comma as the decimal mark (a phone keypad gives it), and a typographic minus sign', () => {
    expect(readNumber('12,5', 'Target')).toBe(12.5);
    expect(readNumber(' 3,74 ', 'Target')).toBe(3.74);
    expect(readNumber('-0,5', 'Target')).toBe(-0.5);
    expect(readNumber('\u22122', 'Target')).toBe(-2);
    expect(readNumber(',5', 'Target')).toBe(0.5);
  });
  it('refuses a comma beside a point or a second comma, trailing text and empty text, saying what came', () => {
    expect(() => readNumber('1,234.5', 'Target')).toThrow('Target needs a number (digits, with a point or a comma for decimals), got "1,234.5"');
    expect(() => readNumber('1,2,5', 'Target')).toThrow('got "1,2,5"');
    expect(() => readNumber('12abc', 'Target')).toThrow('got "12abc"');
    expect(() => readNumber('   ', 'Target')).toThrow('Target needs a number, got nothing');
  });
  it('agrees with the strict parser on any text, the comma read as a point (fast-check)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.double({ noNaN: true, noDefaultInfinity: true }).map(String), fc.double({ noNaN: true, noDefaultInfinity: true }).map((x) => String(x).replace('.', ','))), (t) => {
        const x = parseNumber(t);
        const commaOnce = (t.match(/,/g) ?? []).length === 1 && !t.includes('.') ? parseNumber(t.replace(',', '.')) : Number.NaN;
        if (Number.isFinite(x)) expect(readNumber(t, 'x')).toBe(x);
        else if (Number.isFinite(commaOnce)) expect(readNumber(t, 'x')).toBe(commaOnce);
        else if (!/^\s*\u2212/.test(t)) expect(() => readNumber(t, 'x')).toThrow(/needs a number/);
      }),
    );
  });
});

describe('readSetting', () => {
  it('reads a numeric setting, and a level spelled as declared', () => {
    expect(readSetting(temp, '185')).toBe(185);
    expect(readSetting(powder, '  GLOSS ')).toBe('gloss');
    expect(readSetting(powder, 'Matte')).toBe('matte');
  });
  it('keeps the log-scale rule of the coding: a positive number only', () => {
    expect(readSetting(speed, '250')).toBe(250);
    expect(() => readSetting(speed, '0')).toThrow('Speed needs a positive number (Speed is coded on a log scale), got 0');
  });
  it('names the field as asked and says what came', () => {
    expect(readSetting(temp, '18,5', 'Temperature: the actual setting')).toBe(18.5);
    expect(() => readSetting(temp, '18.5.1', 'Temperature: the actual setting')).toThrow('Temperature: the actual setting needs a number (digits, with a point or a comma for decimals), got "18.5.1"');
    expect(() => readSetting(powder, 'satin')).toThrow('Powder needs "matte" or "gloss", got "satin"');
    expect(() => readSetting(temp, '')).toThrow('Temperature needs a number, got nothing');
  });
});
