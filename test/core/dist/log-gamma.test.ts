// Abramowitz & Stegun (A&S) and Numerical Recipes equation and section numbers are quoted from memory;
// printed table values are marked where they could not be checked against a printed copy.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { InputError } from '../../../src/core/errors.ts';
import { lnBeta, lnGamma, stirlingError } from '../../../src/core/dist/log-gamma.ts';

/** Relative error, with an absolute floor of 1 (log-gamma values cross zero at 1 and 2). */
const err = (got: number, want: number): number => Math.abs(got - want) / Math.max(1, Math.abs(want));

describe('lnGamma (Lanczos, Numerical Recipes 3rd ed. section 6.1 coefficients)', () => {
  it('matches ln((n-1)!) for n = 1..30 to 1e-15', () => {
    // Exact: Gamma(n) = (n-1)!, built up by multiplication (exact in doubles up to 22!).
    let factorial = 1;
    for (let n = 1; n <= 30; n++) {
      expect(err(lnGamma(n), Math.log(factorial))).toBeLessThan(1e-15);
      factorial *= n;
    }
  });

  it('matches Gamma(1/2) = sqrt(pi) and Gamma(3/2) = sqrt(pi)/2 (Abramowitz & Stegun 6.1.8, 6.1.9)', () => {
    expect(err(lnGamma(0.5), 0.5 * Math.log(Math.PI))).toBeLessThan(1e-15);
    expect(err(lnGamma(1.5), Math.log(Math.sqrt(Math.PI) / 2))).toBeLessThan(1e-15);
    // A&S Table 6.1 (from memory): Gamma(1.25) = 0.9064024771, Gamma(1.75) = 0.9190625268.
    expect(Math.exp(lnGamma(1.25))).toBeCloseTo(0.9064024771, 9);
    expect(Math.exp(lnGamma(1.75))).toBeCloseTo(0.9190625268, 9);
  });

  it('agrees with jstat 1.9.6 gammaln on a grid (jstat uses a 6-term series, ~1e-10)', () => {
    for (const x of [0.01, 0.1, 0.25, 0.5, 1.1665, 2.333, 5, 10, 33.3, 100, 1e3, 1e5]) {
      expect(err(lnGamma(x), jStat.gammaln(x))).toBeLessThan(1e-9);
    }
  });

  it('property: ln Gamma(x + 1) = ln Gamma(x) + ln x (A&S 6.1.15)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e6, noNaN: true }), (x) => {
        const lhs = lnGamma(x + 1);
        const rhs = lnGamma(x) + Math.log(x);
        return Math.abs(lhs - rhs) <= 1e-13 * Math.max(1, Math.abs(lhs));
      }),
    );
  });

  it('degenerate input: x <= 0, NaN or Infinity throws InputError; tiny x gives -ln x', () => {
    for (const bad of [0, -1, -0.5, NaN, Infinity, -Infinity]) expect(() => lnGamma(bad)).toThrow(InputError);
    expect(() => lnGamma(0)).toThrow(/greater than 0/);
    expect(err(lnGamma(1e-300), -Math.log(1e-300))).toBeLessThan(1e-15); // Gamma(x) ~ 1/x as x -> 0
  });
});

describe('stirlingError', () => {
  it('is ln Gamma(z) - (z - 1/2) ln z + z - ln sqrt(2 pi): exact values at z = 1 and z = 1/2', () => {
    // delta(1) = 1 - ln sqrt(2 pi); delta(1/2) = ln sqrt(pi) + 1/2 - ln sqrt(2 pi) = 1/2 - ln(2)/2.
    expect(Math.abs(stirlingError(1) - (1 - 0.5 * Math.log(2 * Math.PI)))).toBeLessThan(1e-15);
    expect(Math.abs(stirlingError(0.5) - (0.5 - 0.5 * Math.LN2))).toBeLessThan(1e-15);
  });

  it('the series branch (z >= 10) joins the lnGamma branch and tends to 1/(12 z) (A&S 6.1.41)', () => {
    // Across the switch at z = 10 the two branches differ only by the slope of the series,
    // d delta / dz = -1/(12 z^2) + 1/(120 z^4) - ... (differentiating A&S 6.1.41).
    const h = 1e-6;
    const slope = -1 / 1200 + 1 / 1.2e6;
    expect(Math.abs(stirlingError(10 - h) - stirlingError(10) + slope * h)).toBeLessThan(1e-14);
    expect(stirlingError(1e8) * 12e8).toBeCloseTo(1, 14);
    // ln(100!) from the series: 363.73937555556347 (A&S 6.1 tables of log10 n!, from memory).
    const lnFact100 = 100.5 * Math.log(101) - 101 + 0.5 * Math.log(2 * Math.PI) + stirlingError(101);
    expect(lnFact100).toBeCloseTo(363.73937555556347, 10);
  });

  it('degenerate input: z <= 0, NaN or Infinity throws InputError', () => {
    for (const bad of [0, -3, NaN, Infinity]) expect(() => stirlingError(bad)).toThrow(InputError);
  });
});

describe('lnBeta', () => {
  it('matches exact values: B(2,3) = 1/12, B(1/2,1/2) = pi, B(1,b) = 1/b', () => {
    expect(Math.abs(lnBeta(2, 3) - Math.log(1 / 12))).toBeLessThan(1e-15);
    expect(Math.abs(lnBeta(0.5, 0.5) - Math.log(Math.PI))).toBeLessThan(1e-15);
    for (const b of [0.3, 7, 12.5, 1e3, 1e7]) expect(Math.abs(lnBeta(1, b) + Math.log(b))).toBeLessThan(1e-14 * Math.max(1, Math.log(b)));
  });

  it('keeps absolute accuracy for a small, b = 1e7 (no cancellation of ln Gamma(1e7))', () => {
    // B(1/2, b) = sqrt(pi) Gamma(b) / Gamma(b + 1/2) and Gamma(b + 1/2)/Gamma(b) = sqrt(b) (1 - 1/(8b) + 1/(128b^2) + ...)
    // (A&S 6.1.47 with a = 1/2, b = 0, from memory).
    const b = 1e7;
    const want = 0.5 * Math.log(Math.PI) - 0.5 * Math.log(b) - Math.log1p(-1 / (8 * b) + 1 / (128 * b * b));
    expect(Math.abs(lnBeta(0.5, b) - want)).toBeLessThan(1e-14);
  });

  it('agrees with jstat 1.9.6 betaln and is symmetric', () => {
    for (const a of [0.25, 1.1665, 2.333, 5, 12, 40]) {
      for (const b of [0.5, 3, 10, 25.5, 80]) {
        expect(err(lnBeta(a, b), jStat.betaln(a, b))).toBeLessThan(1e-9);
        expect(lnBeta(a, b)).toBe(lnBeta(b, a));
      }
    }
  });

  it('degenerate input: a or b <= 0, NaN or Infinity throws InputError', () => {
    for (const [a, b] of [[0, 1], [1, 0], [-1, 2], [NaN, 1], [1, NaN], [Infinity, 1], [1, Infinity]]) {
      expect(() => lnBeta(a, b)).toThrow(InputError);
    }
  });
});
