/**
 * Fast Walsh-Hadamard transform in place (Yates' algorithm in its modern form): for a vector of
 * length 2^k, out[t] = sum_c (-1)^popcount(t & c) in[c]. Applied to the cell totals of a 2^k
 * factorial indexed so that bit i of c is set when factor i is at its LOW level, out[t] is the
 * contrast of term t (the sum of the +1 responses minus the sum of the -1 responses).
 * Source: Yates (1937), The Design and Analysis of Factorial Experiments, Imperial Bureau of Soil
 * Science Technical Communication 35; the butterfly form: Fino and Algazi (1976), IEEE Trans.
 * Computers C-25, 1142-1146. Cost O(k 2^k), no allocation.
 * Example: walshHadamard([1, 2, 3, 4]) -> [10, -2, -4, 0].
 */
export function walshHadamard(a: Float64Array): void {
  const n = a.length;
  for (let h = 1; h < n; h <<= 1) {
    for (let i = 0; i < n; i += h << 1) {
      for (let j = i; j < i + h; j++) {
        const u = a[j];
        const v = a[j + h];
        a[j] = u + v;
        a[j + h] = u - v;
      }
    }
  }
}
