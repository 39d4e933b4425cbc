/**
 * The residual sum of squares of any response on a model that is already factorised, for steps
 * that refit the same columns to many responses (the Box-Cox search: only the response changes).
 * Three forms, the same number:
 * - from a Householder factorisation: RSS(w) = || (Q'w)[rank..n) ||^2 (Golub and Van Loan,
 *   Matrix Computations, 4th ed., section 5.3.3); O(n rank) per response, no allocation;
 * - for a complete balanced two-level factorial on Yates' path (fit-yates.ts): with n runs, N_f
 *   factorial runs, cell totals T_c and contrasts C_t (their Walsh-Hadamard transform),
 *   RSS(w) = sum w_i^2 - n wbar^2 - sum_{t in model} C_t^2 / N_f (the sums of squares of
 *   Montgomery, Design and Analysis of Experiments, 8th ed., section 6.6); O(n + k 2^k) per
 *   response. Computed about the first run's value so that a large common part cancels exactly.
 * - from the thin Q1 of the model (n x rank, orthonormal columns: fit-qr.ts keeps X R^-1):
 *   RSS(w) = ||w||^2 - ||Q1'w||^2, O(n rank) per response with half the work of the reflectors;
 *   computed about the first run's value, which the intercept's column absorbs (the model must
 *   hold the intercept, as every model here does), so that a large common part cancels exactly.
 * `cross(a, b)` gives a'Ma and a'Mb together (M the residual projector, symmetric), the two sums the
 * Box-Cox search needs for the likelihood and its slope; one pass serves both. When the model holds
 * every cell contrast of the factorial (a full model), the model part is all but the mean's by
 * Parseval's identity for the Walsh-Hadamard transform (sum_t A_t B_t = 2^k sum_c a_c b_c), so no
 * transform is needed.
 * `cross` may overwrite its arguments; `residualSs` gives one response's RSS from it. Example:
 * residualSs(residualSsYates(...), y) on the 2^2 yield data of Montgomery 8th ed. section 6.2
 * with terms A, B, AB -> the error sum of squares 31.33 (printed 31.34).
 */
import type { Term } from '../model/term.ts';
import type { QrFactor } from '../linalg/householder-qr.ts';
import { walshHadamard } from './walsh-hadamard.ts';

export interface ResidualSs {
  readonly n: number;
  /** Residual degrees of freedom. */
  readonly df: number;
  /** out[0] = a'Ma, out[1] = a'Mb (M the residual projector); `a` and `b` may be overwritten. */
  cross(a: Float64Array, b: Float64Array, out: Float64Array): void;
}

/** The RSS of one response `w` on the model (copied; `w` is left as it is). */
export function residualSs(form: ResidualSs, w: ArrayLike<number>): number {
  const out = new Float64Array(2);
  form.cross(Float64Array.from(w), Float64Array.from(w), out);
  return out[0];
}

export function residualSsQr(f: QrFactor): ResidualSs {
  const { n, rank } = f;
  return {
    n,
    df: n - rank,
    cross(a, b, out) {
      // Q'a and Q'b in one pass over each reflector (householder-qr.ts applyQt, twice over).
      const { v, beta } = f;
      for (let k = 0; k < rank; k++) {
        const vo = k * n;
        let sa = 0;
        let sb = 0;
        for (let i = k; i < n; i++) {
          const vi = v[vo + i];
          sa += vi * a[i];
          sb += vi * b[i];
        }
        sa *= beta[k];
        sb *= beta[k];
        for (let i = k; i < n; i++) {
          const vi = v[vo + i];
          a[i] -= sa * vi;
          b[i] -= sb * vi;
        }
      }
      let aa = 0;
      let ab = 0;
      for (let i = rank; i < n; i++) {
        aa += a[i] * a[i];
        ab += a[i] * b[i];
      }
      out[0] = aa;
      out[1] = ab;
    },
  };
}

/** `basis`: Q1, column-major n x rank, the model's span including the intercept (see above). */
export function residualSsBasis(basis: Float64Array, n: number, rank: number): ResidualSs {
  return {
    n,
    df: n - rank,
    cross: (a, b, out) => basisCross(basis, n, rank, a, b, out),
  };
}

/** `cells`: each run's Yates cell, -1 for a center run (fit-yates.ts yatesCells); `terms` the model's. */
export function residualSsYates(cells: Int32Array, k: number, terms: ArrayLike<Term>): ResidualSs {
  const n = cells.length;
  const size = 1 << k;
  const total = new Float64Array(size);
  let nf = 0;
  for (let i = 0; i < n; i++) if (cells[i] >= 0) nf++;
  const list = Int32Array.from(terms);
  const totalB = new Float64Array(size);
  // Every contrast but the mean's in the model: the model part needs no transform (Parseval).
  const seen = new Uint8Array(size);
  let distinct = 0;
  for (let j = 0; j < list.length; j++) {
    const t = list[j];
    if (t > 0 && t < size && seen[t] === 0) {
      seen[t] = 1;
      distinct++;
    }
  }
  const everyContrast = distinct === size - 1;
  return {
    n,
    df: n - 1 - list.length,
    cross(a, b, out) {
      // One pass, about the first run's values (a shift changes no contrast but the mean's, and
      // the sums of squares about the mean follow from the shifted sums: Chan, Golub and LeVeque
      // 1983, The American Statistician 37, 242-247, the shifted-data algorithm).
      const a0 = a[0];
      const b0 = b[0];
      total.fill(0);
      totalB.fill(0);
      let sa = 0;
      let sb = 0;
      let aa = 0;
      let ab = 0;
      for (let i = 0; i < n; i++) {
        const da = a[i] - a0;
        const db = b[i] - b0;
        sa += da;
        sb += db;
        aa += da * da;
        ab += da * db;
        const c = cells[i];
        if (c >= 0) {
          total[c] += da;
          totalB[c] += db;
        }
      }
      aa -= (sa * sa) / n;
      ab -= (sa * sb) / n;
      let modelAa = 0;
      let modelAb = 0;
      if (everyContrast) {
        let ta = 0;
        let tb = 0;
        for (let c = 0; c < size; c++) {
          modelAa += total[c] * total[c];
          modelAb += total[c] * totalB[c];
          ta += total[c];
          tb += totalB[c];
        }
        modelAa = size * modelAa - ta * ta;
        modelAb = size * modelAb - ta * tb;
      } else {
        walshHadamard(total);
        walshHadamard(totalB);
        for (let j = 0; j < list.length; j++) {
          modelAa += total[list[j]] * total[list[j]];
          modelAb += total[list[j]] * totalB[list[j]];
        }
      }
      out[0] = Math.max(0, aa - modelAa / nf);
      out[1] = ab - modelAb / nf;
    },
  };
}

/** The thin-Q1 form's cross: ||d||^2 - ||Q1'd||^2 and d'e - (Q1'd)'(Q1'e), d and e shifted by their first entries. */
function basisCross(basis: Float64Array, n: number, rank: number, a: Float64Array, b: Float64Array, out: Float64Array): void {
  const a0 = a[0];
  const b0 = b[0];
  let aa = 0;
  let ab = 0;
  for (let i = 0; i < n; i++) {
    const da = (a[i] -= a0);
    aa += da * da;
    ab += da * (b[i] -= b0);
  }
  // Four columns per pass over a and b; each column's sums still run over i in order, and they
  // are taken off aa and ab in column order, so the result is the same bits as one at a time.
  let j = 0;
  for (; j + 4 <= rank; j += 4) {
    const o0 = j * n;
    const o1 = o0 + n;
    const o2 = o1 + n;
    const o3 = o2 + n;
    let pa0 = 0;
    let pb0 = 0;
    let pa1 = 0;
    let pb1 = 0;
    let pa2 = 0;
    let pb2 = 0;
    let pa3 = 0;
    let pb3 = 0;
    for (let i = 0; i < n; i++) {
      const ai = a[i];
      const bi = b[i];
      const q0 = basis[o0 + i];
      const q1 = basis[o1 + i];
      const q2 = basis[o2 + i];
      const q3 = basis[o3 + i];
      pa0 += q0 * ai;
      pb0 += q0 * bi;
      pa1 += q1 * ai;
      pb1 += q1 * bi;
      pa2 += q2 * ai;
      pb2 += q2 * bi;
      pa3 += q3 * ai;
      pb3 += q3 * bi;
    }
    aa -= pa0 * pa0;
    ab -= pa0 * pb0;
    aa -= pa1 * pa1;
    ab -= pa1 * pb1;
    aa -= pa2 * pa2;
    ab -= pa2 * pb2;
    aa -= pa3 * pa3;
    ab -= pa3 * pb3;
  }
  for (; j < rank; j++) {
    const o = j * n;
    let pa = 0;
    let pb = 0;
    for (let i = 0; i < n; i++) {
      const q = basis[o + i];
      pa += q * a[i];
      pb += q * b[i];
    }
    aa -= pa * pa;
    ab -= pa * pb;
  }
  out[0] = Math.max(0, aa);
  out[1] = ab;
}
