import { describe, expect, it } from 'vitest';
import { toCoded, toReal } from '../../../src/core/factor/coding.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { shownCoded, shownSetting } from '../../../src/core/factor/shown-setting.ts';
import { formatSetting } from '../../../src/core/predict/parse-settings.ts';

// Settings for added runs are planned as the screen shows them (common practice: a setting that
// can be dialled); coded units as in Montgomery, Design and Analysis of Experiments, 8th ed., section 6.7.
const factors = defineFactors([
  { kind: 'numeric', name: 'Oven temperature', unit: '°C', low: 160, high: 200 },
  { kind: 'numeric', name: 'Cure time', unit: 'min', low: 10, high: 40, scale: 'log' },
  { kind: 'categorical', name: 'Powder', levels: ['old lot', 'new lot'] },
]);

describe('shownSetting', () => {
  it('keeps 4 significant digits, whole numbers as they are', () => {
    expect(shownSetting(188.965963432)).toBe(189);
    expect(shownSetting(0.0123456)).toBe(0.01235);
    expect(shownSetting(-3.14159)).toBe(-3.142);
    expect(shownSetting(123456)).toBe(123456);
  });

  it('is the number formatSetting writes, so the screen and the plan agree', () => {
    for (const v of [188.965963432, 2.1213203435596424, 0.8017, 1e-7 * Math.PI, 12345.678]) expect(formatSetting(v)).toBe(String(shownSetting(v)));
  });
});

describe('shownCoded', () => {
  it('moves a solved setting to the shown one: 188.966 °C is planned at 189 °C (coded 0.45)', () => {
    const coded = [toCoded(factors[0], 188.965963432), toCoded(factors[1], 17.3), -1];
    const out = shownCoded(factors, coded);
    expect(out[0]).toBeCloseTo(0.45, 14);
    expect(toReal(factors[0], out[0])).toBeCloseTo(189, 12);
    // On the log scale the real setting is the shown one, to rounding.
    expect(toReal(factors[1], out[1]) as number).toBeCloseTo(17.3, 12);
    expect(out[2]).toBe(-1);
  });

  it('leaves the shown text of every setting as it was, and moves each by less than 0.05% of it', () => {
    let s = 3;
    const rnd = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32) * 6 - 3;
    for (let t = 0; t < 200; t++) {
      const coded = [rnd(), rnd(), 1];
      const out = shownCoded(factors, coded);
      for (const i of [0, 1]) {
        const before = toReal(factors[i], coded[i]) as number;
        const after = toReal(factors[i], out[i]) as number;
        expect(formatSetting(after)).toBe(formatSetting(before));
        expect(Math.abs(after - before)).toBeLessThanOrEqual(5e-4 * Math.abs(before));
      }
    }
  });
});
