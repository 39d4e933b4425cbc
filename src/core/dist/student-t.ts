/**
 * Student's t distribution with real (not only whole) degrees of freedom df > 0, through the
 * regularized incomplete beta function:
 *   P(|T| >= |t|) = I_x(df/2, 1/2) with x = df / (df + t^2)          (Abramowitz & Stegun 26.7.1,
 *   P(|T| <  |t|) = I_y(1/2, df/2) with y = t^2 / (df + t^2)           26.5.27; symmetry 26.5.2)
 * x and y are both formed as ratios, never as 1 minus the other, so tiny tails keep their
 * relative accuracy. For very large df the distribution tends to the standard normal and the
 * same formulas still hold (the incomplete beta is accurate for shapes up to 1e7 and beyond).
 */
import { InputError } from '../errors.ts';
import { incompleteBetaInverseOdds, incompleteBetaXY } from './incomplete-beta.ts';
import { lnBeta } from './log-gamma.ts';
import { normalQuantile } from './normal.ts';
import { TAIL_SERIES_ODDS } from '../tolerance.ts';

// A local: module bindings are getters under some loaders, and this runs once per p-value.
const betaXY = incompleteBetaXY;

/** Below x = e^-600 the tail I_x(a, 1/2) is its first series term x^a / (a B(a, 1/2)) to rounding. */
const LN_X_ASYMPTOTE = -600;

function checkDf(df: number, what: string): void {
  if (!(df > 0) || df === Infinity) {
    throw new InputError(`${what} needs degrees of freedom that are a finite number greater than 0, got ${df}`);
  }
}

/** P(|T| >= at) for at >= 0 (validated inputs). */
function twoSided(at: number, df: number): number {
  if (at === 0) return 1;
  if (at === Infinity) return 0;
  const a = 0.5 * df;
  const sd = Math.sqrt(df);
  if (at <= sd) {
    const r = (at * at) / df;
    return betaXY(1 / (1 + r), r / (1 + r), a, 0.5);
  }
  const w = df / at / at;
  if (w < TAIL_SERIES_ODDS) {
    // x ~ w: the tail series I_x(a, 1/2) = x^a / (a B) (1 + O(x)) in logs, so nothing underflows.
    const lnW = Math.log(df) - 2 * Math.log(at);
    if (lnW < LN_X_ASYMPTOTE) return Math.exp(a * lnW - Math.log(a) - lnBeta(a, 0.5));
  }
  return betaXY(w / (1 + w), 1 / (1 + w), a, 0.5);
}

/**
 * Two-sided tail probability P(|T| >= |t|) of Student's t with df degrees of freedom (the
 * p-value of a two-sided t test).
 *
 * Method: I_x(df/2, 1/2) with x = df/(df + t^2) and 1 - x = t^2/(df + t^2) both formed as
 * ratios (Abramowitz & Stegun 26.7.1 with 26.5.27), by the incomplete beta continued fraction
 * (Numerical Recipes 3rd ed. section 6.4). No 1 - cdf anywhere, so p-values like 1e-15 or 1e-200
 * keep about 14 correct digits; beyond |t| ~ 2e130 sqrt(df) the first term of the tail series is
 * used in logarithms.
 * Cost: one incomplete beta evaluation (a few microseconds at most); no allocation.
 * Throws InputError when t is NaN or df is not a finite number > 0. t = +-Infinity gives 0.
 * Example: tTwoSidedP(2.228138851986274, 10) -> 0.05; tTwoSidedP(1, 1) -> 0.5 (both to 1e-15).
 */
export function tTwoSidedP(t: number, df: number): number {
  if (Number.isNaN(t)) throw new InputError('tTwoSidedP needs a t value, got NaN');
  checkDf(df, 'tTwoSidedP');
  return twoSided(Math.abs(t), df);
}

/**
 * Cumulative probability P(T <= t) of Student's t with df degrees of freedom.
 *
 * Method: P(T <= t) = P(|T| >= |t|) / 2 for t <= 0 and 1 - P(|T| >= t) / 2 for t > 0, the tail
 * from tTwoSidedP (incomplete beta, Abramowitz & Stegun 26.7.1). The lower tail is accurate to
 * ~1e-14 relative however small; for the upper tail of a large t use tCdf(-t) = 1 - tCdf(t).
 * Cost: one incomplete beta evaluation; no allocation.
 * Throws InputError when t is NaN or df is not a finite number > 0.
 * Example: tCdf(2.228138851986274, 10) -> 0.975; tCdf(0, 3) -> 0.5; tCdf(-1, 1) -> 0.25 (to 1e-15).
 */
export function tCdf(t: number, df: number): number {
  if (Number.isNaN(t)) throw new InputError('tCdf needs a t value, got NaN');
  checkDf(df, 'tCdf');
  const tail = 0.5 * twoSided(Math.abs(t), df);
  return t <= 0 ? tail : 1 - tail;
}

/**
 * Quantile of Student's t: the t with P(T <= t) = p, for 0 < p < 1 and real df > 0.
 *
 * Method: with q = min(p, 1 - p) (exact in floating point), solve on Beta(1/2, df/2) in the odds
 * rho = t^2/df: for |p - 1/2| < 1/4 the central probability I_y(1/2, df/2) = 2 |p - 1/2|, else
 * the tail 1 - I_y(1/2, df/2) = 2 q, both by safeguarded Newton iteration in ln rho
 * (incompleteBetaInverseOdds); t = sqrt(df rho) with the sign of p - 1/2. Start: the tail
 * asymptote t ~ sqrt(df) (q df B(df/2, 1/2))^(-1/df) when it puts t^2 well above df (as in Hill
 * 1970, Algorithm 396), else the Cornish-Fisher expansion in the normal quantile
 * (Abramowitz & Stegun 26.7.5, terms to df^-3). Far tails (t^2/df > e^600) come from the
 * asymptote directly, where it is exact to rounding.
 * Accuracy (measured against 50-digit references): within 7e-14 relative for df from 0.5 to 1e7
 * and p from 1e-100 to 1 - 1e-10. With df < 1 and a tiny p the quantile, about p^(-1/df), can
 * pass the largest double; it is then returned as -Infinity (or +Infinity).
 * Cost: typically 3 to 5 incomplete beta evaluations (none for the same p and df as the call before); no allocation.
 * Throws InputError unless 0 < p < 1 and df is a finite number > 0.
 * Example: tQuantile(0.975, 10) -> 2.22813885198627; tQuantile(0.75, 1) -> 1 (Cauchy quartile, to 1e-15).
 */
export function tQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) {
    throw new InputError(`tQuantile needs a probability strictly between 0 and 1, got ${p}`);
  }
  checkDf(df, 'tQuantile');
  // One-entry memo: an analysis asks for the same quantile (1 - alpha/2 on the residual df) each
  // time it is refitted; plain numbers, the value the search below returns for them.
  if (p === memoP && df === memoDf) return memoQ;
  const q = quantileSearch(p, df);
  memoP = p;
  memoDf = df;
  memoQ = q;
  return q;
}

let memoP = NaN;
let memoDf = NaN;
let memoQ = NaN;

/** tQuantile for validated p and df (see there). */
function quantileSearch(p: number, df: number): number {
  if (p === 0.5) return 0;
  const sign = p < 0.5 ? -1 : 1;
  const q = p < 0.5 ? p : 1 - p;
  const a = 0.5 * df;
  const lnB = lnBeta(0.5, a);
  // Tail asymptote: P(|T| >= t) ~ (df/t^2)^a / (a B), i.e. ln(t^2/df) = -(ln(2 q a) + ln B) / a.
  const lnRhoTail = -(Math.log(2 * a) + Math.log(q) + lnB) / a;
  if (lnRhoTail > -LN_X_ASYMPTOTE) return sign * Math.exp(0.5 * (Math.log(df) + lnRhoTail));
  let t0: number;
  if (Math.exp(-lnRhoTail) < 0.05 + 1 / df) {
    t0 = Math.exp(0.5 * (Math.log(df) + lnRhoTail));
  } else {
    const z = -normalQuantile(q);
    const z2 = z * z;
    t0 =
      z +
      (z * (z2 + 1)) / (4 * df) +
      (z * ((5 * z2 + 16) * z2 + 3)) / (96 * df * df) +
      (z * (((3 * z2 + 19) * z2 + 17) * z2 - 15)) / (384 * df * df * df);
  }
  const central = q > 0.25;
  if (central) {
    // The central probability is concave in t, so t = c / f(0) is a lower bound; f(0) = 1 / (sqrt(df) B).
    const c = Math.abs(p - 0.5);
    const tLinear = c * Math.sqrt(df) * Math.exp(lnB);
    if (!(t0 > tLinear)) t0 = tLinear;
  }
  if (!(t0 > 0 && t0 < Infinity)) t0 = 1;
  const guess = (t0 * t0) / df;
  const rho = central
    ? incompleteBetaInverseOdds(2 * Math.abs(p - 0.5), 0.5, a, false, guess > 0 ? guess : undefined)
    : incompleteBetaInverseOdds(2 * q, 0.5, a, true, guess > 0 ? guess : undefined);
  return sign * Math.sqrt(df * rho);
}
