/**
 * Half-normal plotting positions for effects (Daniel 1959, "Use of half-normal plots in
 * interpreting factorial two-level experiments", Technometrics 1, 311-341): with the m absolute
 * effects sorted ascending, the i-th (1-based) is plotted against the half-normal quantile
 * Phi^-1(0.5 + 0.5 (i - 0.5) / m) (the plotting position (i - 0.5)/m is common practice). The
 * effects are two-level contrasts (products of distinct factors); the analysis never plots a
 * square term here.
 * Cost O(m log m).
 * Example: halfNormalQuantiles(1) -> [0.674...] (Phi^-1(0.75)).
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
