/**
 * Least squares for a complete, balanced two-level factorial by Yates' algorithm.
 * Applies when every factorial run sits exactly at +-1, every cell of the 2^k factorial holds
 * the same number r >= 1 of runs, every other run is a center run exactly at 0, and there are no
 * blocks. Then the model columns are mutually orthogonal and orthogonal to the intercept, so
 * X'X = diag(N, N_f, ..., N_f): intercept = mean of all runs, coefficient of term t =
 * contrast_t / N_f, sequential SS = N_f coef^2, leverage = 1/N + (p-1)/N_f at a factorial run and
 * 1/N at a center run. Source: Montgomery, Design and Analysis of Experiments, 8th ed.,
 * sections 6.5-6.8 (contrasts, effect estimates and sums of squares; center points).
 * Cost O(k 2^k + n). Returns null when the runs do not qualify.
 */
import type { Term } from '../model/term.ts';
import type { Column } from './columns.ts';
import type { LinearFit } from './linear-fit.ts';
import { walshHadamard } from './walsh-hadamard.ts';

/** Largest k for which the Yates path is used (2^20 cells); above it the QR path is taken. */
const MAX_YATES_FACTORS = 20;

/** Cell index of each run (bit i set when factor i is at -1), -1 for a center run, or null when the runs do not qualify. */
export function yatesCells(coded: readonly (readonly number[])[], k: number): Int32Array | null {
  if (k < 1 || k > MAX_YATES_FACTORS) return null;
  const n = coded.length;
  const cells = new Int32Array(n);
  const size = 1 << k;
  const counts = new Int32Array(size);
  let factorial = 0;
  for (let i = 0; i < n; i++) {
    const row = coded[i];
    let c = 0;
    let zeros = 0;
    for (let f = 0; f < k; f++) {
      const v = row[f];
      if (v === -1) c |= 1 << f;
      else if (v === 0) zeros++;
      else if (v !== 1) return null;
    }
    if (zeros === k) cells[i] = -1;
    else if (zeros === 0) {
      cells[i] = c;
      counts[c]++;
      factorial++;
    } else return null;
  }
  if (factorial === 0) return null;
  const r = counts[0];
  if (r === 0) return null;
  for (let c = 1; c < size; c++) if (counts[c] !== r) return null;
  return cells;
}

/* One-entry memo of (X'X)^-1 = diag(1/N, 1/N_f, ..., 1/N_f): it depends on the design's shape
 * only, and at p = 128 it is 130 KB to clear per fit. Shared between fits of one shape, so it is
 * read, never written, by everything downstream (as LinearFit and FittedModel are read-only). */
let memoCov = new Float64Array(0);
let memoN = 0;
let memoNf = 0;

function diagonalCovariance(n: number, nf: number, p: number): Float64Array {
  if (memoCov.length !== p * p || memoN !== n || memoNf !== nf) {
    const cov = new Float64Array(p * p);
    cov[0] = 1 / n;
    for (let j = 1; j < p; j++) cov[j * p + j] = 1 / nf;
    memoCov = cov;
    memoN = n;
    memoNf = nf;
  }
  return memoCov;
}

/* Two work buffers of 2^k cells (the totals, the fitted cell deviations), kept for the next fit of
 * the same k up to 2^12 cells and cleared on each use: a typed array's allocation costs more than
 * its clearing at these sizes. Nothing that leaves fitYates points into them. */
const buffers: Float64Array[] = [new Float64Array(0), new Float64Array(0)];
const KEEP_CELLS = 1 << 12;

function scratch(which: 0 | 1, size: number): Float64Array {
  if (size > KEEP_CELLS) return new Float64Array(size);
  let b = buffers[which];
  if (b.length !== size) buffers[which] = b = new Float64Array(size);
  else b.fill(0);
  return b;
}

export function fitYates(columns: readonly Column[], terms: readonly Term[], cells: Int32Array, k: number, y: ArrayLike<number>): LinearFit {
  const n = y.length;
  const size = 1 << k;
  const p = columns.length;
  const total = scratch(0, size);
  let sumAll = 0;
  let nf = 0;
  for (let i = 0; i < n; i++) {
    sumAll += y[i];
    if (cells[i] >= 0) {
      total[cells[i]] += y[i];
      nf++;
    }
  }
  const intercept = sumAll / n;
  walshHadamard(total); // total[t] is now the contrast of term t
  const coef = new Float64Array(p);
  const seqSS = new Float64Array(p);
  const covUnscaled = diagonalCovariance(n, nf, p);
  coef[0] = intercept;
  seqSS[0] = n * intercept * intercept;
  const model = scratch(1, size);
  for (let j = 0; j < terms.length; j++) {
    const b = total[terms[j]] / nf;
    coef[j + 1] = b;
    seqSS[j + 1] = nf * b * b;
    model[terms[j]] = b;
  }
  walshHadamard(model); // model[c] is now the fitted deviation from the intercept in cell c
  const fitted = new Float64Array(n);
  const residuals = new Float64Array(n);
  const leverage = new Float64Array(n);
  const hf = 1 / n + terms.length / nf;
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const c = cells[i];
    const fv = c >= 0 ? intercept + model[c] : intercept;
    fitted[i] = fv;
    const e = y[i] - fv;
    residuals[i] = e;
    rss += e * e;
    leverage[i] = c >= 0 ? hf : 1 / n;
  }
  const kept = new Int32Array(p);
  for (let j = 0; j < p; j++) kept[j] = j;
  return {
    n,
    columns,
    kept,
    coef,
    covUnscaled,
    seqSS,
    fitted,
    residuals,
    leverage,
    rss,
    dfResidual: n - p,
    aliased: [],
    orthogonal: true,
    method: 'yates',
  };
}
