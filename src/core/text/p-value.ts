/**
 * The one way Trialbook writes a p-value, for the core's sentences, the command line's tables and
 * the screens: four decimals, and below 0.0001 only that it is smaller (more digits say nothing a
 * reader can act on; common practice in statistical tables).
 */

/** Smallest p-value written as a number; below it the text says "< 0.0001" (common practice). */
export const SMALLEST_P_SHOWN = 1e-4;

/**
 * A p-value for a table cell: four decimals, "<0.0001" below that, "-" when not available.
 * Cost O(1). Example: pValue(0.18262) -> "0.1826"; pValue(2e-6) -> "<0.0001"; pValue(null) -> "-".
 */
export function pValue(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return '-';
  return p < SMALLEST_P_SHOWN ? '<0.0001' : p.toFixed(4);
}

/**
 * A p-value inside a sentence: "p = 0.0200", "p < 0.0001", or "p not available" for null.
 * Cost O(1). Example: pPhrase(0.02) -> "p = 0.0200".
 */
export function pPhrase(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return 'p not available';
  return p < SMALLEST_P_SHOWN ? 'p < 0.0001' : `p = ${p.toFixed(4)}`;
}
