// Abramowitz & Stegun (A&S) and Numerical Recipes equation and section numbers are quoted from memory;
// printed table values are marked where they could not be checked against a printed copy.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { InputError } from '../../../src/core/errors.ts';
import { normalCdf, normalQuantile } from '../../../src/core/dist/normal.ts';

const rel = (got: number, want: number): number => Math.abs(got - want) / Math.abs(want);

describe('normalCdf', () => {
  it('matches the printed areas from 0 to z', () => {
    // NIST/SEMATECH e-Handbook section 1.3.6.7.1 (area from 0 to z), 4 decimals; 0.5, 1.0, 1.5,
    // 1.9 and 1.96 checked against a printed normal-curve-areas table, 2.0 and 3.0 from memory.
    const table: [number, number][] = [[0.5, 0.1915], [1.0, 0.3413], [1.5, 0.4332], [1.9, 0.4713], [1.96, 0.475], [2.0, 0.4772], [3.0, 0.4987]];
    for (const [z, area] of table) {
      expect(normalCdf(z) - 0.5).toBeCloseTo(area, 4);
      expect(0.5 - normalCdf(-z)).toBeCloseTo(area, 4);
    }
  });

  it('matches the Mills-ratio series in the far tail to 1e-14 (A&S 26.2.12)', () => {
    // Phi(-z) = phi(z)/z * (1 - 1/z^2 + 3/z^4 - 15/z^6 + ...), asymptotic; at z >= 20 the terms
    // kept leave an error below 1e-15.
    for (const z of [20, 25, 30, 37]) {
      const w = 1 / (z * z);
      let term = 1;
      let sum = 1;
      for (let k = 1; k <= 10; k++) {
        term *= -(2 * k - 1) * w;
        sum += term;
      }
      const want = (Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI) / z) * sum;
      // exp(-z^2/2) itself is rounded once at z^2/2 ~ 700, which costs up to ~700 * 1.1e-16.
      expect(rel(normalCdf(-z), want)).toBeLessThan(2e-13);
    }
  });

  it('agrees with jstat 1.9.6 normal.cdf for |z| <= 5 (jstat forms the tail as 1 - erf, ~1e-8)', () => {
    for (let z = -5; z <= 5; z += 0.25) expect(rel(normalCdf(z), jStat.normal.cdf(z, 0, 1))).toBeLessThan(1e-7);
  });

  it('property: symmetry Phi(-z) = 1 - Phi(z) and monotone', () => {
    fc.assert(
      fc.property(fc.double({ min: -8, max: 8, noNaN: true }), fc.double({ min: -8, max: 8, noNaN: true }), (z, w) => {
        const sym = Math.abs(normalCdf(-z) + normalCdf(z) - 1) < 2e-16 * 4;
        const mono = z <= w ? normalCdf(z) <= normalCdf(w) : normalCdf(z) >= normalCdf(w);
        return sym && mono;
      }),
    );
  });

  it('degenerate input: NaN throws InputError; 0, -Infinity, +Infinity and far tails', () => {
    expect(() => normalCdf(NaN)).toThrow(InputError);
    expect(normalCdf(0)).toBe(0.5);
    expect(normalCdf(-Infinity)).toBe(0);
    expect(normalCdf(Infinity)).toBe(1);
    expect(normalCdf(-50)).toBe(0); // below the smallest double
    expect(normalCdf(1e-300)).toBe(0.5);
  });
});

describe('normalQuantile (Wichura 1988, AS 241)', () => {
  it('matches the printed normal points', () => {
    // The infinite-df row of NIST/SEMATECH e-Handbook section 1.3.6.7.2 (checked in a reprint).
    const table: [number, number][] = [[0.9, 1.282], [0.95, 1.645], [0.975, 1.96], [0.99, 2.326], [0.995, 2.576], [0.999, 3.09]];
    for (const [p, z] of table) {
      expect(normalQuantile(p)).toBeCloseTo(z, 3);
      expect(normalQuantile(1 - p)).toBeCloseTo(-z, 3);
    }
    // 1.959963984540054 (common 16-digit value, from memory).
    expect(rel(normalQuantile(0.975), 1.959963984540054)).toBeLessThan(2e-16 * 4);
  });

  it('agrees with jstat 1.9.6 normal.inv on a grid (jstat: two Newton steps on its erfc, ~1e-9 in the tails)', () => {
    for (const p of [1e-10, 1e-6, 0.001, 0.01, 0.05, 0.2, 0.4, 0.6, 0.8, 0.95, 0.999]) {
      expect(rel(normalQuantile(p), jStat.normal.inv(p, 0, 1))).toBeLessThan(1e-8);
    }
  });

  it('property: normalCdf(normalQuantile(p)) = p to ~1e-15 (z^2 + 4) relative, down to p = 1e-300', () => {
    fc.assert(
      fc.property(fc.double({ min: -690, max: Math.log(0.5), noNaN: true }), fc.boolean(), (lnP, upper) => {
        const p = Math.exp(lnP);
        if (!upper) {
          const z = normalQuantile(p);
          return rel(normalCdf(z), p) < 1e-15 * (z * z + 4);
        }
        // Upper half: ask for q = 1 - p (rounded), then the upper tail 1 - q is exact.
        const q = 1 - p;
        if (q === 1) return true;
        const z = normalQuantile(q);
        return rel(normalCdf(-z), 1 - q) < 1e-15 * (z * z + 4);
      }),
    );
  });

  it('is odd: z(1 - p) = -z(p) where 1 - p is exact', () => {
    for (const p of [0.5, 0.6, 0.75, 0.9, 0.975, 0.999999]) expect(normalQuantile(1 - p) + normalQuantile(p)).toBe(0);
  });

  it('degenerate input: p outside (0, 1) or NaN throws InputError; p = 1/2 gives 0', () => {
    for (const p of [0, 1, -0.1, 1.1, NaN, Infinity]) expect(() => normalQuantile(p)).toThrow(InputError);
    expect(() => normalQuantile(1)).toThrow(/strictly between 0 and 1/);
    expect(normalQuantile(0.5)).toBe(0);
    expect(Number.isFinite(normalQuantile(Number.MIN_VALUE))).toBe(true);
  });
});
