/**
 * A computed number without its binary round-off, for showing and exporting a derived value such
 * as a mean: rounded to 15 significant digits, the most that every decimal number carries
 * through a double and back (DBL_DIG = 15 for IEEE 754 binary64; ISO C, <float.h>), then written
 * by Number to String in its shortest form. So the mean of 70.2 and 70.4, computed as
 * 70.30000000000001, is 70.3; a value typed or measured (up to 15 digits) is unchanged.
 * Cost: constant. Throws nothing; a value that is not finite is returned as it is.
 * Example: withoutRoundOff((70.2 + 70.4) / 2) -> 70.3; withoutRoundOff(1 / 3) -> 0.333333333333333.
 */

/** Significant digits every decimal keeps through a double (DBL_DIG, ISO C <float.h>). */
export const DOUBLE_DECIMAL_DIGITS = 15;

export function withoutRoundOff(x: number): number {
  if (!Number.isFinite(x) || x === 0) return x;
  return Number(x.toPrecision(DOUBLE_DECIMAL_DIGITS));
}
