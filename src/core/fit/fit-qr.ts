/**
 * Least squares by Householder QR with rank detection (see linalg/householder-qr.ts).
 * Coefficients b = R^-1 Q1'y; sequential sums of squares are the squares of the entries of Q'y
 * in model order; residuals Q (0, Q2'y); (X'X)^-1 = R^-1 R^-T; leverage h_i = x_i'(X'X)^-1 x_i.
 * Source: Golub and Van Loan, Matrix Computations, 4th ed., section 5.3 (the full-rank LS problem);
 * Seber and Lee, Linear Regression Analysis, 2nd ed., section 11.3 (QR for regression, sequential SS).
 * Cost O(n p^2). The part that does not depend on y (the factorisation, (X'X)^-1, the thin Q1,
 * leverage, aliases, orthogonality) is kept for the last few model matrices (matrix-memo.ts), so
 * another response on the same runs, or the same analysis again, costs O(n p) beyond it.
 */
import { ALIAS_WEIGHT_TOLERANCE, ORTHOGONALITY_TOLERANCE, RANK_TOLERANCE } from '../tolerance.ts';
import { applyQ, applyQt, householderQr, type QrFactor } from '../linalg/householder-qr.ts';
import { crossInverse, invertUpper, solveUpper, solveUpperRows, upperRows } from '../linalg/triangular.ts';
import { freshModelMatrix, matrixKey, modelMatrix, type Column } from './columns.ts';
import type { AliasedColumn, LinearFit } from './linear-fit.ts';
import { matrixMemo } from './matrix-memo.ts';

/** What a fit takes from the model matrix alone, shared by every response fitted to it (never modified). */
interface DesignPart {
  readonly f: QrFactor;
  /** R by rows, for the back substitution of each response (triangular.ts solveUpperRows). */
  readonly rRows: Float64Array;
  readonly covUnscaled: Float64Array;
  readonly leverage: Float64Array;
  readonly basis: Float64Array;
  readonly aliased: readonly AliasedColumn[];
  readonly orthogonal: boolean;
}

/** The last four model matrices' parts, for matrices up to 2^15 numbers (a 500-run, 65-column fit; a part holds about three times that). */
const designs = matrixMemo<DesignPart>(4, 1 << 15);
/** The same, found by the matrices' input (columns, settings, blocks) for fitQrOnSettings. */
const bySettings = matrixMemo<DesignPart>(4, 1 << 15);

/**
 * With `lean`, only the coefficients, sums of squares, residuals and aliases are computed
 * (leverage and (X'X)^-1 are left empty): what the saturated fit for Lenth's method needs.
 */
export function fitQr(columns: readonly Column[], x: Float64Array, y: ArrayLike<number>, lean = false, prefix?: QrFactor): LinearFit {
  const n = y.length;
  const p = columns.length;
  const tag = `${n}|${p}|${lean ? 'lean' : 'full'}`;
  const d = designs.recall(x, tag) ?? designs.keep(x, tag, (own) => designPart(own, n, p, lean, prefix));
  return responsePart(columns, d, y, lean);
}

/**
 * fitQr(columns, modelMatrix(columns, coded, blocks), y, lean, prefix), with the response-free
 * part kept by the matrix's input itself (columns.ts matrixKey): a fit found again builds no
 * matrix and compares n k + p numbers instead of n p. The same numbers as fitQr.
 */
export function fitQrOnSettings(
  columns: readonly Column[],
  coded: readonly (readonly number[])[],
  blocks: readonly number[] | null | undefined,
  y: ArrayLike<number>,
  lean = false,
  prefix?: QrFactor,
): LinearFit {
  const mk = matrixKey(columns, coded, blocks);
  if (!mk.kept) return fitQr(columns, modelMatrix(columns, coded, blocks), y, lean, prefix);
  const tag = `${mk.tag}|${lean ? 'lean' : 'full'}`;
  const d = bySettings.recall(mk.key, tag) ?? bySettings.keep(mk.key, tag, () => designPart(freshModelMatrix(columns, coded, blocks), y.length, columns.length, lean, prefix));
  return responsePart(columns, d, y, lean);
}

/** The fit of y on a factorised model: coefficients, sums of squares, residuals, and copies of the shared part. */
function responsePart(columns: readonly Column[], d: DesignPart, y: ArrayLike<number>, lean: boolean): LinearFit {
  const n = y.length;
  const f = d.f;
  const m = f.rank;
  const qty = new Float64Array(n); // a loop, not Float64Array.from: y is often a plain array, which from() iterates
  for (let i = 0; i < n; i++) qty[i] = y[i];
  applyQt(f, qty);
  const coef = new Float64Array(m);
  for (let k = 0; k < m; k++) coef[k] = qty[k];
  solveUpperRows(d.rRows, m, coef);
  const seqSS = new Float64Array(m);
  for (let k = 0; k < m; k++) seqSS[k] = qty[k] * qty[k];
  const z = new Float64Array(n);
  let rss = 0;
  for (let i = m; i < n; i++) {
    z[i] = qty[i];
    rss += qty[i] * qty[i];
  }
  // Square (rank = n, the saturated fit): Q (0) is 0 and y - 0 is y, the same bits without the pass.
  if (m < n) applyQ(f, z);
  const residuals = z;
  const fitted = new Float64Array(n);
  if (m < n) for (let i = 0; i < n; i++) fitted[i] = y[i] - residuals[i];
  else for (let i = 0; i < n; i++) fitted[i] = y[i];
  // Copies of the shared part, so that a caller may keep or change what it is given.
  const covUnscaled = new Float64Array(d.covUnscaled); // copies by the constructor: slice() looks up a species each time
  const leverage = new Float64Array(d.leverage);
  const basis = lean ? null : new Float64Array(d.basis);
  const aliased: AliasedColumn[] = [];
  for (const a of d.aliased) aliased.push({ column: a.column, combination: a.combination.map((w) => ({ column: w.column, weight: w.weight })) });
  const orthogonal = d.orthogonal;
  return {
    n,
    columns,
    kept: new Int32Array(f.kept),
    coef,
    covUnscaled,
    seqSS,
    fitted,
    residuals,
    leverage,
    ...(basis ? { basis } : {}),
    rss,
    dfResidual: n - m,
    aliased,
    orthogonal,
    method: 'qr',
    qr: f,
  };
}

/** The factorisation of x and what follows from it alone; `x` is the memo's own copy. */
function designPart(x: Float64Array, n: number, p: number, lean: boolean, prefix: QrFactor | undefined): DesignPart {
  // `prefix`: a factorisation of the first columns of x, reused when it matches (householder-qr.ts).
  const f = householderQr(x, n, p, RANK_TOLERANCE, prefix);
  const m = f.rank;
  const rinv = lean ? new Float64Array(0) : invertUpper(f.r, m);
  const covUnscaled = lean ? new Float64Array(0) : crossInverse(rinv, m);

  // Leverage h_i = || R^-T x_i ||^2 over the kept columns (Seber and Lee section 10.2): column a of
  // X R^-1 is sum_{k<=a} Rinv[k,a] x_(kept k), built for all runs at once, then squared into h.
  const leverage = new Float64Array(n);
  // The columns are kept: X R^-1 is the thin Q1, orthonormal columns spanning the model, which the
  // Box-Cox search reuses for every power of y (residual-ss.ts residualSsBasis).
  const basis = new Float64Array(lean ? 0 : n * m);
  for (let a = 0; a < m && !lean; a++) {
    const w = basis.subarray(a * n, (a + 1) * n);
    const ro = a * m;
    // Eight, four, then two columns per pass over w (each entry still adds them in the order k, k + 1, ...).
    let k = 0;
    for (; k + 7 <= a; k += 8) {
      const r0 = rinv[ro + k];
      const r1 = rinv[ro + k + 1];
      const r2 = rinv[ro + k + 2];
      const r3 = rinv[ro + k + 3];
      const r4 = rinv[ro + k + 4];
      const r5 = rinv[ro + k + 5];
      const r6 = rinv[ro + k + 6];
      const r7 = rinv[ro + k + 7];
      const x0 = f.kept[k] * n;
      const x1 = f.kept[k + 1] * n;
      const x2 = f.kept[k + 2] * n;
      const x3 = f.kept[k + 3] * n;
      const x4 = f.kept[k + 4] * n;
      const x5 = f.kept[k + 5] * n;
      const x6 = f.kept[k + 6] * n;
      const x7 = f.kept[k + 7] * n;
      for (let i = 0; i < n; i++) {
        w[i] = w[i] + r0 * x[x0 + i] + r1 * x[x1 + i] + r2 * x[x2 + i] + r3 * x[x3 + i] + r4 * x[x4 + i] + r5 * x[x5 + i] + r6 * x[x6 + i] + r7 * x[x7 + i];
      }
    }
    for (; k + 3 <= a; k += 4) {
      const r0 = rinv[ro + k];
      const r1 = rinv[ro + k + 1];
      const r2 = rinv[ro + k + 2];
      const r3 = rinv[ro + k + 3];
      const x0 = f.kept[k] * n;
      const x1 = f.kept[k + 1] * n;
      const x2 = f.kept[k + 2] * n;
      const x3 = f.kept[k + 3] * n;
      for (let i = 0; i < n; i++) w[i] = w[i] + r0 * x[x0 + i] + r1 * x[x1 + i] + r2 * x[x2 + i] + r3 * x[x3 + i];
    }
    for (; k + 1 <= a; k += 2) {
      const r0 = rinv[ro + k];
      const r1 = rinv[ro + k + 1];
      const x0 = f.kept[k] * n;
      const x1 = f.kept[k + 1] * n;
      for (let i = 0; i < n; i++) w[i] = w[i] + r0 * x[x0 + i] + r1 * x[x1 + i];
    }
    for (; k <= a; k++) {
      const r = rinv[ro + k];
      const xo = f.kept[k] * n;
      for (let i = 0; i < n; i++) w[i] += r * x[xo + i];
    }
    for (let i = 0; i < n; i++) leverage[i] += w[i] * w[i];
  }

  const aliased: AliasedColumn[] = [];
  for (let a = 0; a < f.aliased.length; a++) {
    const b = f.aliasedTop.slice(a * m, (a + 1) * m);
    solveUpper(f.r, m, b);
    const combination = [];
    for (let k = 0; k < m; k++) if (Math.abs(b[k]) > ALIAS_WEIGHT_TOLERANCE) combination.push({ column: f.kept[k], weight: b[k] });
    aliased.push({ column: f.aliased[a], combination });
  }

  // Orthogonal when R is diagonal up to rounding: |R_ij| small beside the column norms.
  let orthogonal = !lean;
  for (let j = 0; j < m && orthogonal; j++) {
    for (let i = 0; i < j; i++) {
      if (Math.abs(f.r[j * m + i]) > ORTHOGONALITY_TOLERANCE * Math.sqrt(Math.abs(f.r[i * m + i] * f.r[j * m + j]))) {
        orthogonal = false;
        break;
      }
    }
  }

  return { f, rRows: upperRows(f.r, m), covUnscaled, leverage, basis, aliased, orthogonal };
}
