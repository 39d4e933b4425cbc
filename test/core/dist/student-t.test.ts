// Abramowitz & Stegun (A&S) and Numerical Recipes equation and section numbers are quoted from memory;
// printed table values are marked where they could not be checked against a printed copy.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { InputError } from '../../../src/core/errors.ts';
import { normalCdf, normalQuantile } from '../../../src/core/dist/normal.ts';
import { tCdf, tQuantile, tTwoSidedP } from '../../../src/core/dist/student-t.ts';

const rel = (got: number, want: number): number => Math.abs(got - want) / Math.abs(want);
/** A tail p is computed as exp(-D) with D ~ |ln p|, so its last digits carry about |ln p| * 1.1e-16. */
const tailTol = (p: number): number => 1e-14 + 1.5e-16 * Math.abs(Math.log(p));

/** Upper critical values t_{p, df} from NIST/SEMATECH e-Handbook section 1.3.6.7.2 (3 decimals),
 * checked against a reprint of that table. [p, df, t]. Left out: its t_{0.999, 1} = 318.313, which
 * is off in the last digits; the exact value is tan(0.499 pi) = 318.3088 (another printed table
 * has 318.309), and the closed-form test below covers it. */
const PRINTED: [number, number, number][] = [
  [0.975, 10, 2.228],
  [0.975, 5, 2.571],
  [0.995, 20, 2.845],
  [0.9, 10, 1.372],
  [0.95, 1, 6.314],
  [0.995, 2, 9.925],
  [0.999, 3, 10.215],
  [0.95, 30, 1.697],
  [0.975, 60, 2.0],
  [0.999, 100, 3.174],
];

/**
 * Cornish-Fisher expansion of the t quantile in the normal point z (Abramowitz & Stegun 26.7.5,
 * coefficients from memory): t = z + g1/df + g2/df^2 + g3/df^3 + O(df^-4), with
 * g1 = (z^3 + z)/4, g2 = (5z^5 + 16z^3 + 3z)/96, g3 = (3z^7 + 19z^5 + 17z^3 - 15z)/384.
 * For df >= 1e5 and |z| <= 8 the omitted term is below 1e-15 relative.
 */
function cornishFisher(z: number, df: number): number {
  const z2 = z * z;
  const g1 = (z * (z2 + 1)) / 4;
  const g2 = (z * ((5 * z2 + 16) * z2 + 3)) / 96;
  const g3 = (z * (((3 * z2 + 19) * z2 + 17) * z2 - 15)) / 384;
  return z + (g1 + (g2 + g3 / df) / df) / df;
}

describe('tQuantile', () => {
  it('matches the printed t table (and jstat 1.9.6 agrees with both)', () => {
    for (const [p, df, t] of PRINTED) {
      expect(tQuantile(p, df)).toBeCloseTo(t, 3);
      expect(tQuantile(1 - p, df)).toBeCloseTo(-t, 3);
      expect(jStat.studentt.inv(p, df)).toBeCloseTo(t, 3);
    }
  });

  it('matches the closed forms for df = 1 and df = 2 to 1e-14 (A&S 26.7.3 special cases, from memory)', () => {
    // df = 1 (Cauchy): t = tan(pi (p - 1/2)); in the tails -1/tan(pi p) and 1/tan(pi (1 - p)),
    // so that the reference itself is not rounded near the pole.
    // df = 2: t = (2p - 1) / sqrt(2 p (1 - p)).
    for (const p of [1e-300, 1e-100, 1e-15, 1e-6, 0.001, 0.025, 0.1, 0.3, 0.45, 0.4999999, 0.6, 0.9, 0.975, 0.999]) {
      const cauchy = p < 0.25 ? -1 / Math.tan(Math.PI * p) : p > 0.75 ? 1 / Math.tan(Math.PI * (1 - p)) : Math.tan(Math.PI * (p - 0.5));
      expect(rel(tQuantile(p, 1), cauchy)).toBeLessThan(tailTol(p));
      if (p > 1e-150) expect(rel(tQuantile(p, 2), (2 * p - 1) / Math.sqrt(2 * p * (1 - p)))).toBeLessThan(tailTol(p));
    }
  });

  it('tends to the normal for huge df: matches the Cornish-Fisher expansion (A&S 26.7.5) to 1e-13', () => {
    for (const df of [1e5, 1e6, 1e7]) {
      for (const p of [1e-15, 1e-6, 0.001, 0.025, 0.3, 0.7, 0.975, 0.999]) {
        expect(rel(tQuantile(p, df), cornishFisher(normalQuantile(p), df))).toBeLessThan(1e-13);
      }
    }
  });

  it('agrees with jstat 1.9.6 studentt.inv on a grid of real df (jstat is good to ~1e-7)', () => {
    let worst = 0;
    for (const df of [0.5, 1, 1.5, 2, 2.333, 3, 4, 5, 7.5, 10, 15, 20, 30, 60, 120]) {
      for (const p of [0.0005, 0.001, 0.005, 0.01, 0.025, 0.05, 0.1, 0.2, 0.3, 0.4, 0.6, 0.7, 0.8, 0.9, 0.95, 0.975, 0.99, 0.995, 0.999]) {
        worst = Math.max(worst, rel(tQuantile(p, df), jStat.studentt.inv(p, df)));
      }
    }
    expect(worst).toBeLessThan(1e-6);
  });

  it('property: tCdf(tQuantile(p, df), df) = p, for df from 0.5 to 1e7 (log-uniform) and p down to 1e-200', () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.log(0.5), max: Math.log(1e7), noNaN: true }),
        fc.double({ min: Math.log(1e-200), max: Math.log(0.5), noNaN: true }),
        fc.boolean(),
        (lnDf, lnP, upper) => {
          const df = Math.exp(lnDf);
          const p = Math.exp(lnP);
          // With df < 1 the quantile of a tiny p, about p^(-1/df), can exceed the largest double:
          // then -Infinity is the right answer, and the round trip is not defined.
          const overflows = (target: number) => -Math.log(target) / df > 700;
          // Tolerance: 2e-14 (1 + k) + 4e-16 |ln p|, k = |d ln P / d ln t| the condition number
          // (found by a difference quotient), |ln p| for the exp(-D) form of a tiny tail.
          const ok = (tail: (t: number) => number, t: number, want: number) => {
            const k = Math.abs(Math.log(tail(t * (1 + 1e-7)) / tail(t))) / 1e-7;
            return rel(tail(t), want) < 2e-14 * (1 + k) + 4e-16 * Math.abs(lnP);
          };
          if (!upper) {
            const t = tQuantile(p, df);
            if (t === -Infinity) return overflows(p);
            return ok((u) => tCdf(u, df), t, p);
          }
          const q = 1 - p; // ask for the upper quantile; its tail 1 - q is exact
          if (q === 1) return true;
          const t = tQuantile(q, df);
          if (t === Infinity) return overflows(1 - q);
          return ok((u) => tCdf(-u, df), t, 1 - q);
        },
      ),
    );
  });

  it('property: odd in p - 1/2 and increasing in p', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 1 - 1e-12, noNaN: true }), fc.double({ min: 0.5, max: 200, noNaN: true }), (p, df) => {
        const odd = tQuantile(1 - p, df) + tQuantile(p, df) === 0;
        const up = p + 1e-6 < 1 ? tQuantile(p + 1e-6, df) > tQuantile(p, df) : true;
        return odd && up;
      }),
    );
  });

  it('degenerate input: p outside (0, 1), df <= 0, NaN or Infinity throw InputError; p = 1/2 gives 0', () => {
    for (const p of [0, 1, -0.2, 1.2, NaN]) expect(() => tQuantile(p, 5)).toThrow(InputError);
    for (const df of [0, -1, NaN, Infinity]) expect(() => tQuantile(0.975, df)).toThrow(InputError);
    expect(() => tQuantile(0.975, 0)).toThrow(/degrees of freedom/);
    expect(tQuantile(0.5, 3)).toBe(0);
    // The true quantile (about -1e600) is beyond the largest double.
    expect(tQuantile(1e-300, 0.5)).toBe(-Infinity);
  });
});

describe('tCdf and tTwoSidedP', () => {
  it('printed table points give back their tail areas to the table precision', () => {
    for (const [p, df, t] of PRINTED) {
      // 3-decimal t values: the tail moves by density * 5e-4 at most.
      expect(tCdf(t, df)).toBeCloseTo(p, 3);
      expect(tTwoSidedP(t, df)).toBeCloseTo(2 * (1 - p), 3);
    }
  });

  it('matches closed forms for df = 1 and df = 2 down to p = 1e-200 (A&S 26.7.3 special cases, from memory)', () => {
    // df = 1: P(|T| >= t) = (2/pi) atan(1/t); df = 2: P(|T| >= t) = 2 / (sqrt(2+t^2) (sqrt(2+t^2) + t)).
    for (const t of [1e-8, 0.01, 0.5, 1, 2, 5, 30, 1e4, 1e8, 1e15, 1e100, 1e200, 1e300]) {
      const cauchy = (2 / Math.PI) * Math.atan(1 / t);
      expect(rel(tTwoSidedP(t, 1), cauchy)).toBeLessThan(tailTol(cauchy));
      expect(rel(tCdf(-t, 1), cauchy / 2)).toBeLessThan(tailTol(cauchy));
      if (t < 1e150) {
        const s = Math.sqrt(2 + t * t);
        expect(rel(tTwoSidedP(t, 2), 2 / (s * (s + t)))).toBeLessThan(tailTol(2 / (s * (s + t))));
      }
    }
  });

  it('is accurate in tiny tails for huge df (1e-15 and below), checked through the Cornish-Fisher points', () => {
    // At t from A&S 26.7.5 for the normal point z, P(T <= t) = Phi(z) up to O(df^-3).
    for (const df of [1e5, 1e7]) {
      for (const z of [-8, -5, -2, 1, 3]) {
        const t = cornishFisher(z, df);
        expect(rel(tCdf(t, df), normalCdf(z))).toBeLessThan(1e-12);
        if (z < 0) expect(rel(tTwoSidedP(t, df), 2 * normalCdf(z))).toBeLessThan(1e-12);
      }
    }
  });

  it('agrees with jstat 1.9.6 studentt.cdf on a grid of real df', () => {
    let worst = 0;
    for (const df of [0.5, 1, 1.5, 2.333, 3, 5, 7.5, 10, 20, 60, 120]) {
      for (const t of [-20, -5, -3, -2, -1, -0.5, -0.1, 0.1, 0.5, 1, 2, 3, 5, 20]) {
        worst = Math.max(worst, rel(tCdf(t, df), jStat.studentt.cdf(t, df)));
      }
    }
    expect(worst).toBeLessThan(1e-6);
  });

  it('property: tTwoSidedP(t) = 2 tCdf(-|t|), tCdf(-t) = 1 - tCdf(t), increasing in t', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: 0.5, max: 1e6, noNaN: true }), (t, df) => {
        // Equal to the last bit, except where the half tail falls into the subnormal range.
        const two = Math.abs(tTwoSidedP(t, df) - 2 * tCdf(-Math.abs(t), df)) <= 1e-16 * tTwoSidedP(t, df) + 1e-320;
        const sym = Math.abs(tCdf(-t, df) + tCdf(t, df) - 1) < 4e-16;
        const inc = tCdf(t + 1e-3, df) >= tCdf(t, df);
        return two && sym && inc;
      }),
    );
  });

  it('degenerate input: NaN t, df <= 0, NaN or Infinity throw InputError; t = 0 and t = +-Infinity', () => {
    for (const f of [tCdf, tTwoSidedP]) {
      expect(() => f(NaN, 5)).toThrow(InputError);
      for (const df of [0, -3, NaN, Infinity]) expect(() => f(1, df)).toThrow(InputError);
    }
    expect(tCdf(0, 2.333)).toBe(0.5);
    expect(tTwoSidedP(0, 2.333)).toBe(1);
    expect(tCdf(-Infinity, 4)).toBe(0);
    expect(tCdf(Infinity, 4)).toBe(1);
    expect(tTwoSidedP(-Infinity, 4)).toBe(0);
  });
});

describe('tQuantile asked twice in a row for one p and df (the analysis refitted) gives the same value', () => {
  it('t(0.975; 10) on each call, against jstat, and a different p or df in between is not confused with it', () => {
    const a = tQuantile(0.975, 10);
    expect(a).toBeCloseTo(jStat.studentt.inv(0.975, 10), 6); // jstat is good to ~1e-7; 2.228 in printed t tables (from memory)
    expect(tQuantile(0.975, 10)).toBe(a);
    expect(tQuantile(0.95, 10)).toBeCloseTo(jStat.studentt.inv(0.95, 10), 6);
    expect(tQuantile(0.975, 12)).toBeCloseTo(jStat.studentt.inv(0.975, 12), 6);
    expect(tQuantile(0.975, 10)).toBe(a);
  });
});
