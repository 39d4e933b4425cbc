// Abramowitz & Stegun (A&S) and Numerical Recipes equation and section numbers are quoted from memory;
// printed table values are marked where they could not be checked against a printed copy.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { InputError } from '../../../src/core/errors.ts';
import {
  incompleteBeta,
  incompleteBetaFactor,
  incompleteBetaInverseOdds,
  incompleteBetaXY,
} from '../../../src/core/dist/incomplete-beta.ts';

const rel = (got: number, want: number): number => Math.abs(got - want) / Math.abs(want);

/** BigInt rational num/den to the nearest double (64 quotient bits, then exact scaling). */
function ratioToNumber(num: bigint, den: bigint): number {
  if (num === 0n) return 0;
  const k = den.toString(2).length - num.toString(2).length + 64;
  const q = k >= 0 ? (num << BigInt(k)) / den : num / (den << BigInt(-k));
  const half = Math.trunc(k / 2);
  return Number(q) * 2 ** -half * 2 ** -(k - half);
}

/**
 * Exact I_x(a, b) for whole a, b and x = p / 2^m, by the binomial sum
 *   I_x(a, b) = sum_{j=a}^{a+b-1} C(a+b-1, j) x^j (1-x)^(a+b-1-j)
 * (Abramowitz & Stegun 26.5.24, relation to the binomial distribution; number from memory),
 * done in rational arithmetic. upper = true gives 1 - I_x(a, b) by the complementary sum.
 */
function exactBinomialSum(p: bigint, m: number, a: number, b: number, upper: boolean): number {
  const n = a + b - 1;
  const q = 1n << BigInt(m);
  let c = 1n;
  let num = 0n;
  for (let j = 0; j <= n; j++) {
    if (j > 0) c = (c * BigInt(n - j + 1)) / BigInt(j);
    if (j >= a !== upper) num += c * p ** BigInt(j) * (q - p) ** BigInt(n - j);
  }
  return ratioToNumber(num, q ** BigInt(n));
}

describe('incompleteBeta: exact references', () => {
  it('matches exact rational binomial sums for whole shapes, both tails (2e-14 relative; 3e-13 below 1e-20)', () => {
    const shapes: [number, number][] = [[1, 1], [2, 3], [5, 5], [1, 30], [30, 1], [10, 200], [200, 10], [50, 50], [300, 400], [1000, 3], [3, 1000]];
    // x = p / 2^m is exact in floating point, so only the function is being measured.
    const points: [bigint, number][] = [[1n, 10], [1n, 7], [13n, 7], [1n, 2], [77n, 7], [1n, 1], [3n, 2], [1023n, 10], [255n, 8]];
    // Below 1e-20 the result is exp(-D) with D in the hundreds, and D itself carries ~1e-16 * D.
    let worst = 0;
    let worstTiny = 0;
    const record = (got: number, want: number) => {
      if (want > 1e-20) worst = Math.max(worst, rel(got, want));
      else if (want > 1e-290) worstTiny = Math.max(worstTiny, rel(got, want));
    };
    for (const [a, b] of shapes) {
      for (const [p, m] of points) {
        const x = Number(p) / 2 ** m;
        if (x >= 1) continue;
        record(incompleteBeta(x, a, b), exactBinomialSum(p, m, a, b, false));
        record(incompleteBetaXY(1 - x, x, b, a), exactBinomialSum(p, m, a, b, true));
      }
    }
    expect(worst).toBeLessThan(2e-14);
    expect(worstTiny).toBeLessThan(3e-13);
  });

  it('matches closed forms for real shapes: I_x(a,1) = x^a, I_x(1,b) = 1-(1-x)^b, I_x(1/2,1/2) = (2/pi) asin(sqrt x)', () => {
    // Direct integration of s^(a-1) and (1-s)^(b-1); the arcsine law (A&S 26.5.1 with a = b = 1/2).
    for (const x of [1e-12, 1e-5, 0.01, 0.1, 0.3, 0.5, 0.7, 0.9, 0.999]) {
      for (const s of [0.25, 0.5, 1.1665, 2.333, 5, 17.5, 1e3, 1e6]) {
        const xa = Math.exp(s * Math.log(x));
        const ya = Math.exp(s * Math.log1p(-x));
        if (xa > 1e-290) expect(rel(incompleteBeta(x, s, 1), xa)).toBeLessThan(2e-13);
        expect(rel(incompleteBeta(x, 1, s), -Math.expm1(s * Math.log1p(-x)))).toBeLessThan(1e-14);
        // Upper tail of Beta(1, s) is (1-x)^s, and it is I_{1-x}(s, 1) by symmetry.
        if (ya > 1e-290) expect(rel(incompleteBetaXY(1 - x, x, s, 1), ya)).toBeLessThan(2e-13);
      }
      expect(rel(incompleteBeta(x, 0.5, 0.5), (2 / Math.PI) * Math.asin(Math.sqrt(x)))).toBeLessThan(1e-14);
    }
  });

  it('I_{1/2}(a, a) = 1/2 by symmetry, also for a = 5e6 (a t or F statistic with 1e7 df)', () => {
    for (const a of [0.25, 1.1665, 2.5, 10, 1e3, 1e5, 5e6]) {
      expect(Math.abs(incompleteBeta(0.5, a, a) - 0.5)).toBeLessThan(1e-12);
    }
  });

  it('agrees with jstat 1.9.6 ibeta on a grid of real shapes (jstat stops its fraction at 3e-7)', () => {
    let worst = 0;
    for (const a of [0.5, 1, 1.1665, 2.333, 2.5, 5, 10, 30]) {
      for (const b of [0.5, 1, 1.1665, 2.333, 2.5, 5, 10, 30]) {
        for (const x of [0.01, 0.05, 0.1, 0.3, 0.5, 0.7, 0.9, 0.95, 0.99]) {
          const want = jStat.ibeta(x, a, b);
          if (want > 1e-10) worst = Math.max(worst, rel(incompleteBeta(x, a, b), want));
        }
      }
    }
    expect(worst).toBeLessThan(1e-6);
  });
});

describe('incompleteBeta: properties', () => {
  const shape = fc.double({ min: 0.25, max: 1e4, noNaN: true });
  const unit = fc.double({ min: 1e-9, max: 1 - 1e-9, noNaN: true });

  it('I_x(a, b) + I_{1-x}(b, a) = 1 and 0 <= I <= 1', () => {
    fc.assert(
      fc.property(unit, shape, shape, (x, a, b) => {
        const lower = incompleteBetaXY(x, 1 - x, a, b);
        const upper = incompleteBetaXY(1 - x, x, b, a);
        return lower >= 0 && lower <= 1 && Math.abs(lower + upper - 1) < 1e-13;
      }),
    );
  });

  it('is non-decreasing in x', () => {
    fc.assert(
      fc.property(unit, unit, shape, shape, (u, v, a, b) => {
        const [lo, hi] = u < v ? [u, v] : [v, u];
        return incompleteBeta(lo, a, b) <= incompleteBeta(hi, a, b) * (1 + 1e-14);
      }),
    );
  });
});

describe('incompleteBetaFactor', () => {
  it('equals x^a y^b / B(a, b): B(2,3) = 1/12 gives 0.375 at x = 1/2', () => {
    expect(rel(incompleteBetaFactor(0.5, 0.5, 2, 3), 0.375)).toBeLessThan(1e-15);
    // B(1/2, 1/2) = pi: factor = sqrt(x y) / pi.
    expect(rel(incompleteBetaFactor(0.2, 0.8, 0.5, 0.5), Math.sqrt(0.16) / Math.PI)).toBeLessThan(1e-15);
  });

  it('is the derivative of I along ln(x / y) (checked by a central difference)', () => {
    for (const [a, b, x] of [[2.333, 5, 0.3], [0.5, 40, 0.01], [1e4, 2e4, 0.334]]) {
      const h = 1e-6;
      const at = (u: number) => {
        const rho = Math.exp(u);
        return incompleteBetaXY(rho / (1 + rho), 1 / (1 + rho), a, b);
      };
      const u0 = Math.log(x / (1 - x));
      const slope = (at(u0 + h) - at(u0 - h)) / (2 * h);
      expect(rel(incompleteBetaFactor(x, 1 - x, a, b), slope)).toBeLessThan(1e-7);
    }
  });

  it('degenerate input: 0 at the ends; bad x, y or shapes throw InputError', () => {
    expect(incompleteBetaFactor(0, 1, 2, 3)).toBe(0);
    expect(incompleteBetaFactor(1, 0, 2, 3)).toBe(0);
    expect(() => incompleteBetaFactor(0.3, 0.3, 2, 3)).toThrow(/x \+ y = 1/);
    expect(() => incompleteBetaFactor(0.5, 0.5, 0, 3)).toThrow(InputError);
    expect(() => incompleteBetaFactor(NaN, 0.5, 1, 3)).toThrow(InputError);
  });
});

describe('incompleteBeta / incompleteBetaXY: degenerate input', () => {
  it('returns 0 at x = 0 and 1 at x = 1', () => {
    expect(incompleteBeta(0, 2.5, 3)).toBe(0);
    expect(incompleteBeta(1, 2.5, 3)).toBe(1);
    expect(incompleteBetaXY(0, 1, 0.5, 7)).toBe(0);
    expect(incompleteBetaXY(1, 0, 0.5, 7)).toBe(1);
  });

  it('throws InputError for x outside [0, 1], NaN, shapes <= 0 or not finite, and x + y != 1', () => {
    for (const x of [-0.1, 1.1, NaN]) expect(() => incompleteBeta(x, 1, 1)).toThrow(InputError);
    for (const [a, b] of [[0, 1], [1, 0], [-2, 1], [NaN, 1], [1, Infinity]]) {
      expect(() => incompleteBeta(0.5, a, b)).toThrow(InputError);
      expect(() => incompleteBetaXY(0.5, 0.5, a, b)).toThrow(InputError);
    }
    expect(() => incompleteBetaXY(0.5, 0.6, 1, 1)).toThrow(/x \+ y = 1/);
    expect(() => incompleteBeta(0.5, 0, 1)).toThrow(/shape a > 0/);
  });
});

describe('incompleteBetaInverseOdds', () => {
  const odds = (rho: number): [number, number] => (rho <= 1 ? [rho / (1 + rho), 1 / (1 + rho)] : [1 / (1 + 1 / rho), 1 / rho / (1 + 1 / rho)]);

  it('inverts the closed forms: Beta(1,1) odds = p/(1-p); Beta(a,1) lower tail x = p^(1/a)', () => {
    for (const p of [1e-200, 1e-12, 0.01, 0.3, 0.5, 0.8]) {
      // A tail p is computed as exp(-D) with D ~ |ln p|, so it carries about |ln p| * 1.1e-16.
      const tol = 1e-15 * (4 + Math.abs(Math.log(p)) / 2);
      expect(rel(incompleteBetaInverseOdds(p, 1, 1, false), p / (1 - p))).toBeLessThan(tol);
      expect(rel(incompleteBetaInverseOdds(p, 1, 1, true), (1 - p) / p)).toBeLessThan(tol);
      const x = Math.exp(Math.log(p) / 2.333);
      expect(rel(incompleteBetaInverseOdds(p, 2.333, 1, false), x / -Math.expm1(Math.log(p) / 2.333))).toBeLessThan(tol);
    }
    // Far tail closed form (odds below e^-600): Beta(1, 1) at 1e-300 gives x = 1e-300
    // (through exp(ln 1e-300), so to about 690 * 1.1e-16).
    expect(rel(incompleteBetaInverseOdds(1e-300, 1, 1, false), 1e-300)).toBeLessThan(1e-13);
    expect(rel(incompleteBetaInverseOdds(1e-300, 1, 1, true), 1e300)).toBeLessThan(1e-13);
  });

  it('property: the incomplete beta at the returned odds gives the target back (1e-12 relative)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }),
        fc.double({ min: 0.25, max: 2e3, noNaN: true }),
        fc.double({ min: 0.25, max: 2e3, noNaN: true }),
        fc.boolean(),
        (target, a, b, upper) => {
          const [x, y] = odds(incompleteBetaInverseOdds(target, a, b, upper));
          const back = upper ? incompleteBetaXY(y, x, b, a) : incompleteBetaXY(x, y, a, b);
          return rel(back, target) < 1e-12;
        },
      ),
    );
  });

  it('a starting guess changes nothing but the work', () => {
    const plain = incompleteBetaInverseOdds(0.05, 3, 7, true);
    expect(rel(incompleteBetaInverseOdds(0.05, 3, 7, true, 10), plain)).toBeLessThan(1e-14);
    expect(rel(incompleteBetaInverseOdds(0.05, 3, 7, true, 1e-6), plain)).toBeLessThan(1e-14);
  });

  it('degenerate input: target outside (0, 1), bad shapes or a bad guess throw InputError', () => {
    for (const t of [0, 1, -0.5, 1.5, NaN]) expect(() => incompleteBetaInverseOdds(t, 1, 1, false)).toThrow(InputError);
    expect(() => incompleteBetaInverseOdds(0.5, 0, 1, false)).toThrow(InputError);
    expect(() => incompleteBetaInverseOdds(0.5, 1, NaN, true)).toThrow(InputError);
    for (const g of [0, -1, NaN, Infinity]) expect(() => incompleteBetaInverseOdds(0.5, 1, 1, false, g)).toThrow(/starting guess/);
  });
});
