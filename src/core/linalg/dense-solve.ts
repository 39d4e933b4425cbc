/**
 * Solves a small dense square system A x = c by Gaussian elimination with partial pivoting.
 * Source: Golub and Van Loan, Matrix Computations, 4th ed., Algorithm 3.4.1 (Gaussian
 * elimination with partial pivoting) and section 3.1 (forward and back substitution).
 */
import { InputError } from '../errors.ts';
import { SINGULAR_TOLERANCE } from '../tolerance.ts';

/**
 * x with A x = c, or null when A is singular: a pivot below SINGULAR_TOLERANCE times the largest
 * entry of A (src/core/tolerance.ts). A is given as rows and is not modified. Cost O(n^3 / 3).
 * Throws InputError for a matrix that is not square or does not match c.
 * Example: solveDense([[2, 0], [0, 4]], [2, 2]) -> [1, 0.5]; solveDense([[1, 1], [1, 1]], [1, 2]) -> null.
 */
export function solveDense(a: readonly (readonly number[])[], c: readonly number[]): number[] | null {
  const n = a.length;
  if (c.length !== n) throw new InputError(`A linear solve needs one right-hand value per row (${n}), got ${c.length}`);
  const m = a.map((row, i) => {
    if (row.length !== n) throw new InputError(`A linear solve needs a square matrix: row ${i + 1} has ${row.length} entries, expected ${n}`);
    return [...row, c[i]];
  });
  let scale = 0;
  for (const row of a) for (const x of row) scale = Math.max(scale, Math.abs(x));
  if (n === 0) return [];
  if (scale === 0) return null;
  for (let col = 0; col < n; col++) {
    let piv = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r][col]) > Math.abs(m[piv][col])) piv = r;
    if (Math.abs(m[piv][col]) <= SINGULAR_TOLERANCE * scale) return null;
    if (piv !== col) [m[piv], m[col]] = [m[col], m[piv]];
    for (let r = col + 1; r < n; r++) {
      const f = m[r][col] / m[col][col];
      if (f === 0) continue;
      for (let j = col; j <= n; j++) m[r][j] -= f * m[col][j];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let s = m[i][n];
    for (let j = i + 1; j < n; j++) s -= m[i][j] * x[j];
    x[i] = s / m[i][i];
  }
  return x;
}
