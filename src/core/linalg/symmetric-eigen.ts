/**
 * Eigenvalues and eigenvectors of a small real symmetric matrix by the cyclic Jacobi method:
 * sweep over every off-diagonal pair (p, q) in row order, and zero A[p][q] with a plane rotation
 * J(p, q, theta) chosen by the stable formulas tau = (A_qq - A_pp) / (2 A_pq),
 * t = sign(tau) / (|tau| + sqrt(1 + tau^2)), c = 1 / sqrt(1 + t^2), s = t c; A <- J' A J and
 * V <- V J, until the off-diagonal norm is negligible beside the whole matrix.
 * Source: Golub and Van Loan, Matrix Computations, 4th ed., section 8.5.2 (the 2-by-2 symmetric
 * Schur decomposition, Algorithm 8.5.1) and section 8.5.3 (cyclic Jacobi, Algorithm 8.5.3); the
 * sweep converges quadratically (it stops at JACOBI_TOLERANCE, src/core/tolerance.ts), so a handful of sweeps suffice for the matrices of a response
 * surface (k <= 25).
 */
import { InputError } from '../errors.ts';
import { JACOBI_TOLERANCE, SIGN_TIE, SYMMETRY_TOLERANCE, TINY_SCALE } from '../tolerance.ts';

/** Most sweeps before giving up. Common practice: convergence is quadratic, so 50 is far more than needed. */
export const JACOBI_MAX_SWEEPS = 50;

export interface SymmetricEigen {
  /** Eigenvalues, largest first (signed). */
  readonly values: number[];
  /** Unit eigenvectors, vectors[i] belongs to values[i]; each has its largest-magnitude entry positive. */
  readonly vectors: number[][];
  /** Sweeps taken. */
  readonly sweeps: number;
}

/**
 * Eigen-decomposition A = V diag(lambda) V' of a symmetric matrix given as rows, by cyclic Jacobi
 * (see the file comment). Eigenvalues are sorted largest first; each eigenvector is scaled to unit
 * length and signed so that its entry of largest magnitude is positive (the first such entry on a
 * tie within SIGN_TIE), so the answer is the same whatever the order of the rotations.
 * Cost O(n^3) per sweep, a few sweeps.
 * Throws InputError for an empty or non-square matrix, a non-finite entry, or one that is not
 * symmetric (|A_ij - A_ji| above SYMMETRY_TOLERANCE of the largest entry).
 * Example: symmetricEigen([[2, 1], [1, 2]]) -> values [3, 1], vectors [[0.7071, 0.7071],
 * [0.7071, -0.7071]].
 */
export function symmetricEigen(a: readonly (readonly number[])[]): SymmetricEigen {
  const n = a.length;
  if (n === 0) throw new InputError('An eigen-decomposition needs a matrix with at least one row, got none');
  let scale = 0;
  for (let i = 0; i < n; i++) {
    if (a[i].length !== n) throw new InputError(`An eigen-decomposition needs a square matrix: row ${i + 1} has ${a[i].length} entries, expected ${n}`);
    for (let j = 0; j < n; j++) {
      if (!Number.isFinite(a[i][j])) throw new InputError(`Matrix entry (${i + 1}, ${j + 1}) must be a finite number, got ${a[i][j]}`);
      scale = Math.max(scale, Math.abs(a[i][j]));
    }
  }
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      if (Math.abs(a[i][j] - a[j][i]) > SYMMETRY_TOLERANCE * Math.max(scale, TINY_SCALE)) {
        throw new InputError(`The matrix must be symmetric: entry (${i + 1}, ${j + 1}) is ${a[i][j]} but (${j + 1}, ${i + 1}) is ${a[j][i]}`);
      }
    }
  }
  // Work on a row-major copy, symmetrised by averaging (rounding only).
  const m = new Float64Array(n * n);
  const v = new Float64Array(n * n);
  let total = 0;
  for (let i = 0; i < n; i++) {
    v[i * n + i] = 1;
    for (let j = 0; j < n; j++) {
      m[i * n + j] = (a[i][j] + a[j][i]) / 2;
      total += m[i * n + j] * m[i * n + j];
    }
  }
  const limit = JACOBI_TOLERANCE * Math.sqrt(total);
  let sweeps = 0;
  for (; sweeps < JACOBI_MAX_SWEEPS; sweeps++) {
    let off = 0;
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) off += 2 * m[i * n + j] * m[i * n + j];
    if (Math.sqrt(off) <= limit) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = m[p * n + q];
        if (apq === 0) continue;
        const tau = (m[q * n + q] - m[p * n + p]) / (2 * apq);
        const t = (tau >= 0 ? 1 : -1) / (Math.abs(tau) + Math.sqrt(1 + tau * tau));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = t * c;
        // A <- J' A J: rows and columns p and q.
        for (let k = 0; k < n; k++) {
          const akp = m[k * n + p];
          const akq = m[k * n + q];
          m[k * n + p] = c * akp - s * akq;
          m[k * n + q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = m[p * n + k];
          const aqk = m[q * n + k];
          m[p * n + k] = c * apk - s * aqk;
          m[q * n + k] = s * apk + c * aqk;
        }
        m[p * n + q] = 0;
        m[q * n + p] = 0;
        // V <- V J.
        for (let k = 0; k < n; k++) {
          const vkp = v[k * n + p];
          const vkq = v[k * n + q];
          v[k * n + p] = c * vkp - s * vkq;
          v[k * n + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => m[y * n + y] - m[x * n + x]);
  const values = order.map((i) => m[i * n + i]);
  const vectors = order.map((j) => {
    const col = Array.from({ length: n }, (_, k) => v[k * n + j]);
    let norm = 0;
    let most = 0;
    for (let k = 0; k < n; k++) {
      norm += col[k] * col[k];
      most = Math.max(most, Math.abs(col[k]));
    }
    const big = col.findIndex((x) => Math.abs(x) >= most * (1 - SIGN_TIE));
    const f = (col[big] < 0 ? -1 : 1) / Math.sqrt(norm);
    return col.map((x) => x * f + 0);
  });
  return { values, vectors, sweeps };
}
