import { describe, expect, it } from 'vitest';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { isOutside, outsideRange } from '../../../src/core/predict/outside-range.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Speed', low: 10, high: 1000, scale: 'log' },
]);

describe('outsideRange (the tested range is coded -1 to +1; Montgomery 8th ed., section 10.6 on extrapolation)', () => {
  it('names the factor and how far out it is, in real and coded units', () => {
    const out = outsideRange(factors, [1.5, 1, 0]);
    expect(out).toHaveLength(1);
    // 180 + 1.5 x 20 = 210, 10 above the high setting 200 (by hand)
    expect(out[0]).toMatchObject({ name: 'Temperature', real: 210, beyond: 10, end: 'high' });
    expect(out[0].beyondCoded).toBeCloseTo(0.5, 15);
    expect(out[0].message).toBe(
      'Temperature = 210 degC is outside the tested range (160 to 200 degC): 10 degC above the high setting (coded +1.5).',
    );
  });

  it('below the low setting, and on a log scale measured from the nearer end in real units', () => {
    const [t] = outsideRange(factors, [-2, -1, 0]);
    expect(t).toMatchObject({ real: 140, beyond: 20, end: 'low' });
    expect(t.message).toMatch(/20 degC below the low setting \(coded -2\)/);
    const [s] = outsideRange(factors, [0, 1, 2]);
    // coded 2 on ln 10 .. ln 1000: ln u = ln 100 + 2 ln 10, u = 10000, 9000 above 1000 (by hand)
    expect(s.real).toBeCloseTo(10000, 6);
    expect(s.beyond).toBeCloseTo(9000, 6);
  });

  it('the ends themselves are inside; categorical factors are never outside', () => {
    expect(outsideRange(factors, [1, -1, -1])).toEqual([]);
    expect(outsideRange(factors, [-1, 5, 1])).toEqual([]);
    expect(isOutside(1 + 1e-12)).toBe(false);
    expect(isOutside(1.001)).toBe(true);
  });

  it('with a rotatable central composite design the tested range reaches its axial runs: coded 1.4 is inside, 1.5 outside', () => {
    // alpha = 4^(1/4) = 1.41421 for 2 factors (Montgomery 8th ed., section 11.4.1, from memory)
    const alpha = Math.SQRT2;
    const two = defineFactors([
      { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
      { kind: 'numeric', name: 'Time', low: 30, high: 40, unit: 'min' },
    ]);
    expect(isOutside(1.4, alpha)).toBe(false);
    expect(isOutside(1.5, alpha)).toBe(true);
    expect(outsideRange(two, [1.4, -1.4], [alpha, alpha])).toEqual([]);
    expect(outsideRange(two, [alpha, -alpha], [alpha, alpha])).toEqual([]);
    const out = outsideRange(two, [1.5, 0], [alpha, alpha]);
    expect(out).toHaveLength(1);
    // 180 + 1.5 x 20 = 210; highest tested 180 + 1.41421 x 20 = 208.28, so 1.72 above (by hand)
    expect(out[0].beyond).toBeCloseTo(210 - (180 + 20 * alpha), 9);
    expect(out[0].beyondCoded).toBeCloseTo(1.5 - alpha, 12);
    expect(out[0].message).toBe(
      'Temperature = 210 degC is outside the tested range (151.7 to 208.3 degC, axial runs included): 1.716 degC above the highest tested setting (coded +1.5).',
    );
    // without the extent the same setting at 1.4 is outside the factorial box
    expect(outsideRange(two, [1.4, 0])).toHaveLength(1);
  });

  it('degenerate: no factors gives no entries; a non-finite coded value throws', () => {
    expect(outsideRange([], [])).toEqual([]);
    expect(() => outsideRange(factors, [Number.POSITIVE_INFINITY, 1, 0])).toThrow(/finite coded value/);
  });
});
