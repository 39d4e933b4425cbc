/**
 * Variance inflation factors of the model's term columns: VIF_j = 1 / (1 - R_j^2), R_j^2 from
 * regressing column j on the other model columns and the intercept. Computed from the
 * factorisation the fit already has: with an intercept in the model, [(X'X)^-1]_jj =
 * 1 / (S_jj (1 - R_j^2)), S_jj the centred sum of squares of column j, so VIF_j = S_jj [(X'X)^-1]_jj.
 * Source: Montgomery, Peck and Vining, Introduction to Linear Regression Analysis, 5th ed.,
 * section 9.4 (variance inflation factors; VIF above 10 signals serious collinearity), from memory.
 * In an orthogonal two-level design every VIF is 1. Cost O(n p) beyond the fit, O(p) for a
 * factorisation whose VIFs were already worked out (kept with it).
 * Example: a complete 2^2 with center runs, terms A, B, AB -> VIFs [1, 1, 1].
 */
import { columnValue, blockLevels, modelMatrix, type Column } from './columns.ts';
import { fitQr } from './fit-qr.ts';
import type { LinearFit } from './linear-fit.ts';
import type { QrFactor } from '../linalg/householder-qr.ts';

/** A VIF above this names the term in a warning (Montgomery, Peck and Vining, 5th ed., section 9.4: common practice, from memory). */
export const VIF_LIMIT = 10;

/**
 * VIF of each kept column of `fit`, in kept order: null for the intercept and block columns and
 * for a constant column (S_jj = 0, VIF undefined). `coded` and `blocks` are the settings the fit
 * used. Throws nothing.
 */
export function columnVifs(fit: LinearFit, coded: readonly (readonly number[])[], blocks: readonly number[] | null): (number | null)[] {
  const m = fit.kept.length;
  const n = coded.length;
  const levels = blockLevels(blocks);
  const last = levels[levels.length - 1];
  const out: (number | null)[] = [];
  // On Yates' path the columns are orthogonal and balanced: S_jj = N_f and (X'X)^-1_jj = 1 / N_f, so every VIF is 1.
  if (fit.method === 'yates') {
    for (let a = 0; a < m; a++) out.push(fit.columns[fit.kept[a]].kind === 'term' ? 1 : null);
    return out;
  }
  const value = columnValue; // a local: module bindings are getters under some loaders
  // The factorised matrix holds the kept columns' values already (the same numbers: columns.ts).
  const qr = fit.qr;
  const x = qr && qr.n === n && qr.x.length === n * qr.p && qr.rank === m ? qr.x : null;
  // Then the VIFs follow from the factorisation alone (its matrix and (X'X)^-1, which fit-qr.ts
  // keeps with it): a factorisation found again (matrix-memo.ts) gives its VIFs again.
  let kinds = '';
  for (let a = 0; a < m; a++) kinds += fit.columns[fit.kept[a]].kind === 'term' ? 't' : 'o';
  const known = x ? byFactor.get(qr!) : undefined;
  if (known && known.kinds === kinds && known.n === n && sameDiagonal(known.diag, fit.covUnscaled, m)) return known.vifs.slice();
  const v = new Float64Array(n);
  for (let a = 0; a < m; a++) {
    const c = fit.columns[fit.kept[a]];
    if (c.kind !== 'term' || fit.covUnscaled.length === 0) {
      out.push(null);
      continue;
    }
    let mean = 0;
    if (x) for (let i = 0, o = qr!.kept[a] * n; i < n; i++) mean += v[i] = x[o + i];
    else for (let i = 0; i < n; i++) mean += v[i] = value(c, coded[i], blocks?.[i], last);
    mean /= n;
    let s = 0;
    for (let i = 0; i < n; i++) s += (v[i] - mean) ** 2;
    const vif = s * fit.covUnscaled[a * m + a];
    out.push(s > 0 && Number.isFinite(vif) ? vif : null);
  }
  if (x) {
    const diag = new Float64Array(fit.covUnscaled.length === m * m ? m : 0);
    for (let a = 0; a < diag.length; a++) diag[a] = fit.covUnscaled[a * m + a];
    byFactor.set(qr!, { kinds, n, diag, vifs: out.slice() });
  }
  return out;
}

/** The VIFs last worked out from each factorisation, with what else they were read from (held weakly). */
const byFactor = new WeakMap<QrFactor, { kinds: string; n: number; diag: Float64Array; vifs: (number | null)[] }>();

/** Whether the diagonal of cov (m x m, or empty) is `diag`, entry for entry (Object.is, written out). */
function sameDiagonal(diag: Float64Array, cov: Float64Array, m: number): boolean {
  if (diag.length !== (cov.length === m * m ? m : 0)) return false;
  for (let a = 0; a < diag.length; a++) {
    const u = diag[a];
    const v = cov[a * m + a];
    if (u === v ? u === 0 && 1 / u !== 1 / v : u === u || v === v) return false;
  }
  return true;
}

/**
 * The runs whose removal lowers the VIF of kept column `a` the most, up to `count`, largest drop
 * first: each run is left out in turn and the VIF refitted (Householder QR of n - 1 rows).
 * Runs whose removal loses a column or does not lower the VIF are not named.
 * Cost O(n^2 p^2). Example: in a 2^(4-1) where one run's power was logged far off its level,
 * that run comes first.
 */
export function vifDrivers(columns: readonly Column[], coded: readonly (readonly number[])[], blocks: readonly number[] | null, y: readonly number[], a: number, labels: readonly string[], count = 3): string[] {
  const full = columnVifs(fitQr(columns, modelMatrix(columns, coded, blocks), y), coded, blocks)[a];
  if (full === null) return [];
  const drops: { label: string; drop: number }[] = [];
  for (let i = 0; i < coded.length; i++) {
    const c2 = coded.filter((_, r) => r !== i);
    const b2 = blocks ? blocks.filter((_, r) => r !== i) : null;
    const y2 = y.filter((_, r) => r !== i);
    const fit = fitQr(columns, modelMatrix(columns, c2, b2), y2);
    if (fit.kept.length !== columns.length) continue;
    const v = columnVifs(fit, c2, b2)[a];
    if (v !== null && v < full) drops.push({ label: labels[i], drop: full - v });
  }
  return drops.sort((p, q) => q.drop - p.drop).slice(0, count).map((d) => d.label);
}
