/**
 * Cholesky factorisation A = L L' of a small symmetric matrix, with the test for positive
 * definiteness it gives for free (a pivot that is not positive). Reads A's lower triangle,
 * row-major (a[i m + j], i >= j); writes L the same way into `l`, which may be `a` itself.
 * Source: Golub and Van Loan, Matrix Computations, 4th ed., Algorithm 4.2.1. Cost O(m^3 / 6).
 * Example: cholesky([4, 0, 2, 3], 2, out) -> true, out [2, 0, 1, 1.414...].
 */
export function cholesky(a: ArrayLike<number>, m: number, l: Float64Array): boolean {
  for (let j = 0; j < m; j++) {
    let d = a[j * m + j];
    for (let k = 0; k < j; k++) d -= l[j * m + k] * l[j * m + k];
    if (!(d > 0)) return false;
    const ljj = Math.sqrt(d);
    l[j * m + j] = ljj;
    for (let i = j + 1; i < m; i++) {
      let s = a[i * m + j];
      for (let k = 0; k < j; k++) s -= l[i * m + k] * l[j * m + k];
      l[i * m + j] = s / ljj;
    }
  }
  return true;
}
