/**
 * Quadratic form b' A^-1 b for a small symmetric positive definite A (a few block columns), by
 * Cholesky factorisation A = L L' and w = L^-1 b, so b' A^-1 b = w'w.
 * Source: Golub and Van Loan, Matrix Computations, 4th ed., Algorithm 4.2.1. Cost O(m^3 / 6).
 * Example: inverseQuadraticForm([4], 1, [2]) -> 1.
 */
export function inverseQuadraticForm(a: ArrayLike<number>, m: number, b: ArrayLike<number>): number {
  const l = new Float64Array(m * m);
  for (let j = 0; j < m; j++) {
    let d = a[j * m + j];
    for (let k = 0; k < j; k++) d -= l[k * m + j] * l[k * m + j];
    if (!(d > 0)) return Number.NaN;
    const ljj = Math.sqrt(d);
    l[j * m + j] = ljj;
    for (let i = j + 1; i < m; i++) {
      let s = a[j * m + i];
      for (let k = 0; k < j; k++) s -= l[k * m + i] * l[k * m + j];
      l[j * m + i] = s / ljj;
    }
  }
  let q = 0;
  const w = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    let s = b[i];
    for (let k = 0; k < i; k++) s -= l[k * m + i] * w[k];
    w[i] = s / l[i * m + i];
    q += w[i] * w[i];
  }
  return q;
}
