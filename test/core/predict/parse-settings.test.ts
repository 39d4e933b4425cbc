import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { readSetting } from '../../../src/core/factor/read-setting.ts';
import { formatSetting, parseSettings } from '../../../src/core/predict/parse-settings.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Speed', low: 10, high: 1000, scale: 'log' },
]);

describe('parseSettings', () => {
  it('codes by name or letter, case-insensitive: x = (u - M) / D (Montgomery 8th ed., section 6.7)', () => {
    const s = parseSettings(factors, { a: 190, Powder: 'GLOSS', speed: '100' });
    // (190 - 180) / 20 = 0.5; gloss is the second level, +1; log scale: ln 100 is the center of ln 10 .. ln 1000
    expect(s.map((x) => x.coded)).toEqual([0.5, 1, 0]);
    expect(s.map((x) => x.real)).toEqual([190, 'gloss', 100]);
    expect(s.map((x) => x.source)).toEqual(['given', 'given', 'given']);
    expect(s[0].unit).toBe('degC');
  });

  it('accepts [name, value] pairs as read from the command line', () => {
    const s = parseSettings(factors, [['A', '170'], ['B', 'matte']]);
    expect(s[0].coded).toBeCloseTo(-0.5, 15);
    expect(s[1].coded).toBe(-1);
  });

  it('reads typed settings by the rule of readSetting, in its words (one domain rule for screens and command line)', () => {
    const message = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return (e as Error).message;
      }
      return 'no error';
    };
    for (const [i, text] of [[0, '18,5,1'], [0, '12abc'], [1, 'silk'], [2, '-5'], [2, '0']] as const) {
      const key = factors[i].letter;
      const given = { A: '170', B: 'matte', [key]: text };
      const expected = message(() => readSetting(factors[i], text));
      expect(expected).not.toBe('no error');
      expect(message(() => parseSettings(factors, given))).toBe(expected);
    }
    // Surrounding spaces are ignored by both, and the level comes back as declared.
    expect(parseSettings(factors, { A: ' 190 ', B: ' GLOSS ' }).slice(0, 2).map((x) => x.real)).toEqual([190, 'gloss']);
  });

  it('holds a numeric factor not given at its center (the geometric mean on a log scale)', () => {
    const s = parseSettings(factors, { Powder: 'matte' });
    expect(s[0]).toMatchObject({ real: 180, coded: 0, source: 'center' });
    expect(s[2].real).toBeCloseTo(Math.sqrt(10 * 1000), 9); // geometric mean, by hand
    expect(s[2].source).toBe('center');
  });

  it('a categorical factor must be given unless the caller has a rule', () => {
    expect(() => parseSettings(factors, { A: 180 })).toThrow(/Powder is categorical and has no center/);
    const s = parseSettings(factors, { A: 180 }, { categoricalDefault: () => 1 });
    expect(s[1]).toMatchObject({ real: 'gloss', coded: 1, source: 'default' });
  });

  it('refuses a level a categorical factor does not have, and a value between its two levels', () => {
    expect(() => parseSettings(factors, { Powder: 'silk' })).toThrow(/Powder needs "matte" or "gloss", got "silk"/);
    expect(() => parseSettings(factors, { Powder: 0 })).toThrow(/no setting between them, got 0/);
    expect(() => parseSettings(factors, { Powder: '0.5' })).toThrow(/no setting between them, got 0.5/);
  });

  it('a free factor takes no setting and is marked free', () => {
    const s = parseSettings(factors, { Powder: 'gloss' }, { free: [0] });
    expect(s[0].source).toBe('free');
    expect(() => parseSettings(factors, { Temperature: 170, Powder: 'gloss' }, { free: [0] })).toThrow(/factor to be found/);
  });

  it('degenerate and bad input: InputError saying what was needed and what came', () => {
    expect(() => parseSettings([], {})).toThrow(InputError);
    expect(() => parseSettings(factors, { Pressure: 3, Powder: 'gloss' })).toThrow(/No factor is named or lettered "Pressure"; the factors are A \(Temperature\)/);
    expect(() => parseSettings(factors, { A: 170, Temperature: 180, Powder: 'gloss' })).toThrow(/given twice \(as "A" and "Temperature"\)/);
    expect(() => parseSettings(factors, { A: '', Powder: 'gloss' })).toThrow(/Temperature needs a setting, got an empty one/);
    expect(() => parseSettings(factors, { A: '18O', Powder: 'gloss' })).toThrow(/Temperature needs a number \(digits, with a point or a comma for decimals\), got "18O"/);
    expect(() => parseSettings(factors, { A: Number.NaN, Powder: 'gloss' })).toThrow(/finite number/);
    expect(() => parseSettings(factors, { C: -5, Powder: 'gloss' })).toThrow(/log scale and needs a positive setting/);
  });
});

describe('formatSetting', () => {
  it('4 significant digits with the unit; labels as they are (common practice for readable reports)', () => {
    expect(formatSetting(157.0968, 'degF')).toBe('157.1 degF');
    expect(formatSetting(35)).toBe('35');
    expect(formatSetting('gloss')).toBe('gloss');
  });

  it('degenerate: zero and a negative number', () => {
    expect(formatSetting(0)).toBe('0');
    expect(formatSetting(-0.000123456)).toBe('-0.0001235');
  });
});
