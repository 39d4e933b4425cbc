import { describe, expect, it } from 'vitest';
import { zeroIfRoundoff } from '../../../src/core/text/roundoff-zero.ts';
import { CONSTANT_TOLERANCE } from '../../../src/core/tolerance.ts';

describe('zeroIfRoundoff', () => {
  it('round-off beside the scale is 0; a real figure stays as it is, at every scale', () => {
    for (let e = -300; e <= 300; e += 50) {
      const s = 10 ** e;
      expect(zeroIfRoundoff(1.6e-15 * s, 10.9 * s)).toBe(0); // an effect of round-off size (a few ulps of 10.9)
      expect(zeroIfRoundoff(-1.6e-15 * s, 10.9 * s)).toBe(0);
      expect(zeroIfRoundoff(0.2 * s, 10.9 * s)).toBe(0.2 * s);
    }
    expect(zeroIfRoundoff(2 * CONSTANT_TOLERANCE * 10, 10)).toBe(2 * CONSTANT_TOLERANCE * 10);
  });
  it('degenerate input: a zero scale leaves everything but 0 alone; non-finite values pass through', () => {
    expect(zeroIfRoundoff(1e-300, 0)).toBe(1e-300);
    expect(zeroIfRoundoff(0, 0)).toBe(0);
    expect(zeroIfRoundoff(Number.POSITIVE_INFINITY, 1)).toBe(Number.POSITIVE_INFINITY);
  });
});
