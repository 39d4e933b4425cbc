/**
 * The residual sum of squares of any response on a model that is already factorised, for steps
 * that refit the same columns to many responses (the Box-Cox search: only the response changes).
 * Two forms, the same number:
 * - from a Householder factorisation: RSS(w) = || (Q'w)[rank..n) ||^2 (Golub and Van Loan,
 *   Matrix Computations, 4th ed., section 5.3.3); O(n rank) per response, no allocation;
 * - for a complete balanced two-level factorial on Yates' path (fit-yates.ts): with n runs, N_f
 *   factorial runs, cell totals T_c and contrasts C_t (their Walsh-Hadamard transform),
 *   RSS(w) = sum w_i^2 - n wbar^2 - sum_{t in model} C_t^2 / N_f (the sums of squares of
 *   Montgomery, Design and Analysis of Experiments, 8th ed., section 6.6); O(n + k 2^k) per
 *   response. Computed about the mean (w_i - wbar) so that a large common part cancels exactly.
 * `ss` may overwrite its argument. Example: residualSsYates on the 2^2 yield data of Montgomery
 * 8th ed. section 6.2 with terms A, B, AB -> the error sum of squares 31.33 (printed 31.34).
 */
import type { Term } from '../model/term.ts';
import { applyQt, type QrFactor } from '../linalg/householder-qr.ts';
import { walshHadamard } from './walsh-hadamard.ts';

export interface ResidualSs {
  readonly n: number;
  /** Residual degrees of freedom. */
  readonly df: number;
  /** RSS of `w` (length n) on the model; `w` may be overwritten. */
  ss(w: Float64Array): number;
}

export function residualSsQr(f: QrFactor): ResidualSs {
  const { n, rank } = f;
  return {
    n,
    df: n - rank,
    ss(w) {
      applyQt(f, w);
      let s = 0;
      for (let i = rank; i < n; i++) s += w[i] * w[i];
      return s;
    },
  };
}

/** `cells`: each run's Yates cell, -1 for a center run (fit-yates.ts yatesCells); `terms` the model's. */
export function residualSsYates(cells: Int32Array, k: number, terms: readonly Term[]): ResidualSs {
  const n = cells.length;
  const size = 1 << k;
  const total = new Float64Array(size);
  let nf = 0;
  for (let i = 0; i < n; i++) if (cells[i] >= 0) nf++;
  const list = Int32Array.from(terms);
  return {
    n,
    df: n - 1 - list.length,
    ss(w) {
      let mean = 0;
      for (let i = 0; i < n; i++) mean += w[i];
      mean /= n;
      total.fill(0);
      let s = 0;
      for (let i = 0; i < n; i++) {
        const d = w[i] - mean;
        s += d * d;
        const c = cells[i];
        if (c >= 0) total[c] += d;
      }
      walshHadamard(total);
      let model = 0;
      for (let j = 0; j < list.length; j++) model += total[list[j]] * total[list[j]];
      return Math.max(0, s - model / nf);
    },
  };
}
