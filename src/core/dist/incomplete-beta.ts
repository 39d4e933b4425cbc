/**
 * The regularized incomplete beta function I_x(a, b) = B_x(a, b) / B(a, b) for real a, b > 0,
 * the common core of the Student t and F distributions.
 *
 * Method: the continued fraction of Numerical Recipes, 3rd ed., section 6.4, in its even
 * contraction with every partial denominator written out in lambda = a - (a+b) x (see
 * continuedFraction below), evaluated by the modified Lentz method (section 5.2), used directly
 * for x < (a+1)/(a+b+2) and through the symmetry I_x(a, b) = 1 - I_{1-x}(b, a) otherwise.
 *
 * The factor x^a (1-x)^b / B(a, b) in front of the fraction is not formed from three log-gamma
 * values (that loses about log10(a+b) digits when a or b is large, e.g. a t test with 1e7 degrees
 * of freedom). It is written with Stirling's series as in Loader, "Fast and accurate computation
 * of binomial probabilities" (2000):
 *   ln[x^a y^b / B(a,b)] = -D(a, n x) - D(b, n y) + (1/2) ln(a b / (2 pi n))
 *                          + delta(n) - delta(a) - delta(b),      n = a + b, y = 1 - x,
 * where D(k, m) = k ln(k/m) + m - k is the deviance term and
 * delta(z) = ln Gamma(z) - (z - 1/2) ln z + z - (1/2) ln(2 pi) is the Stirling error.
 * Both are small, well conditioned numbers, so the factor keeps ~1e-14 relative accuracy.
 *
 * Callers that know y = 1 - x more precisely than 1 - x can be computed (a t statistic gives
 * x = df/(df+t^2) and y = t^2/(df+t^2) separately) use the XY forms, which never subtract.
 */
import { InputError } from '../errors.ts';
import { lnBeta, stirlingError } from './log-gamma.ts';
import { normalQuantile } from './normal.ts';
import { BRACKET_TOLERANCE, CONTINUED_FRACTION_TINY, CONTINUED_FRACTION_TOLERANCE, NEWTON_STEP_TOLERANCE, NEWTON_VALUE_TOLERANCE, SUM_TO_ONE_TOLERANCE } from '../tolerance.ts';

const TWO_PI = 6.283185307179586;
// Lentz's stop and zero stand-in, the XY forms' sum check (see tolerance.ts).
const CF_EPS = CONTINUED_FRACTION_TOLERANCE;
const CF_TINY = CONTINUED_FRACTION_TINY;
const SUM_TOLERANCE = SUM_TO_ONE_TOLERANCE;

/**
 * Deviance term D(k, m) = k ln(k/m) + m - k >= 0 for k > 0, m >= 0 (Loader 2000, "bd0"), given
 * also diff = k - m, which the caller knows more precisely than k - m can be formed.
 */
function deviance(k: number, m: number, diff: number): number {
  const sum = 2 * k - diff;
  if (Math.abs(diff) < 0.1 * sum) {
    // k ln(k/m) + m - k = (k-m) v + 2k sum_{j>=1} v^(2j+1)/(2j+1), v = (k-m)/(k+m).
    const v = diff / sum;
    const v2 = v * v;
    let s = diff * v;
    let ej = 2 * k * v;
    for (let j = 1; j < 1000; j++) {
      ej *= v2;
      const next = s + ej / (2 * j + 1);
      if (next === s) return s;
      s = next;
    }
    return s;
  }
  return k * Math.log(k / m) - diff;
}

/**
 * lambda = a - (a+b) x = (a+b) y - b, formed from the smaller of x and y so that the rounding of
 * the product stays below the size of the smaller term.
 */
function lambdaOf(x: number, y: number, a: number, b: number): number {
  return x <= y ? a - (a + b) * x : (a + b) * y - b;
}

/* One-entry memo of the shape-only part of the factor: callers evaluate many x for the same
 * (a, b) (a quantile search, a table of p-values with one error df). Plain numbers, no allocation. */
let memoA = NaN;
let memoB = NaN;
let memoConstant = 0;

/** (1/2) ln(a b / (2 pi n)) + delta(n) - delta(a) - delta(b), n = a + b: the shape-only part. */
function shapeConstant(a: number, b: number): number {
  if (a !== memoA || b !== memoB) {
    const n = a + b;
    memoConstant = 0.5 * Math.log((a / n) * (b / TWO_PI)) + stirlingError(n) - stirlingError(a) - stirlingError(b);
    memoA = a;
    memoB = b;
  }
  return memoConstant;
}

/** ln[x^a y^b / B(a, b)] for x + y = 1, both > 0 (Loader's saddle-point form). */
function lnFactor(x: number, y: number, a: number, b: number): number {
  const n = a + b;
  const lambda = lambdaOf(x, y, a, b);
  return shapeConstant(a, b) - deviance(a, n * x, lambda) - deviance(b, n * y, -lambda);
}

/**
 * Continued fraction of I_x(a, b): I_x(a, b) = factor / (a * F) with
 *   F = beta_0 + alpha_1 / (beta_1 + alpha_2 / (beta_2 + ...)),
 * the even contraction of the fraction in Numerical Recipes 3rd ed. section 6.4 (partial numerators d_1, d_2, ...:
 * d_{2m+1} = -(a+m)(a+b+m) x / ((a+2m)(a+2m+1)), d_{2m} = m (b-m) x / ((a+2m-1)(a+2m))), so that
 * beta_0 = 1 + d_1, beta_m = 1 + d_{2m} + d_{2m+1}, alpha_m = -d_{2m-1} d_{2m}.
 * Each 1 + d_{2m+1} is written out exactly in lambda = a - (a+b) x = (a+b) y - b:
 *   (a+2m)(a+2m+1) (1 + d_{2m+1}) = a (2m+1) + m (3m+2) + (a+m) (lambda + m y),
 * which never subtracts nearly equal numbers; the plain recurrence does, and loses up to half the
 * digits when a is large and x is near 1. Evaluated by the modified Lentz method (section 5.2).
 * Converges fast for x < (a+1)/(a+b+2), needing O(sqrt(max(a, b))) terms at worst.
 */
function continuedFraction(x: number, y: number, a: number, b: number): number {
  const lambda = lambdaOf(x, y, a, b);
  let f = (1 + lambda) / (a + 1);
  if (Math.abs(f) < CF_TINY) f = CF_TINY;
  let c = f;
  let d = 0;
  const maxTerms = 1000 + Math.ceil(20 * Math.sqrt(Math.max(a, b)));
  for (let m = 1; m <= maxTerms; m++) {
    const a2m = a + 2 * m;
    const dEven = (m * (b - m) * x) / ((a2m - 1) * a2m);
    const dOddPrev = (-(a + m - 1) * (a + b + m - 1) * x) / ((a2m - 2) * (a2m - 1));
    const alpha = -dOddPrev * dEven;
    const beta = dEven + (a * (2 * m + 1) + m * (3 * m + 2) + (a + m) * (lambda + m * y)) / (a2m * (a2m + 1));
    d = beta + alpha * d;
    if (Math.abs(d) < CF_TINY) d = CF_TINY;
    c = beta + alpha / c;
    if (Math.abs(c) < CF_TINY) c = CF_TINY;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) <= CF_EPS) break;
  }
  return 1 / f;
}

function checkShape(a: number, b: number, what: string): void {
  if (!(a > 0) || a === Infinity) throw new InputError(`${what} needs a finite shape a > 0, got a = ${a}`);
  if (!(b > 0) || b === Infinity) throw new InputError(`${what} needs a finite shape b > 0, got b = ${b}`);
}

function checkPair(x: number, y: number, what: string): void {
  if (!(x >= 0 && x <= 1)) throw new InputError(`${what} needs x between 0 and 1, got x = ${x}`);
  if (!(y >= 0 && y <= 1)) throw new InputError(`${what} needs y between 0 and 1, got y = ${y}`);
  if (!(Math.abs(x + y - 1) <= SUM_TOLERANCE)) {
    throw new InputError(`${what} needs x + y = 1, got x = ${x} and y = ${y}`);
  }
}

/**
 * The factor x^a y^b / B(a, b) (with y = 1 - x) that multiplies the incomplete beta continued
 * fraction; it also gives the beta density, x^(a-1) y^(b-1) / B(a, b) = factor / (x y), and the
 * derivative of I_x(a, b) along ln(x / y): d I / d ln(x/y) = factor.
 *
 * Method: Loader's (2000) deviance form of Stirling's series (see the file header), so it stays
 * accurate to ~1e-14 relative for a, b up to 1e7 and beyond, where ln Gamma differences would
 * lose half the digits.
 * Cost: about six logarithms and two short series, no allocation.
 * Throws InputError unless a, b are finite and > 0, x, y lie in [0, 1] and x + y = 1 (within
 * 1e-12). Returns 0 when x or y is 0.
 * Example: incompleteBetaFactor(0.5, 0.5, 2, 3) -> 0.375 to 1e-15 (= 0.5^2 * 0.5^3 * 12, as B(2,3) = 1/12).
 */
export function incompleteBetaFactor(x: number, y: number, a: number, b: number): number {
  checkShape(a, b, 'incompleteBetaFactor');
  checkPair(x, y, 'incompleteBetaFactor');
  if (x === 0 || y === 0) return 0;
  return Math.exp(lnFactor(x, y, a, b));
}

/**
 * Regularized incomplete beta I_x(a, b) = (1/B(a,b)) * integral_0^x s^(a-1) (1-s)^(b-1) ds,
 * given x and y = 1 - x separately so that neither has to be formed by subtraction.
 * The upper tail 1 - I_x(a, b) is incompleteBetaXY(y, x, b, a), with no cancellation.
 *
 * Method: Numerical Recipes 3rd ed. section 6.4, continued fraction (even contraction, see the
 * file header) by Lentz's method, with the symmetry I_x(a, b) = 1 - I_y(b, a) when
 * x >= (a+1)/(a+b+2); factor in front by Loader's (2000) deviance form. The symmetric branch,
 * which subtracts from 1, only runs where the result is at least of order 0.1 unless one shape is
 * far below 1.
 * Accuracy: within about 5 (1 + k) 1.1e-16 relative, k = |d ln I / d ln x| being the condition
 * number (what one rounding of x already costs): measured below 1e-14 wherever k < 100, for
 * shapes 0.25 to 5e6; up to 5e-12 only for both shapes near 5e6 far out in a tail, where k ~ 1e5.
 * Cost: O(1) for moderate shapes; O(sqrt(max(a, b))) continued-fraction terms in the worst case
 * (x near the mean with both shapes large). No allocation.
 * Throws InputError unless a, b are finite and > 0, x, y lie in [0, 1] and x + y = 1 (within 1e-12).
 * Example: incompleteBetaXY(0.25, 0.75, 2, 3) -> 0.26171875 to 1e-15 (= 67/256).
 */
export function incompleteBetaXY(x: number, y: number, a: number, b: number): number {
  checkShape(a, b, 'incompleteBetaXY');
  checkPair(x, y, 'incompleteBetaXY');
  if (x === 0) return 0;
  if (y === 0) return 1;
  return fromFactor(x, y, a, b, Math.exp(lnFactor(x, y, a, b)));
}

/** I_x(a, b) from its factor x^a y^b / B(a, b), for 0 < x < 1, x + y = 1. */
function fromFactor(x: number, y: number, a: number, b: number, factor: number): number {
  if (x < (a + 1) / (a + b + 2)) return (factor * continuedFraction(x, y, a, b)) / a;
  return 1 - (factor * continuedFraction(y, x, b, a)) / b;
}

/**
 * Regularized incomplete beta I_x(a, b) = (1/B(a,b)) * integral_0^x s^(a-1) (1-s)^(b-1) ds for
 * 0 <= x <= 1 and real a, b > 0. Same method, accuracy and cost as incompleteBetaXY, with
 * y = 1 - x (exact for x >= 1/2, so precision near x = 1 is kept as far as x itself carries it).
 * Throws InputError unless a, b are finite and > 0 and 0 <= x <= 1.
 * Example: incompleteBeta(0.5, 2, 3) -> 0.6875 (= 11/16); incompleteBeta(0.3, 1, 1) -> 0.3 (both to 1e-15).
 */
export function incompleteBeta(x: number, a: number, b: number): number {
  if (!(x >= 0 && x <= 1)) throw new InputError(`incompleteBeta needs x between 0 and 1, got x = ${x}`);
  return incompleteBetaXY(x, 1 - x, a, b);
}

/** Odds beyond e^600 (or below e^-600) are taken from the tail asymptote: its O(x) correction is
 * then far below rounding. */
const LN_ODDS_ASYMPTOTE = 600;
// Newton on ln(odds) stops on a small step or a small ln(P / target) (see tolerance.ts).
const STEP_TOLERANCE = NEWTON_STEP_TOLERANCE;
const VALUE_TOLERANCE = NEWTON_VALUE_TOLERANCE;
const MAX_NEWTON = 100;

/**
 * Starting odds for incompleteBetaInverseOdds: Abramowitz & Stegun 26.5.22 (through a normal
 * quantile) when a, b >= 1, else the power-law tails x^a / (a w), y^b / (b w) with
 * w = (a/(a+b))^a / a + (b/(a+b))^b / b, as in Numerical Recipes 3rd ed. section 6.4 (invbetai).
 */
function startingOdds(target: number, a: number, b: number, upper: boolean): number {
  if (a >= 1 && b >= 1) {
    // z: the upper standard normal point of the lower probability.
    const z = upper ? normalQuantile(target) : -normalQuantile(target);
    const lam = (z * z - 3) / 6;
    const h = 2 / (1 / (2 * a - 1) + 1 / (2 * b - 1));
    const w = (z * Math.sqrt(h + lam)) / h - (1 / (2 * b - 1) - 1 / (2 * a - 1)) * (lam + 5 / 6 - 2 / (3 * h));
    return (a / b) * Math.exp(-2 * w);
  }
  const n = a + b;
  const ta = Math.exp(a * Math.log(a / n)) / a;
  const tb = Math.exp(b * Math.log(b / n)) / b;
  const w = ta + tb;
  const lowerP = upper ? 1 - target : target;
  const upperP = upper ? target : 1 - target;
  if (lowerP < ta / w) {
    const x = Math.pow(a * w * lowerP, 1 / a);
    return x / (1 - x);
  }
  const y = Math.pow(b * w * upperP, 1 / b);
  return (1 - y) / y;
}

/**
 * Inverse of the regularized incomplete beta on the odds scale: the rho = x / (1 - x) > 0 with
 * I_x(a, b) = target (upper = false) or 1 - I_x(a, b) = target (upper = true). Working with odds
 * keeps full relative precision at both ends (x near 0 and x near 1), which the t and F
 * quantiles need: an F ratio is (b/a) rho, a t statistic sqrt(df rho) on Beta(1/2, df/2).
 *
 * Method: safeguarded Newton iteration on ln P(rho) - ln target in ln rho, using
 * d I / d ln rho = x^a y^b / B(a, b) (incompleteBetaFactor); the root is kept bracketed and a
 * step leaving the bracket is replaced by a geometric bisection. Start: Abramowitz & Stegun
 * 26.5.22 for a, b >= 1, else the power-law tails (Numerical Recipes 3rd ed. section 6.4), or
 * the caller's guess. Beyond odds of e^600 (either way) the first term of the tail series,
 * I_x(a,b) ~ x^a / (a B(a,b)), is exact to rounding and is inverted in closed form.
 * Accuracy: relative error of rho about 1e-15 times the condition number 1 / |d ln P / d ln rho|
 * (measured ~1e-14 for shapes from 0.25 to 5e6).
 * Cost: typically 3 to 6 incomplete beta evaluations; no allocation.
 * Throws InputError unless 0 < target < 1 and a, b are finite and > 0 (and guess, when given,
 * is a positive finite number).
 * Example: incompleteBetaInverseOdds(0.5, 2, 2, false) -> 1 to 1e-15 (the median of Beta(2, 2) is 1/2).
 */
export function incompleteBetaInverseOdds(target: number, a: number, b: number, upper: boolean, guess?: number): number {
  if (!(target > 0 && target < 1)) {
    throw new InputError(`incompleteBetaInverseOdds needs a probability strictly between 0 and 1, got ${target}`);
  }
  checkShape(a, b, 'incompleteBetaInverseOdds');
  if (guess !== undefined && !(guess > 0 && guess < Infinity)) {
    throw new InputError(`incompleteBetaInverseOdds needs a positive finite starting guess, got ${guess}`);
  }
  // Far tails in closed form: I ~ x^a / (a B) as x -> 0, 1 - I ~ y^b / (b B) as y -> 0.
  const lnB = lnBeta(a, b);
  if (!upper) {
    const lnX = (Math.log(a) + Math.log(target) + lnB) / a;
    if (lnX < -LN_ODDS_ASYMPTOTE) return Math.exp(lnX);
  } else {
    const lnY = (Math.log(b) + Math.log(target) + lnB) / b;
    if (lnY < -LN_ODDS_ASYMPTOTE) return Math.exp(-lnY);
  }
  let rho = guess ?? startingOdds(target, a, b, upper);
  if (!(rho > 0 && rho < Infinity)) rho = a / b;
  let lo = 0;
  let hi = Infinity;
  for (let iter = 0; iter < MAX_NEWTON; iter++) {
    let x: number;
    let y: number;
    if (rho <= 1) {
      x = rho / (1 + rho);
      y = 1 / (1 + rho);
    } else {
      const w = 1 / rho;
      x = 1 / (1 + w);
      y = w / (1 + w);
    }
    const factor = x === 0 || y === 0 ? 0 : Math.exp(lnFactor(x, y, a, b));
    let p: number;
    if (x === 0) p = upper ? 1 : 0;
    else if (y === 0) p = upper ? 0 : 1;
    else p = upper ? fromFactor(y, x, b, a, factor) : fromFactor(x, y, a, b, factor);
    // g increases with rho: ln(P / target), sign-flipped for the upper tail.
    const g = upper ? -Math.log(p / target) : Math.log(p / target);
    if (g === 0) return rho;
    if (g > 0) hi = rho;
    else lo = rho;
    let step = (-g * p) / factor;
    if (!(Math.abs(step) < Infinity)) step = g > 0 ? -4 : 4;
    else if (step > 50) step = 50;
    else if (step < -50) step = -50;
    let next = rho * Math.exp(step);
    const inside = next > lo && next < hi;
    if (Math.abs(step) < STEP_TOLERANCE || Math.abs(g) < VALUE_TOLERANCE) return inside ? next : rho;
    if (!inside) {
      // Newton left the bracket: bisect it geometrically, or widen it by e^4 while one side is open.
      if (lo > 0 && hi < Infinity) next = Math.sqrt(lo) * Math.sqrt(hi);
      else next = lo > 0 ? lo * 54.598150033144236 : hi / 54.598150033144236;
    }
    if (lo > 0 && hi < Infinity && hi - lo <= BRACKET_TOLERANCE * hi) return next;
    rho = next;
  }
  return rho;
}
