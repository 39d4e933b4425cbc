/**
 * What a plan can estimate when its runs are distinct points of a full two-level factorial at
 * exactly +-1 with a few points missing, found without factorising the runs x columns matrix.
 * Every product column is a column of the Walsh-Hadamard matrix H (N = 2^k runs, H'H = N I);
 * with the rows D of the d missing points left out, X'X = N I - U'U, U = H[D, columns]
 * (Golub and Van Loan, Matrix Computations, 4th ed., section 2.1.4, and Hager (1989), SIAM Review
 * 31, 221-239: a rank-d change of a matrix whose inverse is known). So X b = 0 exactly when b
 * is (H[D, :]' w) restricted to the columns, for a w in R^d orthogonal to h_l = H[D, l] for every
 * Walsh column l outside the model: the dependencies live in R^d. Taking the columns in order as
 * Householder QR does (householder-qr.ts), column j is aliased exactly when h_j is not in the span
 * of the h_l of the outside columns and of the columns after j; the weights of its alias chain are
 * the null vector that is zero on the other aliased columns, with -1 at j.
 * Exactness: the span tests in R^d take a Gram-Schmidt residual below SPAN_TOLERANCE of |h| as
 * 0 and answer null when one lies between that and sqrt(WALSH_MARGIN): with every basis vector
 * taken from a residual of at least 1e-3 of its norm, rounding leaves a dependent vector's residual
 * near 1e-12, far below the test. And the answer is used only when the smallest eigenvalue of
 * X_kept'X_kept (that of M = N I - U_kept U_kept', d x d; Cauchy interlacing for each leading set)
 * is at least WALSH_MARGIN N (tolerance.ts), so every kept column keeps at least sqrt(WALSH_MARGIN)
 * of its norm and the QR's rank test (RANK_TOLERANCE) decides the same way. Otherwise: null, and
 * the caller factorises.
 * Cost O(N d^2 + p d^2 + d^3), no factorisation of the n x p matrix; the last few answers are
 * kept by the missing points and column masks, so the same plan again costs O(n k + p).
 * Example: the 2^3 less the run (+1, +1, +1), columns I, A, B, C, AB, AC, BC, ABC -> the seven
 * runs keep I..BC, and ABC = -(I + A + B + C + AB + AC + BC) on them (every h_l is 1 at the missing run).
 */
import { ALIAS_WEIGHT_TOLERANCE, SINGULAR_TOLERANCE, SPAN_TOLERANCE, WALSH_MARGIN } from '../tolerance.ts';
import { SQUARE_FLAG } from '../model/term.ts';
import type { Column } from './columns.ts';
import type { AliasedColumn } from './linear-fit.ts';
import { cholesky } from '../linalg/cholesky.ts';

/** The most missing points handled (beyond, the d x d work and the outside columns grow). */
const MAX_MISSING = 12;
/** The largest plan handled (2^k runs), to keep the outside columns few. */
const MAX_FACTORS = 14;

export interface WalshPlan {
  /** Indices into the columns of the estimable ones, in order. */
  readonly kept: Int32Array;
  /** Each aliased column with its chain over kept columns (as fit-qr.ts reports it). */
  readonly aliased: readonly AliasedColumn[];
}

/** Kept and aliased columns of `rows` (nominal settings, k factors), or null when the plan is not of this kind. Throws nothing. */
export function walshPlan(columns: readonly Column[], rows: readonly (readonly number[])[], k: number): WalshPlan | null {
  if (k < 1 || k > MAX_FACTORS) return null;
  const N = 1 << k;
  const n = rows.length;
  const d = N - n;
  if (d < 0 || d > MAX_MISSING || d >= n) return null;
  // Cell of each run: bit f set when factor f is at -1 (walsh-hadamard.ts), so H[c, t] = (-1)^popcount(t & c).
  const seen = new Uint8Array(N);
  for (let i = 0; i < n; i++) {
    const row = rows[i];
    let c = 0;
    for (let f = 0; f < k; f++) {
      const v = row[f];
      if (v === -1) c |= 1 << f;
      else if (v !== 1) return null;
    }
    if (seen[c]) return null;
    seen[c] = 1;
  }
  const p = columns.length;
  const masks = new Int32Array(p);
  const inModel = new Uint8Array(N);
  for (let j = 0; j < p; j++) {
    const c = columns[j];
    const t = c.kind === 'intercept' ? 0 : c.kind === 'term' && (c.term & SQUARE_FLAG) === 0 && c.term < N ? c.term : -1;
    if (t < 0 || inModel[t]) return null;
    inModel[t] = 1;
    masks[j] = t;
  }
  const missing = new Int32Array(d);
  for (let c = 0, i = 0; c < N; c++) if (!seen[c]) missing[i++] = c;
  // The answer depends only on the missing points and the column masks: the same plan is asked
  // for at every analysis of a study (and its saturated set), so the last few answers are kept.
  const known = remembered(k, missing, masks);
  if (known !== undefined) return known && { kept: new Int32Array(known.kept), aliased: known.aliased };
  const plan = planOf(p, N, d, missing, masks, inModel, n);
  remember(k, missing, masks, plan);
  return plan && { kept: new Int32Array(plan.kept), aliased: plan.aliased };
}

/** The last answers of walshPlan, by factor count, missing points and column masks (shared; never modified). */
const memo: { k: number; missing: Int32Array; masks: Int32Array; plan: WalshPlan | null }[] = [];
const MEMO_SIZE = 4;

function remembered(k: number, missing: Int32Array, masks: Int32Array): WalshPlan | null | undefined {
  for (const e of memo) if (e.k === k && sameInts(e.missing, missing) && sameInts(e.masks, masks)) return e.plan;
  return undefined;
}

function remember(k: number, missing: Int32Array, masks: Int32Array, plan: WalshPlan | null): void {
  if (plan) {
    for (const a of plan.aliased) {
      for (const w of a.combination) Object.freeze(w);
      Object.freeze(a.combination);
      Object.freeze(a);
    }
    Object.freeze(plan.aliased);
  }
  if (memo.length === MEMO_SIZE) memo.shift();
  memo.push({ k, missing, masks, plan });
}

function sameInts(a: Int32Array, b: Int32Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** walshPlan's work once the runs' missing points and the columns' masks are known. */
function planOf(p: number, N: number, d: number, missing: Int32Array, masks: Int32Array, inModel: Uint8Array, n: number): WalshPlan | null {
  // h_t = H[D, t] for every Walsh column t, d apart.
  const hs = new Float64Array(N * d);
  for (let t = 0; t < N; t++) for (let i = 0; i < d; i++) hs[t * d + i] = popParity(t & missing[i]) ? -1 : 1;
  const h = (t: number, out: Float64Array): Float64Array => {
    for (let i = 0; i < d; i++) out[i] = hs[t * d + i];
    return out;
  };

  // Backward pass: the outside columns, then the model's from last to first.
  const basis = new Float64Array(d * d);
  const g = new Float64Array(d);
  let rank = 0;
  for (let t = 0; t < N && rank < d; t++) {
    if (inModel[t]) continue;
    rank = extend(basis, rank, d, h(t, g));
    if (rank < 0) return null;
  }
  const outsideRank = rank;
  const isAliased = new Uint8Array(p);
  for (let j = p - 1; j >= 0 && rank < d; j--) {
    const r = extend(basis, rank, d, h(masks[j], g));
    if (r < 0) return null;
    if (r > rank) isAliased[j] = 1;
    rank = r;
  }
  const kept: number[] = [];
  const aliasedIdx: number[] = [];
  for (let j = 0; j < p; j++) (isAliased[j] ? aliasedIdx : kept).push(j);
  if (kept.length > n) return null;

  // Margin: Cholesky of M - WALSH_MARGIN N I, M = N I - sum over kept h h' = sum over the other Walsh
  // columns of h h' (H[D, :] H[D, :]' = N I): integer entries, exact either way; the shorter sum, lower triangle only.
  const m = new Float64Array(d * d);
  const isKept = new Uint8Array(N);
  for (let q = 0; q < kept.length; q++) isKept[masks[kept[q]]] = 1;
  const fromKept = kept.length <= N - kept.length;
  const sign = fromKept ? -1 : 1;
  for (let i = 0; i < d; i++) m[i * d + i] = fromKept ? N : 0;
  for (let t = 0; t < N; t++) {
    if (isKept[t] !== (fromKept ? 1 : 0)) continue;
    const o = t * d;
    for (let a = 0; a < d; a++) for (let b = 0; b <= a; b++) m[a * d + b] += sign * hs[o + a] * hs[o + b];
  }
  for (let i = 0; i < d; i++) m[i * d + i] -= WALSH_MARGIN * N;
  if (!cholesky(m, d, m)) return null; // positive definite (Golub and Van Loan, Algorithm 4.2.1; m overwritten)

  const a = aliasedIdx.length;
  const aliased: AliasedColumn[] = [];
  if (a > 0) {
    // W: an orthonormal basis of the complement of the outside columns' span (dimension a), from
    // the unit vectors, the one with the largest residual first (at least 1/sqrt(d) of it remains).
    const w = new Float64Array(d * d);
    w.set(basis.subarray(0, outsideRank * d));
    let r = outsideRank;
    const e = new Float64Array(d);
    const best = new Float64Array(d);
    while (r < d) {
      let bestNorm = 0;
      for (let i = 0; i < d; i++) {
        e.fill(0);
        e[i] = 1;
        const norm = residual(w, r, d, e);
        if (norm > bestNorm) {
          bestNorm = norm;
          best.set(e);
        }
      }
      if (!(bestNorm > 0)) break;
      for (let i = 0; i < d; i++) w[r * d + i] = best[i] / bestNorm;
      r++;
    }
    if (r - outsideRank !== a) return null;
    // B[l] = h_l' W for every column; A = B at the aliased columns; chains Y = -A^-1.
    const bm = new Float64Array(p * a);
    for (let j = 0; j < p; j++) {
      const o = masks[j] * d;
      for (let q = 0; q < a; q++) {
        let s = 0;
        for (let i = 0; i < d; i++) s += hs[o + i] * w[(outsideRank + q) * d + i];
        bm[j * a + q] = s;
      }
    }
    const am = new Float64Array(a * a);
    for (let i = 0; i < a; i++) for (let q = 0; q < a; q++) am[i * a + q] = bm[aliasedIdx[i] * a + q];
    const y = negInverse(am, a);
    if (!y) return null;
    const tol = ALIAS_WEIGHT_TOLERANCE;
    for (let i = 0; i < a; i++) {
      const combination: { column: number; weight: number }[] = [];
      for (const l of kept) {
        if (l > aliasedIdx[i]) break;
        let s = 0;
        for (let q = 0; q < a; q++) s += bm[l * a + q] * y[q * a + i];
        if (Math.abs(s) > tol) combination.push({ column: l, weight: s });
      }
      aliased.push({ column: aliasedIdx[i], combination });
    }
  }
  return { kept: Int32Array.from(kept), aliased };
}

function popParity(x: number): boolean {
  x ^= x >>> 16;
  x ^= x >>> 8;
  x ^= x >>> 4;
  x ^= x >>> 2;
  x ^= x >>> 1;
  return (x & 1) === 1;
}

/**
 * v <- its residual on the orthonormal rows basis[0..rank) by classical Gram-Schmidt applied twice
 * (Giraud, Langou and Rozloznik (2005), Computers and Mathematics with Applications 50, from
 * memory: "twice is enough"); returns the residual's norm.
 */
function residual(basis: Float64Array, rank: number, d: number, v: Float64Array): number {
  for (let pass = 0; pass < 2; pass++) {
    for (let q = 0; q < rank; q++) {
      let s = 0;
      for (let i = 0; i < d; i++) s += basis[q * d + i] * v[i];
      for (let i = 0; i < d; i++) v[i] -= s * basis[q * d + i];
    }
  }
  let norm = 0;
  for (let i = 0; i < d; i++) norm += v[i] * v[i];
  return Math.sqrt(norm);
}

/**
 * Adds v (overwritten) to the orthonormal rows basis[0..rank) and returns rank + 1 when its
 * residual exceeds sqrt(WALSH_MARGIN) of |v|; returns rank when the residual is below
 * SPAN_TOLERANCE of |v| (v in the span), and -1 in between (too close to call).
 */
function extend(basis: Float64Array, rank: number, d: number, v: Float64Array): number {
  const tol = SPAN_TOLERANCE; // locals: module bindings are getters under some loaders
  const clear = Math.sqrt(WALSH_MARGIN);
  let norm0 = 0;
  for (let i = 0; i < d; i++) norm0 += v[i] * v[i];
  norm0 = Math.sqrt(norm0);
  const norm = residual(basis, rank, d, v);
  if (!(norm > tol * norm0)) return rank;
  if (!(norm >= clear * norm0)) return -1;
  for (let i = 0; i < d; i++) basis[rank * d + i] = v[i] / norm;
  return rank + 1;
}


/**
 * -A^-1 (row-major a x a) by Gauss-Jordan elimination with partial pivoting (Golub and Van Loan,
 * section 3.4), or null when a pivot falls below SINGULAR_TOLERANCE of the largest entry.
 */
function negInverse(am: Float64Array, a: number): Float64Array | null {
  let scale = 0;
  for (let i = 0; i < a * a; i++) scale = Math.max(scale, Math.abs(am[i]));
  const tiny = SINGULAR_TOLERANCE * scale;
  const inv = new Float64Array(a * a);
  for (let i = 0; i < a; i++) inv[i * a + i] = -1;
  for (let c = 0; c < a; c++) {
    let piv = c;
    for (let r = c + 1; r < a; r++) if (Math.abs(am[r * a + c]) > Math.abs(am[piv * a + c])) piv = r;
    const pv = am[piv * a + c];
    if (!(Math.abs(pv) > tiny)) return null;
    if (piv !== c) {
      for (let q = 0; q < a; q++) {
        let t = am[c * a + q];
        am[c * a + q] = am[piv * a + q];
        am[piv * a + q] = t;
        t = inv[c * a + q];
        inv[c * a + q] = inv[piv * a + q];
        inv[piv * a + q] = t;
      }
    }
    for (let r = 0; r < a; r++) {
      if (r === c) continue;
      const f = am[r * a + c] / pv;
      if (f === 0) continue;
      for (let q = 0; q < a; q++) {
        am[r * a + q] -= f * am[c * a + q];
        inv[r * a + q] -= f * inv[c * a + q];
      }
    }
  }
  for (let c = 0; c < a; c++) {
    const pv = am[c * a + c];
    for (let q = 0; q < a; q++) inv[c * a + q] /= pv;
  }
  return inv;
}
