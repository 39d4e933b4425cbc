import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { centerAndHalfRange, parseNumber, toCoded, toReal } from '../../../src/core/factor/coding.ts';
import { defineFactors, type NumericFactor } from '../../../src/core/factor/factor.ts';
import { factorLetters } from '../../../src/core/factor/letters.ts';

const [temp, powder, speed] = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Speed', low: 100, high: 400, scale: 'log' },
]);

// Montgomery, Design and Analysis of Experiments, 8th ed., section 6.7: x = (u - (high+low)/2) / ((high-low)/2)
describe('coding', () => {
  it('maps low, center and high to -1, 0, +1', () => {
    expect(toCoded(temp, 160)).toBe(-1);
    expect(toCoded(temp, 180)).toBe(0);
    expect(toCoded(temp, 200)).toBe(1);
    expect(toCoded(temp, 190)).toBe(0.5);
    expect(toReal(temp, 0.5)).toBe(190);
  });
  it('a log scale centers on the geometric mean (common practice)', () => {
    expect(toCoded(speed, 200)).toBeCloseTo(0, 12); // sqrt(100 * 400) = 200
    expect(toReal(speed, 0) as number).toBeCloseTo(200, 10);
    expect(toCoded(speed, 400)).toBeCloseTo(1, 12);
  });
  it('categorical levels are -1 and +1, case-insensitive', () => {
    expect(toCoded(powder, 'matte')).toBe(-1);
    expect(toCoded(powder, 'Gloss')).toBe(1);
    expect(toReal(powder, 1)).toBe('gloss');
  });
  it('refuses values it cannot code, naming the factor', () => {
    expect(() => toCoded(powder, 'satin')).toThrow(/Powder has the levels "matte" and "gloss", got "satin"/);
    expect(() => toReal(powder, 0)).toThrow(/only -1/);
    expect(() => toCoded(temp, 'hot')).toThrow(/Temperature needs a number, got "hot"/);
    expect(() => toCoded(speed, 0)).toThrow(/positive/);
    expect(() => toReal(temp, Number.NaN)).toThrow(/finite/);
  });
  it('round-trips real -> coded -> real (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: 1, max: 1e4, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), (low, width, c) => {
        const [f] = defineFactors([{ kind: 'numeric', name: 'X', low, high: low + width }]);
        const u = toReal(f, c) as number;
        expect(toCoded(f, u)).toBeCloseTo(c, 8);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1e3, noNaN: true }), fc.double({ min: 1.01, max: 100, noNaN: true }), fc.double({ min: -2, max: 2, noNaN: true }), (low, ratio, c) => {
        const [f] = defineFactors([{ kind: 'numeric', name: 'X', low, high: low * ratio, scale: 'log' }]);
        expect(toCoded(f, toReal(f, c) as number)).toBeCloseTo(c, 8);
      }),
    );
  });
  it('parses numbers strictly', () => {
    expect(parseNumber(' 12.5 ')).toBe(12.5);
    expect(parseNumber('1e3')).toBe(1000);
    expect(parseNumber('12,5')).toBeNaN();
    expect(parseNumber('')).toBeNaN();
    expect(parseNumber('12abc')).toBeNaN();
  });
});

describe('factors', () => {
  it('letters skip I (common practice: I is the identity)', () => {
    expect(factorLetters(10)).toEqual(['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'J', 'K']);
    expect(() => factorLetters(26)).toThrow(/1 to 25 factors/);
  });
  it('refuses equal levels, duplicate names and empty names', () => {
    expect(() => defineFactors([{ kind: 'numeric', name: 'Temperature', low: 180, high: 180 }])).toThrow(
      'Temperature needs two different levels, got 180 and 180',
    );
    expect(() =>
      defineFactors([
        { kind: 'numeric', name: 'Time', low: 1, high: 2 },
        { kind: 'numeric', name: 'time', low: 1, high: 2 },
      ]),
    ).toThrow(/differ/);
    expect(() => defineFactors([{ kind: 'categorical', name: 'Powder', levels: ['a', 'A'] }])).toThrow(/two different levels/);
    expect(() => defineFactors([{ kind: 'numeric', name: ' ', low: 1, high: 2 }])).toThrow(/needs a name/);
    expect(() => defineFactors([])).toThrow(/at least one factor/);
  });
});

describe('coding near the largest double', () => {
  it('codes settings of -1e308 and 1e308 without overflow (the sum would be Infinity; IEEE 754 binary64 max 1.797e308)', () => {
    const [wide] = defineFactors([{ kind: 'numeric', name: 'W', low: -1e308, high: 1e308 }]);
    expect(toCoded(wide, 1e308)).toBe(1);
    expect(toCoded(wide, 0)).toBe(0);
    expect(toCoded(wide, -5e307)).toBe(-0.5);
    expect(toReal(wide, 0.5)).toBe(5e307);
    const [near] = defineFactors([{ kind: 'numeric', name: 'N', low: 1.6e308, high: 1.7e308 }]);
    expect(toCoded(near, 1.65e308)).toBeCloseTo(0, 12);
  });
  it('property: the halved form gives the same center and half range as (hi+lo)/2 and (hi-lo)/2 for ordinary settings', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e300, max: 1e300, noNaN: true }), fc.double({ min: -1e300, max: 1e300, noNaN: true }), (a, b) => {
        fc.pre(a < b && Math.abs(a) > 1e-290 && Math.abs(b) > 1e-290);
        const [f] = defineFactors([{ kind: 'numeric', name: 'F', low: a, high: b }]);
        expect(centerAndHalfRange(f as NumericFactor)).toEqual({ center: (a + b) / 2, halfRange: (b - a) / 2 });
      }),
    );
  });
});
