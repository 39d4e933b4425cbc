/**
 * Natural logarithm of the gamma function for positive real arguments.
 */
import { InputError } from '../errors.ts';

/* Lanczos coefficients for the shift r = 671/128 (= 5.2421875), n = 14, from Numerical Recipes, 3rd ed.
 * (Press, Teukolsky, Vetterling, Flannery 2007), section 6.1, routine gammln. */
const LANCZOS_G = 5.2421875;
const LANCZOS_C0 = 0.999999999999997092;
const LANCZOS_COEF: readonly number[] = [
  57.1562356658629235, -59.5979603554754912, 14.1360979747417471, -0.491913816097620199,
  0.339946499848118887e-4, 0.465236289270485756e-4, -0.983744753048795646e-4,
  0.158088703224912494e-3, -0.210264441724104883e-3, 0.217439618115212643e-3,
  -0.164318106536763890e-3, 0.844182239838527433e-4, -0.261908384015814087e-4,
  0.368991826595316234e-5,
];
const SQRT_TWO_PI = 2.5066282746310005;

/**
 * ln Gamma(x) for real x > 0, by the Lanczos approximation.
 *
 * Formula: ln Gamma(x) = (x + 1/2) ln(x + r) - (x + r)
 *                        + ln( sqrt(2 pi) * (c0 + sum_{j=1..14} c_j / (x + j)) / x ),
 * with r = 671/128 and the 14 coefficients of Numerical Recipes, 3rd ed., section 6.1 (gammln).
 * Absolute error about 1e-15 for x <= 10 and relative error about 1e-15 beyond; near the zeros
 * x = 1 and x = 2 the error is absolute, not relative.
 *
 * Cost: 14 divisions and two logarithms, no allocation.
 * Throws InputError unless x is a finite number > 0.
 * Example: lnGamma(5) -> 3.17805383034795 (= ln 24); lnGamma(0.5) -> 0.57236494292470 (= ln sqrt(pi)).
 */
export function lnGamma(x: number): number {
  if (!(x > 0) || x === Infinity) {
    throw new InputError(`lnGamma needs a finite number greater than 0, got ${x}`);
  }
  let tmp = x + LANCZOS_G;
  tmp = (x + 0.5) * Math.log(tmp) - tmp;
  let ser = LANCZOS_C0;
  let y = x;
  for (let j = 0; j < 14; j++) ser += LANCZOS_COEF[j] / ++y;
  return tmp + Math.log((SQRT_TWO_PI * ser) / x);
}

const HALF_LN_TWO_PI = 0.91893853320467274178; // (1/2) ln(2 pi)
/* Stirling series coefficients B_{2k} / (2k (2k-1)), Abramowitz & Stegun 6.1.41. */
const S1 = 1 / 12;
const S3 = 1 / 360;
const S5 = 1 / 1260;
const S7 = 1 / 1680;
const S9 = 1 / 1188;
const S11 = 691 / 360360;
const S13 = 1 / 156;
const S15 = 3617 / 122400;
const S17 = 43867 / 244188;

/**
 * Stirling error delta(z) = ln Gamma(z) - [(z - 1/2) ln z - z + (1/2) ln(2 pi)], the small
 * remainder of Stirling's formula, for real z > 0.
 *
 * Method: for z >= 10 the asymptotic series sum_k B_2k / (2k (2k-1) z^(2k-1)) = 1/(12z)
 * - 1/(360z^3) + 1/(1260z^5) - 1/(1680z^7) + 1/(1188z^9) - 691/(360360z^11) + 1/(156z^13)
 * - 3617/(122400z^15) + 43867/(244188z^17) (Abramowitz & Stegun 6.1.41; the first term left out
 * is below 2e-19 there), relative error about 1e-16; below 10 it is formed from lnGamma, with
 * absolute error about 1e-14. Used where differences of log-gamma values of
 * large arguments would cancel (Loader 2000, "Fast and accurate computation of binomial
 * probabilities").
 * Cost: seven multiply-adds (z >= 10) or one lnGamma; no allocation.
 * Throws InputError unless z is a finite number > 0.
 * Example: stirlingError(10) -> 0.00833056343336287; stirlingError(1) -> 0.0810614667953273 (= 1 - ln sqrt(2 pi)).
 */
export function stirlingError(z: number): number {
  if (!(z > 0) || z === Infinity) {
    throw new InputError(`stirlingError needs a finite number greater than 0, got ${z}`);
  }
  if (z >= 10) {
    const w = 1 / (z * z);
    return (S1 - w * (S3 - w * (S5 - w * (S7 - w * (S9 - w * (S11 - w * (S13 - w * (S15 - w * S17)))))))) / z;
  }
  return lnGamma(z) - (z - 0.5) * Math.log(z) + z - HALF_LN_TWO_PI;
}

/**
 * ln B(a, b) = ln Gamma(a) + ln Gamma(b) - ln Gamma(a + b), the log of the beta function, for
 * real a, b > 0.
 *
 * Method: with a <= b, directly from lnGamma when b < 10; otherwise Stirling's formula is
 * written so that the large terms cancel on paper, not in floating point:
 *   a < 10 <= b:  ln B = ln Gamma(a) - (b - 1/2) log1p(a/b) - a ln(a+b) + a + delta(b) - delta(a+b),
 *   10 <= a <= b: ln B = (1/2) ln(2 pi) - (1/2) ln(a+b) - (a - 1/2) log1p(b/a) - (b - 1/2) log1p(a/b)
 *                        + delta(a) + delta(b) - delta(a+b),
 * with delta the Stirling error (stirlingError). Absolute error about 1e-14 for a <= 10 whatever
 * b is (where the three-lnGamma sum would lose ~1e-8 at b = 1e7), about 1e-16 * |ln B| beyond.
 * Cost: at most three lnGamma or Stirling series and three logarithms; no allocation.
 * Throws InputError unless a and b are finite numbers > 0.
 * Example: lnBeta(2, 3) -> -2.48490664978800 (= ln(1/12)); lnBeta(0.5, 0.5) -> 1.14472988584940 (= ln pi).
 */
export function lnBeta(a: number, b: number): number {
  if (!(a > 0) || a === Infinity || !(b > 0) || b === Infinity) {
    throw new InputError(`lnBeta needs finite numbers greater than 0, got a = ${a} and b = ${b}`);
  }
  const lo = a < b ? a : b;
  const hi = a < b ? b : a;
  const n = lo + hi;
  if (hi < 10) return lnGamma(lo) + lnGamma(hi) - lnGamma(n);
  if (lo < 10) {
    return lnGamma(lo) - (hi - 0.5) * Math.log1p(lo / hi) - lo * Math.log(n) + lo + stirlingError(hi) - stirlingError(n);
  }
  return (
    HALF_LN_TWO_PI -
    0.5 * Math.log(n) -
    (lo - 0.5) * Math.log1p(hi / lo) -
    (hi - 0.5) * Math.log1p(lo / hi) +
    stirlingError(lo) +
    stirlingError(hi) -
    stirlingError(n)
  );
}
