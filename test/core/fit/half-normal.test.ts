import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bySize, halfNormalQuantiles } from '../../../src/core/fit/half-normal.ts';
import { normalQuantile } from '../../../src/core/dist/normal.ts';

describe('halfNormalQuantiles (Daniel 1959, plotting positions (i - 0.5)/m)', () => {
  it('Phi^-1(0.5 + 0.5 (i - 0.5) / m), the same on a second call and as a copy the caller may change', () => {
    // Phi^-1(0.75), the upper quartile of the standard normal: 0.6745 to four places (from memory).
    expect(halfNormalQuantiles(1)[0]).toBeCloseTo(0.6745, 4);
    const q = halfNormalQuantiles(15);
    expect(q).toEqual(Array.from({ length: 15 }, (_, i) => normalQuantile(0.5 + (0.5 * (i + 0.5)) / 15)));
    q[0] = 99;
    expect(halfNormalQuantiles(15)[0]).not.toBe(99);
    expect(halfNormalQuantiles(0)).toEqual([]);
  });
});

describe('bySize: the order a stable sort on |effect| gives', () => {
  it('against Array.prototype.sort, which is stable (ECMA-262, 2019 and later), on effects with ties and signs (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -6, max: 6 }).map((v) => v / 2), { maxLength: 140 }), (effects) => {
        const expected = effects.map((_, i) => i).sort((a, b) => Math.abs(effects[a]) - Math.abs(effects[b]));
        expect(Array.from(bySize(effects))).toEqual(expected);
      }),
    );
  });
  it('degenerate input: no effects, no order', () => {
    expect(Array.from(bySize([]))).toEqual([]);
    expect(Array.from(bySize([3, -1, 2]))).toEqual([1, 2, 0]);
  });
});
