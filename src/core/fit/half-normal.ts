/**
 * Half-normal plotting positions for effects (Daniel 1959, "Use of half-normal plots in
 * interpreting factorial two-level experiments", Technometrics 1, 311-341): with the m absolute
 * effects sorted ascending, the i-th (1-based) is plotted against the half-normal quantile
 * Phi^-1(0.5 + 0.5 (i - 0.5) / m) (the plotting position (i - 0.5)/m is common practice). The
 * effects are two-level contrasts (products of distinct factors); the analysis never plots a
 * square term here.
 * Cost O(m log m).
 * Example: halfNormalQuantiles(1) -> [0.674...] (Phi^-1(0.75)); bySize([3, -1, 2]) -> [1, 2, 0].
 */
import { normalQuantile } from '../dist/normal.ts';

/* One-entry memo: the positions depend on m only, and an analysis asks for the same m each time
 * its model is refitted. A copy goes out, so a caller may keep or change its array. */
let memoM = -1;
let memoQ: number[] = [];

export function halfNormalQuantiles(m: number): number[] {
  if (m !== memoM) {
    const q: number[] = [];
    for (let i = 1; i <= m; i++) q.push(normalQuantile(0.5 + (0.5 * (i - 0.5)) / m));
    memoQ = q;
    memoM = m;
  }
  return memoQ.slice();
}

/**
 * The order of the effects by absolute size, smallest first, ties in their given order (the
 * order a stable sort on |effect| gives), for finite effects: insertion sort of runs of 8, then a
 * bottom-up merge sort on indices, comparing the sizes inline (no comparison callback per pair). Cost O(m log m), two index buffers.
 */
export function bySize(effects: ArrayLike<number>): Int32Array {
  const m = effects.length;
  const size = new Float64Array(m);
  let order = new Int32Array(m);
  let spare = new Int32Array(m);
  for (let i = 0; i < m; i++) {
    size[i] = Math.abs(effects[i]);
    order[i] = i;
  }
  // Runs of RUN by insertion (a later index moves only past strictly larger sizes), then merges.
  const RUN = 8;
  for (let lo = 0; lo < m; lo += RUN) {
    const hi = Math.min(lo + RUN, m);
    for (let i = lo + 1; i < hi; i++) {
      const v = order[i];
      const sv = size[v];
      let j = i - 1;
      while (j >= lo && size[order[j]] > sv) {
        order[j + 1] = order[j];
        j--;
      }
      order[j + 1] = v;
    }
  }
  for (let width = RUN; width < m; width *= 2) {
    for (let lo = 0; lo < m; lo += 2 * width) {
      const mid = Math.min(lo + width, m);
      const hi = Math.min(lo + 2 * width, m);
      let a = lo;
      let b = mid;
      let o = lo;
      // Take from the left run on a tie: that keeps equal sizes in their given order.
      while (a < mid && b < hi) spare[o++] = size[order[b]] < size[order[a]] ? order[b++] : order[a++];
      while (a < mid) spare[o++] = order[a++];
      while (b < hi) spare[o++] = order[b++];
    }
    const t = order;
    order = spare;
    spare = t;
  }
  return order;
}
