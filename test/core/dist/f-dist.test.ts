// Abramowitz & Stegun (A&S) and Numerical Recipes equation and section numbers are quoted from memory;
// printed table values are marked where they could not be checked against a printed copy.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { InputError } from '../../../src/core/errors.ts';
import { fCdf, fQuantile, fUpperP } from '../../../src/core/dist/f-dist.ts';
import { tQuantile, tTwoSidedP } from '../../../src/core/dist/student-t.ts';

const rel = (got: number, want: number): number => Math.abs(got - want) / Math.abs(want);
/** A tail p is computed as exp(-D) with D ~ |ln p|, so its last digits carry about |ln p| * 1.1e-16. */
const tailTol = (p: number): number => 1e-14 + 1.5e-16 * Math.abs(Math.log(p));

/**
 * Upper percentage points F_{p; d1, d2} (2 decimals) as printed in the usual F tables (e.g.
 * NIST/SEMATECH e-Handbook section 1.3.6.7.3). All but the last were checked against a reprinted
 * table of upper percentage points; F_{0.99; 2, 20} = 5.85 is from memory. [p, d1, d2, F].
 */
const PRINTED: [number, number, number, number][] = [
  [0.95, 1, 8, 5.32],
  [0.95, 3, 10, 3.71],
  [0.95, 1, 4, 7.71],
  [0.99, 1, 4, 21.2],
  [0.95, 1, 5, 6.61],
  [0.99, 1, 5, 16.26],
  [0.95, 2, 6, 5.14],
  [0.99, 2, 6, 10.92],
  [0.95, 3, 7, 4.35],
  [0.99, 3, 7, 8.45],
  [0.99, 1, 8, 11.26],
  [0.95, 4, 9, 3.63],
  [0.99, 4, 9, 6.42],
  [0.95, 2, 10, 4.1],
  [0.99, 2, 10, 7.56],
  [0.99, 3, 10, 6.55],
  [0.95, 1, 20, 4.35],
  [0.95, 2, 24, 3.4],
  [0.99, 2, 20, 5.85],
];

describe('fQuantile', () => {
  it('matches the printed F table (and jstat 1.9.6 agrees with both)', () => {
    for (const [p, d1, d2, f] of PRINTED) {
      expect(fQuantile(p, d1, d2)).toBeCloseTo(f, 2);
      expect(jStat.centralF.inv(p, d1, d2)).toBeCloseTo(f, 2);
    }
  });

  it('matches closed forms with a 2 in either df, for real and huge df (direct integration)', () => {
    // d1 = 2: P(F >= f) = (1 + 2f/d2)^(-d2/2), so f = (d2/2) expm1(-(2/d2) ln(1 - p)).
    // d2 = 2: P(F <= f) = (d1 f / (d1 f + 2))^(d1/2), so f = (2/d1) / expm1(-(2/d1) ln p).
    for (const d of [0.5, 1, 2, 2.333, 5, 17.5, 1e3, 1e7]) {
      for (const p of [1e-100, 1e-15, 1e-6, 0.01, 0.3, 0.5, 0.7, 0.95, 0.999]) {
        expect(rel(fQuantile(p, 2, d), (d / 2) * Math.expm1((-2 / d) * Math.log1p(-p)))).toBeLessThan(tailTol(p));
        const want = 2 / d / Math.expm1((-2 / d) * Math.log(p));
        if (want > 1e-300) expect(rel(fQuantile(p, d, 2), want)).toBeLessThan(tailTol(p));
      }
    }
  });

  it('F(1, df) is t(df) squared: fQuantile(1 - a, 1, df) = tQuantile(1 - a/2, df)^2', () => {
    for (const df of [0.5, 2.333, 5, 12, 1e4]) {
      // Powers of 2, so that 1 - a and 1 - a/2 are exact and both sides ask the same question.
      for (const a of [0.25, 2 ** -5, 2 ** -10, 2 ** -27]) {
        expect(rel(fQuantile(1 - a, 1, df), tQuantile(1 - a / 2, df) ** 2)).toBeLessThan(1e-13);
      }
    }
  });

  it('agrees with jstat 1.9.6 centralF.inv on a grid of real df (jstat is good to ~1e-7 for df >= 1)', () => {
    let worst = 0;
    const dfs = [1, 1.5, 2, 2.333, 3, 4, 5, 7.5, 10, 15, 20, 30, 60, 120];
    for (const d1 of dfs) {
      for (const d2 of dfs) {
        for (const p of [0.001, 0.01, 0.05, 0.1, 0.25, 0.5, 0.75, 0.9, 0.95, 0.99, 0.999]) {
          worst = Math.max(worst, rel(fQuantile(p, d1, d2), jStat.centralF.inv(p, d1, d2)));
        }
      }
    }
    expect(worst).toBeLessThan(1e-6);
  });

  it('property: fCdf(fQuantile(p)) = p (lower half) and fUpperP(fQuantile(p)) = 1 - p (upper half), df 0.5 to 1e7', () => {
    const lnDf = fc.double({ min: Math.log(0.5), max: Math.log(1e7), noNaN: true });
    fc.assert(
      fc.property(lnDf, lnDf, fc.double({ min: Math.log(1e-100), max: Math.log(0.5), noNaN: true }), fc.boolean(), (l1, l2, lnP, upper) => {
        const d1 = Math.exp(l1);
        const d2 = Math.exp(l2);
        const p = Math.exp(lnP);
        // With df < 1 a tiny tail can put the quantile outside the normal doubles (below 1e-300
        // or above 1e300, down to 0 or up to Infinity); there the round trip is not defined.
        const representable = (f: number) => f > 1e-300 && f < 1e300;
        // Tolerance: 2e-14 (1 + k) + 4e-16 |ln p|, k = |d ln P / d ln f| the condition number
        // (found by a difference quotient; ~1e3 when both df are ~1e7), |ln p| for the exp(-D) form.
        const ok = (tail: (f: number) => number, f: number, want: number) => {
          if (!representable(f)) return true;
          const k = Math.abs(Math.log(tail(f * (1 + 1e-7)) / tail(f))) / 1e-7;
          return rel(tail(f), want) < 2e-14 * (1 + k) + 4e-16 * Math.abs(lnP);
        };
        if (!upper) return ok((f) => fCdf(f, d1, d2), fQuantile(p, d1, d2), p);
        const q = 1 - p;
        if (q === 1) return true;
        return ok((f) => fUpperP(f, d1, d2), fQuantile(q, d1, d2), 1 - q);
      }),
    );
  });

  it('degenerate input: p outside (0, 1), df <= 0, NaN or Infinity throw InputError', () => {
    for (const p of [0, 1, -1, 2, NaN]) expect(() => fQuantile(p, 2, 3)).toThrow(InputError);
    for (const [d1, d2] of [[0, 3], [3, 0], [-1, 3], [NaN, 3], [3, NaN], [Infinity, 3], [3, Infinity]]) {
      expect(() => fQuantile(0.95, d1, d2)).toThrow(InputError);
    }
    expect(() => fQuantile(0.95, 2, -1)).toThrow(/denominator degrees of freedom/);
    expect(rel(fQuantile(0.5, 2, 2), 1)).toBeLessThan(1e-15);
  });
});

describe('fCdf and fUpperP', () => {
  it('printed table points give back their tail areas to the table precision', () => {
    for (const [p, d1, d2, f] of PRINTED) {
      expect(fUpperP(f, d1, d2)).toBeCloseTo(1 - p, 2);
      expect(fCdf(f, d1, d2)).toBeCloseTo(p, 2);
    }
  });

  it('matches closed forms down to 1e-200 for real and huge df, with no 1 - cdf cancellation', () => {
    // d1 = 2: P(F >= f) = (1 + 2f/d2)^(-d2/2); d1 = d2 = 2: P(F <= f) = f / (1 + f).
    for (const d of [0.5, 2.333, 10, 1e5, 1e7]) {
      for (const f of [1e-10, 0.01, 0.5, 1, 3, 30, 1e4, 1e10]) {
        const upper = Math.exp((-d / 2) * Math.log1p((2 * f) / d));
        if (upper > 1e-290) expect(rel(fUpperP(f, 2, d), upper)).toBeLessThan(tailTol(upper));
        expect(rel(fCdf(f, 2, d), -Math.expm1((-d / 2) * Math.log1p((2 * f) / d)))).toBeLessThan(1e-14);
      }
    }
    for (const f of [1e-300, 1e-20, 0.3, 1, 7, 1e20, 1e300]) {
      expect(rel(fCdf(f, 2, 2), f / (1 + f))).toBeLessThan(tailTol(f / (1 + f)));
      expect(rel(fUpperP(f, 2, 2), 1 / (1 + f))).toBeLessThan(tailTol(1 / (1 + f)));
    }
  });

  it('F(1, df) is t(df) squared: fUpperP(t^2, 1, df) = tTwoSidedP(t, df)', () => {
    for (const df of [0.5, 2.333, 7, 1e6]) {
      for (const t of [0.1, 1, 2.5, 8, 30]) {
        const want = tTwoSidedP(t, df);
        expect(rel(fUpperP(t * t, 1, df), want)).toBeLessThan(tailTol(want));
      }
    }
  });

  it('agrees with jstat 1.9.6 centralF.cdf on a grid of real df', () => {
    let worst = 0;
    const dfs = [0.5, 1, 1.5, 2.333, 3, 5, 7.5, 10, 20, 60, 120];
    for (const d1 of dfs) {
      for (const d2 of dfs) {
        for (const f of [0.01, 0.1, 0.5, 1, 2, 3, 5, 10, 50]) worst = Math.max(worst, rel(fCdf(f, d1, d2), jStat.centralF.cdf(f, d1, d2)));
      }
    }
    expect(worst).toBeLessThan(1e-6);
  });

  it('property: fCdf + fUpperP = 1, both in [0, 1], fCdf increasing in f', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.double({ min: 0.5, max: 1e5, noNaN: true }),
        fc.double({ min: 0.5, max: 1e5, noNaN: true }),
        (f, d1, d2) => {
          const lo = fCdf(f, d1, d2);
          const up = fUpperP(f, d1, d2);
          const sum = Math.abs(lo + up - 1) < 1e-14;
          const inc = fCdf(f * 1.001 + 1e-9, d1, d2) >= lo;
          return sum && inc && lo >= 0 && lo <= 1;
        },
      ),
    );
  });

  it('degenerate input: NaN f or bad df throw InputError; f <= 0 and f = Infinity are the ends', () => {
    for (const g of [fCdf, fUpperP]) {
      expect(() => g(NaN, 2, 3)).toThrow(InputError);
      for (const [d1, d2] of [[0, 3], [3, 0], [-2, 3], [NaN, 3], [3, Infinity]]) expect(() => g(1, d1, d2)).toThrow(InputError);
    }
    expect(fCdf(0, 3, 4)).toBe(0);
    expect(fCdf(-1, 3, 4)).toBe(0);
    expect(fUpperP(0, 3, 4)).toBe(1);
    expect(fCdf(Infinity, 3, 4)).toBe(1);
    expect(fUpperP(Infinity, 3, 4)).toBe(0);
  });
});
