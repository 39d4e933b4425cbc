/**
 * The interval arithmetic of a least-squares fit, in one place: for a linear combination x0'b of
 * the coefficients (a fitted value, or one coefficient when x0 picks it out) with variance factor
 * q = x0'(X'X)^-1 x0,
 *   se = sigma sqrt(q),
 *   confidence interval (the mean response, or the coefficient): x0'b +- t se,
 *   prediction interval (one new run): x0'b +- t sigma sqrt(1 + q),
 * with t the upper (1 - level)/2 quantile of Student's t on the residual degrees of freedom.
 * Source: Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6, Eqs.
 * 10.38-10.41 (coefficient intervals, the mean response, a new observation; the first equation
 * number from memory).
 */
import { InputError } from '../errors.ts';

/** Standard error and the two intervals of x0'b; null where sigma is unknown (no residual df). */
export interface FitIntervals {
  se: number | null;
  ciLo: number | null;
  ciHi: number | null;
  piLo: number | null;
  piHi: number | null;
}

/**
 * Fills (or creates) the standard error, confidence interval and prediction interval of the
 * value `center` = x0'b whose variance factor is q = x0'(X'X)^-1 x0, with the residual standard
 * deviation sigma and the t quantile t (see the file comment for the formulas and source).
 * A q below 0 (rounding in a nearly exact fit) counts as 0. When sigma or t is null every field
 * is null. Cost O(1); allocates nothing when `out` is given.
 * Throws InputError for a q that is not a finite number, or a sigma or t below 0.
 * Example: tIntervals(10, 0.25, 2, 2.306) -> se 1, ci [7.694, 12.306], pi 10 +- 2.306 x 2 x
 * sqrt(1.25) = [4.844, 15.156].
 */
export function tIntervals<T extends FitIntervals>(center: number, q: number, sigma: number | null, t: number | null, out?: T): T {
  const r = (out ?? { se: null, ciLo: null, ciHi: null, piLo: null, piHi: null }) as T;
  if (!Number.isFinite(q)) throw new InputError(`A variance factor must be a finite number, got ${q}`);
  if (sigma === null || t === null) {
    r.se = r.ciLo = r.ciHi = r.piLo = r.piHi = null;
    return r;
  }
  if (!(sigma >= 0) || !(t >= 0)) throw new InputError(`Sigma and the t quantile must be 0 or more, got ${sigma} and ${t}`);
  const qq = q > 0 ? q : 0;
  const se = sigma * Math.sqrt(qq);
  const half = t * se;
  const halfPi = t * sigma * Math.sqrt(1 + qq);
  r.se = se;
  r.ciLo = center - half;
  r.ciHi = center + half;
  r.piLo = center - halfPi;
  r.piHi = center + halfPi;
  return r;
}
