import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { withoutRoundOff } from '../../../src/core/format/without-round-off.ts';

describe('withoutRoundOff', () => {
  it('drops binary round-off from a computed mean', () => {
    expect((70.2 + 70.4) / 2).toBe(70.30000000000001); // IEEE 754 binary64 arithmetic
    expect(withoutRoundOff((70.2 + 70.4) / 2)).toBe(70.3);
    expect(withoutRoundOff((70.1 + 70.3) / 2)).toBe(70.2); // computed as 70.19999999999999
    expect(withoutRoundOff(0.1 + 0.2)).toBe(0.3);
    expect(withoutRoundOff(1 / 3)).toBe(0.333333333333333);
  });
  it('degenerate input: 0, -0 and values that are not finite come back as they are', () => {
    expect(withoutRoundOff(0)).toBe(0);
    expect(Object.is(withoutRoundOff(-0), -0)).toBe(true);
    expect(withoutRoundOff(Number.NaN)).toBeNaN();
    expect(withoutRoundOff(Infinity)).toBe(Infinity);
  });
  it('property: a decimal of up to 15 significant digits is unchanged (DBL_DIG = 15, ISO C <float.h>)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -(10 ** 15) + 1, max: 10 ** 15 - 1 }), fc.integer({ min: -300, max: 290 }), (m, e) => {
        const x = Number(`${m}e${e}`);
        expect(withoutRoundOff(x)).toBe(x);
      }),
    );
  });
});
