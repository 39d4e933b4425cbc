/**
 * Curvature test from center points: the mean of the factorial runs minus the mean of the center
 * runs estimates the sum of the pure quadratic coefficients; its standard error is
 * sqrt(MS_pe (1/n_F + 1/n_C)), tested by t with the pure-error degrees of freedom; the single-df
 * sum of squares is n_F n_C (ybar_F - ybar_C)^2 / (n_F + n_C).
 * Source: Montgomery, Design and Analysis of Experiments, 8th ed., section 6.8 (Eq. 6.30);
 * NIST/SEMATECH e-Handbook of Statistical Methods, section 5.3.3.6 (center points).
 * A run is a center run when every numeric factor is within CENTER_TOLERANCE of 0 coded, and a
 * factorial run when every factor is within it of -1 or +1 (categorical factors are at +-1 in both).
 */
import { tTwoSidedP } from '../dist/student-t.ts';
import type { Factor } from '../factor/factor.ts';
import { isSquare } from '../model/term.ts';
import { CENTER_TOLERANCE } from '../tolerance.ts';
import { modelMatrix, type Column } from './columns.ts';
import { fitQr } from './fit-qr.ts';

export interface Curvature {
  readonly estimate: number;
  readonly se: number | null;
  readonly t: number | null;
  readonly p: number | null;
  readonly ss: number;
  readonly nFactorial: number;
  readonly nCenter: number;
}

/** Each run's kind by its actual settings: 'factorial', 'center' or 'other'. */
export function runKinds(factors: readonly Factor[], coded: readonly (readonly number[])[]): ('factorial' | 'center' | 'other')[] {
  const tol = CENTER_TOLERANCE; // a local: module bindings are getters under some loaders
  const k = factors.length;
  const numeric = new Uint8Array(k);
  for (let f = 0; f < k; f++) numeric[f] = factors[f].kind === 'numeric' ? 1 : 0;
  const out: ('factorial' | 'center' | 'other')[] = [];
  for (let i = 0; i < coded.length; i++) {
    const row = coded[i];
    let center = true;
    let corner = true;
    for (let f = 0; f < k && (center || corner); f++) {
      const v = row[f];
      const atCorner = Math.abs(Math.abs(v) - 1) <= tol;
      if (!atCorner) corner = false;
      if (numeric[f] ? Math.abs(v) > tol : !atCorner) center = false;
    }
    out.push(corner ? 'factorial' : center ? 'center' : 'other');
  }
  return out;
}

/**
 * runKinds for runs on Yates' path (fit-yates.ts yatesCells: each run exactly at +-1 in every
 * factor, or exactly at 0 in every factor, cell -1): 'factorial' and 'center' by the cell, with no
 * pass over the settings. A categorical factor is never at 0, so with one the center cells are
 * 'other', as runKinds has it.
 */
export function cellKinds(factors: readonly Factor[], cells: Int32Array): ('factorial' | 'center' | 'other')[] {
  const center = factors.every((f) => f.kind === 'numeric') ? 'center' : 'other';
  const out: ('factorial' | 'center' | 'other')[] = [];
  for (let i = 0; i < cells.length; i++) out.push(cells[i] < 0 ? center : 'factorial');
  return out;
}

/** Null when there are no center runs or no factorial runs. */
export function curvature(
  kinds: readonly ('factorial' | 'center' | 'other')[],
  y: ArrayLike<number>,
  pure: { ss: number; df: number },
): Curvature | null {
  let sf = 0;
  let nf = 0;
  let sc = 0;
  let nc = 0;
  for (let i = 0; i < kinds.length; i++) {
    if (kinds[i] === 'factorial') (sf += y[i]), nf++;
    else if (kinds[i] === 'center') (sc += y[i]), nc++;
  }
  if (nf === 0 || nc === 0) return null;
  const estimate = sf / nf - sc / nc;
  const ss = (nf * nc * estimate * estimate) / (nf + nc);
  if (pure.df <= 0) return { estimate, se: null, t: null, p: null, ss, nFactorial: nf, nCenter: nc };
  const se = Math.sqrt((pure.ss / pure.df) * (1 / nf + 1 / nc));
  if (se === 0) return { estimate, se, t: null, p: null, ss, nFactorial: nf, nCenter: nc };
  const t = estimate / se;
  return { estimate, se, t, p: tTwoSidedP(t, pure.df), ss, nFactorial: nf, nCenter: nc };
}

/**
 * Curvature adjusted for the model, in regression form: the model's estimable columns
 * (intercept, blocks, terms; squares left out, since they would absorb the very contrast tested)
 * on the ACTUAL settings, plus a column z that is 1 at a center run (every numeric factor at its
 * nominal 0) and 0 elsewhere, fitted in a side fit used for this test only. The curvature
 * estimate is minus z's coefficient, se = sqrt(MS_pe [(X'X)^-1]_zz), t = estimate / se on the
 * pure-error df, and the single-df sum of squares estimate^2 / [(X'X)^-1]_zz. Lost runs and
 * center runs unbalanced across a categorical factor or blocks then no longer bias it; in a
 * complete balanced design it equals ybar_F - ybar_C with se sqrt(MS_pe (1/n_F + 1/n_C)), as in
 * Montgomery, Design and Analysis of Experiments, 8th ed., section 6.8 (Eq. 6.30). Testing one
 * added indicator column by its t is the extra-sum-of-squares principle (common practice; Draper
 * and Smith, Applied Regression Analysis, 3rd ed., chapter 6, from memory).
 * Falls back to the mean difference (curvature above) when z cannot be separated from the model.
 * Cost: one QR of n x (p + 1), O(n p^2). Null when there are no center runs or no factorial runs.
 * Example: the 2^2 with five center points (Montgomery 8th ed., section 6.8) -> estimate -0.035,
 * p 0.8137, the same as the mean difference.
 */
export function adjustedCurvature(
  columns: readonly Column[],
  coded: readonly (readonly number[])[],
  blocks: readonly number[] | null,
  kinds: readonly ('factorial' | 'center' | 'other')[],
  y: readonly number[],
  pure: { ss: number; df: number },
): Curvature | null {
  const plain = curvature(kinds, y, pure);
  if (!plain) return null;
  const n = y.length;
  const side = columns.filter((c) => c.kind !== 'term' || !isSquare(c.term));
  const p = side.length;
  const x = new Float64Array(n * (p + 1));
  x.set(modelMatrix(side, coded, blocks));
  for (let i = 0; i < n; i++) x[p * n + i] = kinds[i] === 'center' ? 1 : 0;
  const fit = fitQr([...side, { kind: 'term', term: 0 }], x, y);
  const m = fit.kept.length;
  if (m === 0 || fit.kept[m - 1] !== p) return plain; // z is a combination of the model's columns
  const czz = fit.covUnscaled[(m - 1) * m + (m - 1)];
  const estimate = -fit.coef[m - 1];
  const ss = (estimate * estimate) / czz;
  const base = { estimate, ss, nFactorial: plain.nFactorial, nCenter: plain.nCenter };
  if (pure.df <= 0) return { ...base, se: null, t: null, p: null };
  const se = Math.sqrt((pure.ss / pure.df) * czz);
  if (se === 0) return { ...base, se, t: null, p: null };
  const t = estimate / se;
  return { ...base, se, t, p: tTwoSidedP(t, pure.df) };
}
