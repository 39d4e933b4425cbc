/**
 * A small store of results that depend only on a matrix, found again by the matrix's content:
 * the part of a least-squares fit that does not depend on the response (the factorisation,
 * (X'X)^-1, leverage, aliases) is the same for every response of a study, for every transform
 * tried on it and for every analysis of the same runs, so it is worked out once per model
 * matrix. An entry matches when its tag (the shape and kind of the result) is the same and every
 * entry of the matrix is the same number (Object.is: -0 and 0 apart, NaN equal to NaN), so a
 * recalled result is exactly the one that would be computed. The store holds its own copy of
 * each matrix (a caller may reuse its array), keeps the last `size` matrices (least recently
 * used goes first) and none longer than `maxEntries` numbers. Source: common practice (a
 * memo keyed by the full input). Cost O(size n p) per lookup at worst, O(n p) per kept matrix.
 */

export interface MatrixMemo<T> {
  /** The result kept for this matrix and tag, or undefined. */
  recall(x: Float64Array, tag: string): T | undefined;
  /** Computes the result from a private copy of x (which it may keep a reference to), keeps and returns it. */
  keep(x: Float64Array, tag: string, make: (own: Float64Array) => T): T;
}

/** Throws RangeError for a size below 1 (a programming error, not bad input). */
export function matrixMemo<T>(size: number, maxEntries: number): MatrixMemo<T> {
  if (!(size >= 1)) throw new RangeError(`matrixMemo: size must be at least 1, got ${size}`);
  const entries: { x: Float64Array; tag: string; value: T }[] = [];
  return {
    recall(x, tag) {
      for (let e = 0; e < entries.length; e++) {
        const entry = entries[e];
        if (entry.tag !== tag || !sameNumbers(entry.x, x)) continue;
        if (e > 0) {
          entries.splice(e, 1);
          entries.unshift(entry);
        }
        return entry.value;
      }
      return undefined;
    },
    keep(x, tag, make) {
      const own = new Float64Array(x);
      const value = make(own);
      if (own.length <= maxEntries) {
        entries.unshift({ x: own, tag, value });
        if (entries.length > size) entries.pop();
      }
      return value;
    },
  };
}

/** Entry for entry Object.is, written out (the call per entry costs more than the test). */
function sameNumbers(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) {
    const u = a[i];
    const v = b[i];
    if (u === v ? u === 0 && 1 / u !== 1 / v : u === u || v === v) return false;
  }
  return true;
}
