import { describe, expect, it } from 'vitest';
import { cholesky } from '../../../src/core/linalg/cholesky.ts';

describe('cholesky (Golub and Van Loan, 4th ed., Algorithm 4.2.1)', () => {
  it("the module's example and L L' = A on a 3 x 3 case", () => {
    const out = new Float64Array(4);
    expect(cholesky([4, 0, 2, 3], 2, out)).toBe(true);
    expect(Array.from(out.slice(0, 3))).toEqual([2, 0, 1]);
    expect(out[3]).toBeCloseTo(Math.SQRT2, 15);
    // A = [[25, 15, -5], [15, 18, 0], [-5, 0, 11]]: L = [[5, 0, 0], [3, 3, 0], [-1, 1, 3]] (a textbook
    // exercise, from memory; checked here by L L' = A).
    const a = [25, 0, 0, 15, 18, 0, -5, 0, 11];
    const l = new Float64Array(9);
    expect(cholesky(a, 3, l)).toBe(true);
    expect([l[0], l[3], l[4], l[6], l[7], l[8]]).toEqual([5, 3, 3, -1, 1, 3]);
  });
  it('in place, and a matrix that is not positive definite is refused', () => {
    const m = Float64Array.from([4, 0, 2, 3]);
    expect(cholesky(m, 2, m)).toBe(true);
    expect(m[2]).toBe(1);
    expect(cholesky([1, 0, 2, 1], 2, new Float64Array(4))).toBe(false);
    expect(cholesky([0], 1, new Float64Array(1))).toBe(false);
  });
});
