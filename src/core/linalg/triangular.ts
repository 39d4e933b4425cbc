/**
 * Upper-triangular helpers for R from a QR factorisation (column-major, m x m).
 * Back substitution: Golub and Van Loan, Matrix Computations, 4th ed., Algorithm 3.1.2.
 */

/** Solves R b = c in place in c. Cost O(m^2). */
export function solveUpper(r: Float64Array, m: number, c: Float64Array): void {
  for (let i = m - 1; i >= 0; i--) {
    let s = c[i];
    for (let j = i + 1; j < m; j++) s -= r[j * m + i] * c[j];
    c[i] = s / r[i * m + i];
  }
}

/**
 * solveUpper with R given by rows (rows[i m + j] = R[i,j], e.g. from upperRows): the same
 * operations in the same order, reading each row along memory. Cost O(m^2).
 */
export function solveUpperRows(rows: Float64Array, m: number, c: Float64Array): void {
  for (let i = m - 1; i >= 0; i--) {
    const o = i * m;
    let s = c[i];
    for (let j = i + 1; j < m; j++) s -= rows[o + j] * c[j];
    c[i] = s / rows[o + i];
  }
}

/** R (upper triangular, column-major m x m) by rows, for solveUpperRows. Cost O(m^2). */
export function upperRows(r: Float64Array, m: number): Float64Array {
  const rows = new Float64Array(m * m);
  for (let j = 0; j < m; j++) for (let i = 0; i <= j; i++) rows[i * m + j] = r[j * m + i];
  return rows;
}

/** Inverse of R (upper triangular, column-major). Cost O(m^3 / 3). */
export function invertUpper(r: Float64Array, m: number): Float64Array {
  const inv = new Float64Array(m * m);
  for (let j = 0; j < m; j++) {
    inv[j * m + j] = 1 / r[j * m + j];
    for (let i = j - 1; i >= 0; i--) {
      let s = 0;
      for (let k = i + 1; k <= j; k++) s += r[k * m + i] * inv[j * m + k];
      inv[j * m + i] = -s / r[i * m + i];
    }
  }
  return inv;
}

/** (R'R)^-1 = R^-1 R^-T from R^-1 (column-major, symmetric result). Cost O(m^3 / 3). */
export function crossInverse(rinv: Float64Array, m: number): Float64Array {
  const c = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    for (let j = i; j < m; j++) {
      // (R^-1 R^-T)_{ij} = sum_k Rinv[i,k] Rinv[j,k], k >= max(i, j) since R^-1 is upper.
      let s = 0;
      for (let k = j; k < m; k++) s += rinv[k * m + i] * rinv[k * m + j];
      c[j * m + i] = s;
      c[i * m + j] = s;
    }
  }
  return c;
}
