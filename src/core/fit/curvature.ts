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
import { CENTER_TOLERANCE } from '../tolerance.ts';

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
  return coded.map((row) => {
    let center = true;
    let corner = true;
    for (let f = 0; f < factors.length; f++) {
      const v = row[f];
      const atCorner = Math.abs(Math.abs(v) - 1) <= CENTER_TOLERANCE;
      if (!atCorner) corner = false;
      if (factors[f].kind === 'numeric' ? Math.abs(v) > CENTER_TOLERANCE : !atCorner) center = false;
    }
    return corner ? 'factorial' : center ? 'center' : 'other';
  });
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
