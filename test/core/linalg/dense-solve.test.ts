import fc from 'fast-check';
import MLR from 'ml-regression-multivariate-linear';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { solveDense } from '../../../src/core/linalg/dense-solve.ts';

/** A x, to check a solution directly. */
const times = (a: number[][], x: number[]) => a.map((row) => row.reduce((s, v, j) => s + v * x[j], 0));

describe('solveDense: Gaussian elimination with partial pivoting (Golub and Van Loan, 4th ed., Algorithm 3.4.1)', () => {
  it("the module's examples", () => {
    expect(solveDense([[2, 0], [0, 4]], [2, 2])).toEqual([1, 0.5]);
    expect(solveDense([[1, 1], [1, 1]], [1, 2])).toBeNull();
  });

  it('a hand-worked 3 x 3 system', () => {
    // 2x + y - z = 8, -3x - y + 2z = -11, -2x + y + 2z = -3: the textbook elimination example
    // (e.g. the "Gaussian elimination" article's worked system); worked by hand here:
    // x = 2, y = 3, z = -1 (check: 4 + 3 + 1 = 8; -6 - 3 - 2 = -11; -4 + 3 - 2 = -3).
    const a = [[2, 1, -1], [-3, -1, 2], [-2, 1, 2]];
    const b = [8, -11, -3];
    const x = solveDense(a, b)!;
    expect(x[0]).toBeCloseTo(2, 12);
    expect(x[1]).toBeCloseTo(3, 12);
    expect(x[2]).toBeCloseTo(-1, 12);
    times(a, x).forEach((v, i) => expect(v).toBeCloseTo(b[i], 12));
  });

  it('needs the row swap: a zero in the first pivot position', () => {
    // [[0, 1], [1, 0]] x = (3, 5) -> x = (5, 3), by hand; without pivoting the first step divides by 0.
    expect(solveDense([[0, 1], [1, 0]], [3, 5])).toEqual([5, 3]);
  });

  it('leaves A and c as they were', () => {
    const a = [[4, 1], [2, 3]];
    const c = [1, 2];
    solveDense(a, c);
    expect(a).toEqual([[4, 1], [2, 3]]);
    expect(c).toEqual([1, 2]);
  });

  it('agrees with a general-purpose regression library on random well-conditioned systems', () => {
    // Reference: ml-regression-multivariate-linear 2.0.4 without intercept; with as many rows as
    // columns and A invertible its least-squares weights are the exact solution of A x = c.
    const system = fc.integer({ min: 1, max: 6 }).chain((n) =>
      fc.tuple(
        fc.array(fc.array(fc.double({ min: -1, max: 1, noNaN: true }).map((v) => (Math.abs(v) < 1e-12 ? 0 : v)), { minLength: n, maxLength: n }), { minLength: n, maxLength: n }),
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: n, maxLength: n }),
      ),
    );
    fc.assert(
      fc.property(system, ([noise, c]) => {
        const n = c.length;
        // Diagonally dominant, so well conditioned: rounding alone separates the two answers.
        const a = noise.map((row, i) => row.map((v, j) => (i === j ? v + 2 * n : v)));
        const x = solveDense(a, c)!;
        const ref = new MLR(a, c.map((v) => [v]), { intercept: false, statistics: false });
        for (let i = 0; i < n; i++) expect(x[i]).toBeCloseTo(ref.weights[i][0], 9);
        times(a, x).forEach((v, i) => expect(v).toBeCloseTo(c[i], 9));
      }),
    );
  });

  it('degenerate input: a singular or zero matrix gives null, an empty one an empty solution', () => {
    // Row 3 = row 1 + row 2, so the rank is 2 (by hand).
    expect(solveDense([[1, 2, 3], [4, 5, 6], [5, 7, 9]], [1, 2, 3])).toBeNull();
    expect(solveDense([[0, 0], [0, 0]], [0, 0])).toBeNull();
    expect(solveDense([], [])).toEqual([]);
  });

  it('refuses a matrix that is not square or does not match c, saying what was needed and what came', () => {
    expect(() => solveDense([[1, 2], [3]], [1, 2])).toThrow(InputError);
    expect(() => solveDense([[1, 2], [3]], [1, 2])).toThrow('row 2 has 1 entries, expected 2');
    expect(() => solveDense([[1, 0], [0, 1]], [1])).toThrow('one right-hand value per row (2), got 1');
  });
});
