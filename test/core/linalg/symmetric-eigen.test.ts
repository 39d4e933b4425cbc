import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { symmetricEigen } from '../../../src/core/linalg/symmetric-eigen.ts';
import { InputError } from '../../../src/core/errors.ts';

function matVec(a: readonly (readonly number[])[], v: readonly number[]): number[] {
  return a.map((row) => row.reduce((s, x, j) => s + x * v[j], 0));
}

describe('symmetricEigen (cyclic Jacobi, Golub and Van Loan 4th ed., section 8.5)', () => {
  it('a hand-worked 2x2: [[2,1],[1,2]] has eigenvalues 3 and 1 with vectors (1,1)/sqrt2 and (1,-1)/sqrt2', () => {
    // By hand: det([[2-l,1],[1,2-l]]) = (2-l)^2 - 1 = 0 -> l = 3, 1
    const e = symmetricEigen([[2, 1], [1, 2]]);
    expect(e.values[0]).toBeCloseTo(3, 14);
    expect(e.values[1]).toBeCloseTo(1, 14);
    expect(e.vectors[0][0]).toBeCloseTo(Math.SQRT1_2, 14);
    expect(e.vectors[0][1]).toBeCloseTo(Math.SQRT1_2, 14);
    // tie in magnitude: the first entry is the positive one
    expect(e.vectors[1][0]).toBeCloseTo(Math.SQRT1_2, 14);
    expect(e.vectors[1][1]).toBeCloseTo(-Math.SQRT1_2, 14);
  });

  it('a hand-worked 3x3: the second-difference matrix has eigenvalues 2 + sqrt2, 2, 2 - sqrt2', () => {
    // By hand (tridiagonal Toeplitz 2,-1): l_j = 2 - 2 cos(j pi / 4), vectors sin(i j pi / 4)
    const e = symmetricEigen([[2, -1, 0], [-1, 2, -1], [0, -1, 2]]);
    expect(e.values[0]).toBeCloseTo(2 + Math.SQRT2, 13);
    expect(e.values[1]).toBeCloseTo(2, 13);
    expect(e.values[2]).toBeCloseTo(2 - Math.SQRT2, 13);
    // (1, -sqrt2, 1)/2 signed so the largest entry (-sqrt2/2) is positive
    expect(e.vectors[0]).toEqual([expect.closeTo(-0.5, 13), expect.closeTo(Math.SQRT1_2, 13), expect.closeTo(-0.5, 13)]);
    expect(e.vectors[1]).toEqual([expect.closeTo(Math.SQRT1_2, 13), expect.closeTo(0, 13), expect.closeTo(-Math.SQRT1_2, 13)]);
    expect(e.vectors[2]).toEqual([expect.closeTo(0.5, 13), expect.closeTo(Math.SQRT1_2, 13), expect.closeTo(0.5, 13)]);
  });

  it('a diagonal matrix needs no rotation and keeps signed values, largest first', () => {
    const e = symmetricEigen([[-3, 0], [0, 1]]);
    expect(e.values).toEqual([1, -3]);
    expect(e.vectors).toEqual([[0, 1], [1, 0]]);
    expect(e.sweeps).toBe(0);
  });

  it('property: A v = lambda v, V orthonormal, trace preserved, values sorted, largest entry positive', () => {
    const entry = fc.double({ min: -10, max: 10, noNaN: true });
    const matrix = fc.integer({ min: 1, max: 8 }).chain((n) => fc.array(entry, { minLength: n * n, maxLength: n * n }).map((xs) => {
      const a = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => 0));
      for (let i = 0; i < n; i++) for (let j = i; j < n; j++) a[i][j] = a[j][i] = xs[i * n + j];
      return a;
    }));
    fc.assert(
      fc.property(matrix, (a) => {
        const n = a.length;
        const { values, vectors } = symmetricEigen(a);
        const scale = Math.max(1, ...a.flat().map(Math.abs));
        for (let i = 0; i < n; i++) {
          const av = matVec(a, vectors[i]);
          for (let k = 0; k < n; k++) expect(Math.abs(av[k] - values[i] * vectors[i][k])).toBeLessThan(1e-10 * scale * n);
          for (let j = 0; j < n; j++) {
            const dot = vectors[i].reduce((s, x, k) => s + x * vectors[j][k], 0);
            expect(Math.abs(dot - (i === j ? 1 : 0))).toBeLessThan(1e-12 * n);
          }
          const big = vectors[i].reduce((b, x) => Math.max(b, Math.abs(x)), 0);
          expect(vectors[i].find((x) => Math.abs(x) >= big * (1 - 1e-9))!).toBeGreaterThan(0);
          if (i > 0) expect(values[i]).toBeLessThanOrEqual(values[i - 1]);
        }
        const trace = a.reduce((s, row, i) => s + row[i], 0);
        expect(Math.abs(values.reduce((s, x) => s + x, 0) - trace)).toBeLessThan(1e-10 * scale * n);
      }),
      { numRuns: 300 },
    );
  });

  it('refuses an empty, ragged, non-finite or non-symmetric matrix', () => {
    expect(() => symmetricEigen([])).toThrow(InputError);
    expect(() => symmetricEigen([[1, 2], [2]])).toThrow(/row 2 has 1 entries, expected 2/);
    expect(() => symmetricEigen([[1, NaN], [NaN, 1]])).toThrow(/finite number, got NaN/);
    expect(() => symmetricEigen([[1, 2], [3, 1]])).toThrow(/symmetric: entry \(1, 2\) is 2 but \(2, 1\) is 3/);
  });
});
