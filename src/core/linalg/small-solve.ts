/**
 * Quadratic form b' A^-1 b for a small symmetric positive definite A (a few block columns), by
 * Cholesky factorisation A = L L' and w = L^-1 b, so b' A^-1 b = w'w.
 * Source: Golub and Van Loan, Matrix Computations, 4th ed., Algorithm 4.2.1. Cost O(m^3 / 6).
 * Example: inverseQuadraticForm([4], 1, [2]) -> 1.
 */
import { cholesky } from './cholesky.ts';

export function inverseQuadraticForm(a: ArrayLike<number>, m: number, b: ArrayLike<number>): number {
  const l = new Float64Array(m * m);
  if (!cholesky(a, m, l)) return Number.NaN;
  let q = 0;
  const w = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    let s = b[i];
    for (let k = 0; k < i; k++) s -= l[i * m + k] * w[k];
    w[i] = s / l[i * m + i];
    q += w[i] * w[i];
  }
  return q;
}
