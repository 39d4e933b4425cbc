/**
 * A number inside one of Trialbook's sentences and plain-text reports: four significant digits
 * with trailing zeros dropped, exponent form for very large or very small magnitudes (common
 * practice: more digits than a gauge reads only distract).
 * Cost O(1). Example: shortNumber(40.4625) -> "40.46"; shortNumber(3) -> "3"; shortNumber(0.00002) -> "2.000e-5".
 */
export function shortNumber(x: number, digits = 4): string {
  if (x === 0) return '0';
  if (!Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  if (a >= 1e6 || a < 1e-4) return x.toExponential(digits - 1);
  return Number(x.toPrecision(digits)).toString();
}
