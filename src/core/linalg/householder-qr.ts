/**
 * Householder QR with rank detection by limited pivoting: columns are taken in the order given,
 * and a column whose part orthogonal to the columns before it is negligible (norm below
 * RANK_TOLERANCE times its own norm) is set aside as aliased, as LINPACK dqrdc2 does for R's lm.
 * Keeping the given order is what makes the sequential sums of squares follow the model order.
 *
 * Method: Golub and Van Loan, Matrix Computations, 4th ed., Algorithm 5.2.1 (Householder QR),
 * applied left-looking; reflector v with v[0] = 1 and beta = 2 / v'v (their section 5.1.2).
 * Cost: O(n p r) for n rows, p columns, rank r. Storage is column-major: X[j*n + i].
 * Example: X = [1,1,1,1 | -1,1,-1,1] (n=4, p=2) -> rank 2, R = [[-2,0],[0,2]] up to signs.
 */
import { RANK_TOLERANCE } from '../tolerance.ts';

export interface QrFactor {
  readonly n: number;
  readonly p: number;
  /** Number of independent columns. */
  readonly rank: number;
  /** Original indices of the independent columns, in order (length rank). */
  readonly kept: Int32Array;
  /** Original indices of the columns set aside as combinations of earlier ones. */
  readonly aliased: Int32Array;
  /** R, rank x rank upper triangular, column-major, over the kept columns. */
  readonly r: Float64Array;
  /** Householder vectors, column-major n x rank (zeros above the diagonal, 1 on it). */
  readonly v: Float64Array;
  readonly beta: Float64Array;
  /**
   * For each aliased column, its Q'x in the first `rank` rows: solving R b = that vector gives
   * the weights b with x_aliased = X_kept b.
   */
  readonly aliasedTop: Float64Array;
  /** The matrix factorised (a reference; not to be modified), so that a wider one can resume from it. */
  readonly x: Float64Array;
  /** The rank tolerance it was made with. */
  readonly tol: number;
}

/**
 * Factorises X (column-major, n x p; not modified). With `prefix`, a factor made with the same
 * tolerance whose matrix equals the first prefix.p columns of X entry for entry, the work on those
 * columns is taken from it: columns are processed left to right and each depends only on those
 * before it, so the result is the same to the last bit. A prefix that does not match is ignored.
 */
export function householderQr(x: Float64Array, n: number, p: number, tol: number = RANK_TOLERANCE, prefix?: QrFactor): QrFactor {
  const v = new Float64Array(n * Math.min(n, p));
  const beta = new Float64Array(Math.min(n, p));
  const kept: number[] = [];
  const aliased: number[] = [];
  const topOfKept: Float64Array[] = [];
  const topOfAliased: Float64Array[] = [];
  const col = new Float64Array(n);
  let rank = 0;
  let start = 0;
  if (prefix && prefix.tol === tol && samePrefix(prefix, x, n, p)) {
    rank = prefix.rank;
    start = prefix.p;
    v.set(prefix.v);
    beta.set(prefix.beta);
    for (let c = 0; c < rank; c++) {
      kept.push(prefix.kept[c]);
      const top = new Float64Array(c + 1);
      for (let i = 0; i <= c; i++) top[i] = prefix.r[c * rank + i];
      topOfKept.push(top);
    }
    // An aliased column's top was cut at the rank of its time; beyond it the prefix holds zeros, as the result will.
    for (let a = 0; a < prefix.aliased.length; a++) {
      aliased.push(prefix.aliased[a]);
      topOfAliased.push(prefix.aliasedTop.slice(a * rank, (a + 1) * rank));
    }
  }
  for (let j = start; j < p; j++) {
    const off = j * n;
    let norm0 = 0;
    for (let i = 0; i < n; i++) {
      const a = x[off + i];
      col[i] = a;
      norm0 += a * a;
    }
    norm0 = Math.sqrt(norm0);
    // Apply the reflectors found so far.
    for (let k = 0; k < rank; k++) {
      const vo = k * n;
      let s = 0;
      for (let i = k; i < n; i++) s += v[vo + i] * col[i];
      s *= beta[k];
      for (let i = k; i < n; i++) col[i] -= s * v[vo + i];
    }
    let tail = 0;
    for (let i = rank; i < n; i++) tail += col[i] * col[i];
    tail = Math.sqrt(tail);
    if (rank >= n || norm0 === 0 || tail <= tol * norm0) {
      aliased.push(j);
      topOfAliased.push(col.slice(0, rank));
      continue;
    }
    // New reflector from rows rank..n-1 (Golub and Van Loan Algorithm 5.1.1, sign chosen to avoid cancellation).
    const k = rank;
    const alpha = col[k] >= 0 ? -tail : tail;
    const vo = k * n;
    const v0 = col[k] - alpha;
    v[vo + k] = 1;
    let vtv = 1;
    for (let i = k + 1; i < n; i++) {
      const t = col[i] / v0;
      v[vo + i] = t;
      vtv += t * t;
    }
    beta[k] = 2 / vtv;
    col[k] = alpha;
    topOfKept.push(col.slice(0, k + 1));
    kept.push(j);
    rank++;
  }
  const r = new Float64Array(rank * rank);
  for (let c = 0; c < rank; c++) {
    const t = topOfKept[c];
    for (let i = 0; i <= c; i++) r[c * rank + i] = t[i];
  }
  const aliasedTop = new Float64Array(aliased.length * rank);
  for (let a = 0; a < aliased.length; a++) {
    const t = topOfAliased[a];
    for (let i = 0; i < t.length; i++) aliasedTop[a * rank + i] = t[i];
  }
  return {
    n,
    p,
    rank,
    kept: Int32Array.from(kept),
    aliased: Int32Array.from(aliased),
    r,
    v: v.subarray(0, n * rank),
    beta: beta.subarray(0, rank),
    aliasedTop,
    x,
    tol,
  };
}

/** Whether `prefix` factorised exactly the first prefix.p columns of x (n rows). */
function samePrefix(prefix: QrFactor, x: Float64Array, n: number, p: number): boolean {
  if (prefix.n !== n || prefix.p > p || prefix.x.length !== n * prefix.p) return false;
  for (let i = 0; i < n * prefix.p; i++) if (!Object.is(prefix.x[i], x[i])) return false;
  return true;
}

/** y <- Q'y in place (Golub and Van Loan section 5.1.6: apply the reflectors in order). */
export function applyQt(f: QrFactor, y: Float64Array): void {
  const { n, v, beta } = f;
  for (let k = 0; k < f.rank; k++) {
    const vo = k * n;
    let s = 0;
    for (let i = k; i < n; i++) s += v[vo + i] * y[i];
    s *= beta[k];
    for (let i = k; i < n; i++) y[i] -= s * v[vo + i];
  }
}

/** z <- Q z in place (the reflectors in reverse order). */
export function applyQ(f: QrFactor, z: Float64Array): void {
  const { n, v, beta } = f;
  for (let k = f.rank - 1; k >= 0; k--) {
    const vo = k * n;
    let s = 0;
    for (let i = k; i < n; i++) s += v[vo + i] * z[i];
    s *= beta[k];
    for (let i = k; i < n; i++) z[i] -= s * v[vo + i];
  }
}
