import { describe, expect, it } from 'vitest';
import { inverseQuadraticForm } from '../../../src/core/linalg/small-solve.ts';

describe("inverseQuadraticForm: b' A^-1 b by Cholesky (Golub and Van Loan, 4th ed., Algorithm 4.2.1)", () => {
  it("the module's example: A = [4], b = [2] -> 1", () => {
    expect(inverseQuadraticForm([4], 1, [2])).toBe(1);
  });
  it('a 2 x 2 case against the closed-form inverse', () => {
    // A = [[4, 2], [2, 3]], det 8, A^-1 = [[3, -2], [-2, 4]] / 8; b = (1, 2): b'A^-1 b = (3 - 8 + 16) / 8 = 11/8.
    expect(inverseQuadraticForm([4, 2, 2, 3], 2, [1, 2])).toBeCloseTo(11 / 8, 14);
  });
  it('degenerate input: a matrix that is not positive definite gives NaN, a 0 x 0 one gives 0', () => {
    expect(inverseQuadraticForm([1, 2, 2, 1], 2, [1, 1])).toBeNaN();
    expect(inverseQuadraticForm([], 0, [])).toBe(0);
  });
});
