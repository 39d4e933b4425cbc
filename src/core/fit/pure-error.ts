/**
 * Pure error from runs repeated at the same settings (and in the same block): the sum of squares
 * of each group about its own mean, with sum(n_g - 1) degrees of freedom. Lack of fit is the rest
 * of the residual. Source: Montgomery, Design and Analysis of Experiments, 8th ed., section
 * 10.7 (testing for lack of fit); Draper and Smith, Applied Regression Analysis, 3rd ed., ch. 2.1.
 * Settings count as the same when they agree within SETTING_TOLERANCE in coded units: the fit
 * uses the actual settings, so only runs the fit cannot tell apart form a group.
 * Groups are found by sorting the runs on their settings, so no text keys are built.
 * Cost O(n log n k).
 */
import { SETTING_TOLERANCE } from '../tolerance.ts';

export interface PureError {
  readonly ss: number;
  readonly df: number;
  /** Number of groups of repeated settings that have two or more runs. */
  readonly groups: number;
  /** Group number of each run (runs with the same settings and block share one). */
  readonly groupOf: Int32Array;
}

export function pureError(coded: readonly (readonly number[])[], y: ArrayLike<number>, blocks: readonly number[] | null | undefined): PureError {
  const n = coded.length;
  const k = n > 0 ? coded[0].length : 0;
  const tol = SETTING_TOLERANCE; // a local: module bindings are getters under some loaders
  const compare = (a: number, b: number): number => {
    if (blocks && blocks[a] !== blocks[b]) return blocks[a] - blocks[b];
    const ra = coded[a];
    const rb = coded[b];
    for (let f = 0; f < k; f++) {
      const d = ra[f] - rb[f];
      if (d > tol || d < -tol) return d;
    }
    return 0;
  };
  const order = Array.from({ length: n }, (_, i) => i).sort(compare);
  const groupOf = new Int32Array(n);
  let ss = 0;
  let df = 0;
  let repeated = 0;
  let g = 0;
  for (let start = 0; start < n; ) {
    let end = start + 1;
    while (end < n && compare(order[start], order[end]) === 0) end++;
    let mean = 0;
    for (let i = start; i < end; i++) {
      mean += y[order[i]];
      groupOf[order[i]] = g;
    }
    mean /= end - start;
    if (end - start > 1) {
      repeated++;
      df += end - start - 1;
      for (let i = start; i < end; i++) ss += (y[order[i]] - mean) ** 2;
    }
    g++;
    start = end;
  }
  return { ss, df, groups: repeated, groupOf };
}
