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

  it('degenerate: no factors gives no entries; a non-finite coded value throws', () => {
    expect(outsideRange([], [])).toEqual([]);
    expect(() => outsideRange(factors, [Number.POSITIVE_INFINITY, 1, 0])).toThrow(/finite coded value/);
  });
});
