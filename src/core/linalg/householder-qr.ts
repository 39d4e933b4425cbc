/**
 * Householder QR with rank detection by limited pivoting: columns are taken in the order given,
 * and a column whose part orthogonal to the columns before it is negligible (norm below
 * RANK_TOLERANCE times its own norm) is set aside as aliased, as LINPACK dqrdc2 does for R's lm.
 * Keeping the given order is what makes the sequential sums of squares follow the model order.
 *
 * Method: Golub and Van Loan, Matrix Computations, 4th ed., Algorithm 5.2.1 (Householder QR),
 * with the columns taken in blocks of four (left-looking between blocks); reflector v with
 * v[0] = 1 and beta = 2 / v'v (their section 5.1.2).
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
 * Columns are taken four at a time (left-looking by blocks): every reflector made so far is
 * applied to the four, then each of them in turn takes the reflectors of the block's earlier
 * columns and gives its own. Each column still sees the same operations in the same order as in the
 * plain right-looking loop (Golub and Van Loan Algorithm 5.2.1); only the passes are merged
 * (reflect4Run: reflector k's update and reflector k + 1's sum in one pass over the rows).
 * Work arrays are allocated once per call.
 */
export function householderQr(x: Float64Array, n: number, p: number, tol: number = RANK_TOLERANCE, prefix?: QrFactor): QrFactor {
  const mr = Math.min(n, p);
  const v = new Float64Array(n * mr);
  const beta = new Float64Array(mr);
  const kept = new Int32Array(p);
  const aliased = new Int32Array(p);
  // Top of each kept column (its R column, rank + 1 entries) and of each aliased one (rank entries), mr apart.
  const topKept = new Float64Array(mr * mr);
  // Allocated at the first aliased column (most fits have none).
  let topAliased = new Float64Array(0);
  let rank = 0;
  let na = 0;
  let start = 0;
  if (prefix && prefix.tol === tol && samePrefix(prefix, x, n, p)) {
    rank = prefix.rank;
    start = prefix.p;
    v.set(prefix.v);
    beta.set(prefix.beta);
    for (let c = 0; c < rank; c++) {
      kept[c] = prefix.kept[c];
      for (let i = 0; i <= c; i++) topKept[c * mr + i] = prefix.r[c * rank + i];
    }
    // An aliased column's top was cut at the rank of its time; beyond it the prefix holds zeros, as the result will.
    if (prefix.aliased.length > 0) topAliased = new Float64Array(p * mr);
    for (let a = 0; a < prefix.aliased.length; a++) {
      aliased[na] = prefix.aliased[a];
      for (let i = 0; i < rank; i++) topAliased[na * mr + i] = prefix.aliasedTop[a * rank + i];
      na++;
    }
  }
  // The columns still to do (column j at (j - start) n).
  const w = x.slice(start * n, p * n);
  for (let b0 = start; b0 < p; b0 += 4) {
    const b1 = Math.min(b0 + 4, p);
    // Every reflector made so far, in order, to the block's columns.
    const blockRank = rank;
    if (rank > 0) {
      if (b1 - b0 === 4) reflect4Run(v, beta, 0, rank, n, w, (b0 - start) * n);
      else for (let j = b0; j < b1; j++) reflect1Run(v, beta, 0, rank, n, w, (j - start) * n);
    }
    for (let j = b0; j < b1; j++) {
      const off = j * n;
      const co = (j - start) * n;
      // The reflectors made from the block's earlier columns, in order.
      if (rank > blockRank) reflect1Run(v, beta, blockRank, rank, n, w, co);
      let norm0 = 0;
      for (let i = 0; i < n; i++) norm0 += x[off + i] * x[off + i];
      norm0 = Math.sqrt(norm0);
      let tail = 0;
      for (let i = rank; i < n; i++) tail += w[co + i] * w[co + i];
      tail = Math.sqrt(tail);
      if (rank >= n || norm0 === 0 || tail <= tol * norm0) {
        if (topAliased.length === 0) topAliased = new Float64Array(p * mr);
        for (let i = 0; i < rank; i++) topAliased[na * mr + i] = w[co + i];
        aliased[na++] = j;
        continue;
      }
      // New reflector from rows rank..n-1 (Golub and Van Loan Algorithm 5.1.1, sign chosen to avoid cancellation).
      const k = rank;
      const alpha = w[co + k] >= 0 ? -tail : tail;
      const vo = k * n;
      const v0 = w[co + k] - alpha;
      v[vo + k] = 1;
      let vtv = 1;
      for (let i = k + 1; i < n; i++) {
        const t = w[co + i] / v0;
        v[vo + i] = t;
        vtv += t * t;
      }
      beta[k] = 2 / vtv;
      for (let i = 0; i < k; i++) topKept[k * mr + i] = w[co + i];
      topKept[k * mr + k] = alpha;
      kept[k] = j;
      rank++;
    }
  }
  // At full rank the tops are R as they stand (rank = mr apart, zeros below the diagonal).
  const r = rank === mr ? topKept : new Float64Array(rank * rank);
  if (rank !== mr) for (let c = 0; c < rank; c++) for (let i = 0; i <= c; i++) r[c * rank + i] = topKept[c * mr + i];
  const aliasedTop = new Float64Array(na * rank);
  // Entries past an aliased column's own rank stay zero in topAliased (never written), as they must.
  for (let a = 0; a < na; a++) for (let i = 0; i < rank; i++) aliasedTop[a * rank + i] = topAliased[a * mr + i];
  return {
    n,
    p,
    rank,
    kept: kept.slice(0, rank),
    aliased: aliased.slice(0, na),
    r,
    v: v.subarray(0, n * rank),
    beta: beta.subarray(0, rank),
    aliasedTop,
    x,
    tol,
  };
}

/**
 * col <- (I - beta v v') col over rows k..n-1, col at offset co, v the reflector at offset vo
 * (Golub and Van Loan section 5.1.4).
 */
function reflect(v: Float64Array, vo: number, k: number, n: number, beta: number, col: Float64Array, co: number): void {
  let s = 0;
  for (let i = k; i < n; i++) s += v[vo + i] * col[co + i];
  s *= beta;
  for (let i = k; i < n; i++) col[co + i] -= s * v[vo + i];
}

/** Reflectors k0..k1-1 (k1 > k0), in order, to the column at co: reflect4Run for one column. */
function reflect1Run(v: Float64Array, beta: Float64Array, k0: number, k1: number, n: number, w: Float64Array, co: number): void {
  let s = 0;
  let vo = k0 * n;
  for (let i = k0; i < n; i++) s += v[vo + i] * w[co + i];
  for (let k = k0; k < k1; k++) {
    s *= beta[k];
    w[co + k] -= s * v[vo + k];
    if (k + 1 === k1) {
      for (let i = k + 1; i < n; i++) w[co + i] -= s * v[vo + i];
      return;
    }
    const un = vo + n; // reflector k + 1
    let a = 0;
    for (let i = k + 1; i < n; i++) {
      const xi = (w[co + i] -= s * v[vo + i]);
      a += v[un + i] * xi;
    }
    s = a;
    vo = un;
  }
}

/**
 * Reflectors k0..k1-1 (k1 > k0), in order, to the four columns at co, co + n, co + 2n, co + 3n:
 * reflect on each column, reflector by reflector, with reflector k's update of row i and
 * reflector k + 1's sum over it in one pass (the update of a row comes before the sum reads it,
 * so each sum adds the same products in the same order as reflect does).
 */
function reflect4Run(v: Float64Array, beta: Float64Array, k0: number, k1: number, n: number, w: Float64Array, co: number): void {
  const c1 = co + n;
  const c2 = c1 + n;
  const c3 = c2 + n;
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  let vo = k0 * n;
  for (let i = k0; i < n; i++) {
    const vi = v[(vo + i) | 0];
    s0 += vi * w[(co + i) | 0];
    s1 += vi * w[(c1 + i) | 0];
    s2 += vi * w[(c2 + i) | 0];
    s3 += vi * w[(c3 + i) | 0];
  }
  for (let k = k0; k < k1; k++) {
    const b = beta[k];
    s0 *= b;
    s1 *= b;
    s2 *= b;
    s3 *= b;
    const vk = v[vo + k];
    w[co + k] -= s0 * vk;
    w[c1 + k] -= s1 * vk;
    w[c2 + k] -= s2 * vk;
    w[c3 + k] -= s3 * vk;
    if (k + 1 === k1) {
      for (let i = k + 1; i < n; i++) {
        const vi = v[(vo + i) | 0];
        w[(co + i) | 0] -= s0 * vi;
        w[(c1 + i) | 0] -= s1 * vi;
        w[(c2 + i) | 0] -= s2 * vi;
        w[(c3 + i) | 0] -= s3 * vi;
      }
      return;
    }
    const un = vo + n; // reflector k + 1
    let a0 = 0;
    let a1 = 0;
    let a2 = 0;
    let a3 = 0;
    for (let i = k + 1; i < n; i++) {
      const vi = v[(vo + i) | 0];
      const ui = v[(un + i) | 0];
      const x0 = (w[(co + i) | 0] -= s0 * vi);
      const x1 = (w[(c1 + i) | 0] -= s1 * vi);
      const x2 = (w[(c2 + i) | 0] -= s2 * vi);
      const x3 = (w[(c3 + i) | 0] -= s3 * vi);
      a0 += ui * x0;
      a1 += ui * x1;
      a2 += ui * x2;
      a3 += ui * x3;
    }
    s0 = a0;
    s1 = a1;
    s2 = a2;
    s3 = a3;
    vo = un;
  }
}

/** Whether `prefix` factorised exactly the first prefix.p columns of x (n rows). */
function samePrefix(prefix: QrFactor, x: Float64Array, n: number, p: number): boolean {
  if (prefix.n !== n || prefix.p > p || prefix.x.length !== n * prefix.p) return false;
  if (prefix.x === x) return true;
  // Object.is, written out (the call per entry costs more than the test): equal and of the same sign at zero, or both NaN.
  const px = prefix.x;
  for (let i = 0; i < n * prefix.p; i++) {
    const a = px[i];
    const b = x[i];
    if (a === b ? a === 0 && 1 / a !== 1 / b : a === a || b === b) return false;
  }
  return true;
}

/** y <- Q'y in place (Golub and Van Loan section 5.1.6: apply the reflectors in order). */
export function applyQt(f: QrFactor, y: Float64Array): void {
  if (f.rank > 0) reflect1Run(f.v, f.beta, 0, f.rank, f.n, y, 0);
}

/** z <- Q z in place (the reflectors in reverse order). */
export function applyQ(f: QrFactor, z: Float64Array): void {
  const { n, v, beta } = f;
  for (let k = f.rank - 1; k >= 0; k--) reflect(v, k * n, k, n, beta[k], z, 0);
}
