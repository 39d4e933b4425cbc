import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { InputError } from '../../../src/core/errors.ts';
import { tIntervals, type FitIntervals } from '../../../src/core/fit/t-intervals.ts';

const require = createRequire(import.meta.url);
const jStat = require('jstat') as { studentt: { inv(p: number, df: number): number } };

// Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6: CI = x0'b +- t se,
// se = sigma sqrt(x0'(X'X)^-1 x0); PI = x0'b +- t sigma sqrt(1 + x0'(X'X)^-1 x0).
describe('tIntervals', () => {
  it('the example by hand: center 10, q = 0.25, sigma 2, t = 2.306 (t_{0.025,8}, Montgomery Appendix Table II)', () => {
    const r = tIntervals(10, 0.25, 2, 2.306);
    expect(r.se).toBe(1);
    expect(r.ciLo).toBeCloseTo(7.694, 12);
    expect(r.ciHi).toBeCloseTo(12.306, 12);
    expect(r.piLo).toBeCloseTo(10 - 2.306 * 2 * Math.sqrt(1.25), 12);
    expect(r.piHi).toBeCloseTo(15.156, 3);
  });

  it('with the t quantile from jstat 1.9.6: the CI covers 1 - alpha of the t distribution of (center - mean) / se', () => {
    const t = jStat.studentt.inv(0.975, 8);
    expect(t).toBeCloseTo(2.306, 3); // Montgomery Appendix Table II: t_{0.025,8} = 2.306
    const r = tIntervals(-3, 4, 0.5, t);
    expect((r.ciHi! - r.ciLo!) / 2).toBeCloseTo(t * 0.5 * 2, 12);
  });

  it('fills the given object, and counts a rounding-negative q as 0', () => {
    const out: FitIntervals & { fit: number } = { fit: 5, se: null, ciLo: null, ciHi: null, piLo: null, piHi: null };
    expect(tIntervals(5, -1e-18, 1, 2, out)).toBe(out);
    expect(out.se).toBe(0);
    expect([out.ciLo, out.ciHi]).toEqual([5, 5]);
    expect([out.piLo, out.piHi]).toEqual([3, 7]);
    expect(out.fit).toBe(5);
  });

  it('degenerate: unknown sigma gives nulls; a non-finite q or a negative sigma throws InputError', () => {
    expect(tIntervals(1, 0.5, null, null)).toEqual({ se: null, ciLo: null, ciHi: null, piLo: null, piHi: null });
    expect(() => tIntervals(1, Number.NaN, 1, 2)).toThrow(InputError);
    expect(() => tIntervals(1, 0.5, -1, 2)).toThrow(/0 or more, got -1 and 2/);
  });
});
