/**
 * An interval in words for reports and screens. A back-transformed interval end can have no
 * finite value (under a negative power, back-transform.ts); it is written as words, never as
 * "Infinity", while JSON keeps it null.
 * Cost O(1). Example: intervalText([2, Infinity], shortNumber) -> '2 or more (no upper limit)';
 * intervalText([1, 2], shortNumber, ' mm') -> '1 to 2 mm'.
 */

/** 'lo to hi', 'lo or more (no upper limit)', 'hi or less (no lower limit)', 'no finite value' when both ends are open, or `missing` for null. */
export function intervalText(iv: readonly [number, number] | null, format: (x: number) => string, unit = '', missing = '-'): string {
  if (!iv) return missing;
  const [lo, hi] = iv;
  const loOpen = !Number.isFinite(lo);
  const hiOpen = !Number.isFinite(hi);
  if (loOpen && hiOpen) return 'no finite value';
  if (hiOpen) return `${format(lo)}${unit} or more (no upper limit)`;
  if (loOpen) return `${format(hi)}${unit} or less (no lower limit)`;
  return `${format(lo)} to ${format(hi)}${unit}`;
}

/** A single value that may have no finite value (a fit beyond a negative power's domain). */
export function valueText(x: number | null, format: (x: number) => string, unit = '', missing = '-'): string {
  if (x === null) return missing;
  if (!Number.isFinite(x)) return 'no finite value';
  return `${format(x)}${unit}`;
}
