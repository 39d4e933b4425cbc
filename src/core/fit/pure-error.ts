/**
 * Pure error from runs repeated at the same settings (and in the same block): the sum of squares
 * of each group about its own mean, with sum(n_g - 1) degrees of freedom. Lack of fit is the rest
 * of the residual. Source: Montgomery, Design and Analysis of Experiments, 8th ed., section
 * 10.7 (testing for lack of fit); Draper and Smith, Applied Regression Analysis, 3rd ed., ch. 2.1.
 * When the runs come from a plan, repeats of one planned point form a group even if their actual
 * settings differ slightly (near replicates); the sum is then an approximation, and the analysis
 * says so (common practice: the runs were meant as replicates).
 */
import { SETTING_TOLERANCE } from '../tolerance.ts';
import { matrixMemo } from './matrix-memo.ts';

export interface PureError {
  readonly ss: number;
  readonly df: number;
  /** Number of groups of repeated settings that have two or more runs. */
  readonly groups: number;
  /** Group number of each run (runs with the same settings and block share one). */
  readonly groupOf: Int32Array;
}

export function pureError(coded: readonly (readonly number[])[], y: ArrayLike<number>, blocks: readonly number[] | null | undefined): PureError {
  return pureErrorOfGroups(settingGroups(coded, blocks), y);
}

/**
 * Group number of each run: runs with the same settings (within SETTING_TOLERANCE) and block
 * share one. Found by sorting the runs on their settings (block first, then factor by factor), a
 * stable sort: insertion sort of runs of 8, then a bottom-up merge, comparing inline on a copy of
 * the settings (no comparison callback per pair). Cost O(n log n k).
 */
export function settingGroups(coded: readonly (readonly number[])[], blocks: readonly number[] | null | undefined): Int32Array {
  const n = coded.length;
  const k = n > 0 ? coded[0].length : 0;
  const tol = SETTING_TOLERANCE; // a local: module bindings are getters under some loaders
  // Row-major copy of the settings, with the block (when any) as a leading setting compared exactly.
  const width = k + (blocks ? 1 : 0);
  const s = new Float64Array(n * width);
  for (let i = 0; i < n; i++) {
    const row = coded[i];
    let o = i * width;
    if (blocks) s[o++] = blocks[i];
    for (let f = 0; f < k; f++) s[o + f] = row[f];
  }
  // The groups depend on the settings alone: the last few answers are kept by them (matrix-memo.ts).
  const tag = `${n}|${width}|${blocks ? 'blocks' : ''}`;
  return new Int32Array(groupsBySettings.recall(s, tag) ?? groupsBySettings.keep(s, tag, (own) => groupsOf(own, n, width, blocks ? 1 : 0, tol)));
}

/** The last four answers of settingGroups (never modified). */
const groupsBySettings = matrixMemo<Int32Array>(4, 1 << 15);

/** settingGroups' work on the row-major settings `s` (`lead` 1 when a block leads each row). */
function groupsOf(s: Float64Array, n: number, width: number, lead: number, tol: number): Int32Array {
  /** The sign of the comparison of runs a and b (a block difference, else the first setting difference beyond tol). */
  const compare = (a: number, b: number): number => {
    const oa = a * width;
    const ob = b * width;
    if (lead && s[oa] !== s[ob]) return s[oa] - s[ob];
    for (let f = lead; f < width; f++) {
      const d = s[oa + f] - s[ob + f];
      if (d > tol || d < -tol) return d;
    }
    return 0;
  };
  let order = new Int32Array(n);
  let spare = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  const RUN = 8;
  for (let lo = 0; lo < n; lo += RUN) {
    const hi = Math.min(lo + RUN, n);
    for (let i = lo + 1; i < hi; i++) {
      const v = order[i];
      let j = i - 1;
      while (j >= lo && compare(order[j], v) > 0) {
        order[j + 1] = order[j];
        j--;
      }
      order[j + 1] = v;
    }
  }
  for (let run = RUN; run < n; run *= 2) {
    for (let lo = 0; lo < n; lo += 2 * run) {
      const mid = Math.min(lo + run, n);
      const hi = Math.min(lo + 2 * run, n);
      let a = lo;
      let b = mid;
      let o = lo;
      // Take from the left run on a tie: equal runs keep their given order.
      while (a < mid && b < hi) spare[o++] = compare(order[b], order[a]) < 0 ? order[b++] : order[a++];
      while (a < mid) spare[o++] = order[a++];
      while (b < hi) spare[o++] = order[b++];
    }
    const t = order;
    order = spare;
    spare = t;
  }
  const groupOf = new Int32Array(n);
  let g = -1;
  for (let i = 0; i < n; i++) {
    if (i === 0 || compare(order[i - 1], order[i]) !== 0) g++;
    groupOf[order[i]] = g;
  }
  return groupOf;
}

/** Group number of each run from labels (runs with the same label and block share one). Cost O(n). */
export function labelGroups(labels: readonly string[], blocks: readonly number[] | null | undefined): Int32Array {
  const ids = new Map<string, number>();
  const groupOf = new Int32Array(labels.length);
  for (let i = 0; i < labels.length; i++) {
    const key = blocks ? `${blocks[i]}|${labels[i]}` : labels[i];
    let g = ids.get(key);
    if (g === undefined) ids.set(key, (g = ids.size));
    groupOf[i] = g;
  }
  return groupOf;
}

/**
 * Sum of squares of `values` about their group means (group numbers 0 .. G-1, or any
 * non-negative ids), with sum(n_g - 1) degrees of freedom. Cost O(n + G).
 */
export function pureErrorOfGroups(groupOf: Int32Array, y: ArrayLike<number>): PureError {
  let size = 0;
  for (let i = 0; i < groupOf.length; i++) if (groupOf[i] >= size) size = groupOf[i] + 1;
  const count = new Float64Array(size);
  const sum = new Float64Array(size);
  for (let i = 0; i < groupOf.length; i++) {
    count[groupOf[i]]++;
    sum[groupOf[i]] += y[i];
  }
  let ss = 0;
  for (let i = 0; i < groupOf.length; i++) {
    const g = groupOf[i];
    if (count[g] > 1) ss += (y[i] - sum[g] / count[g]) ** 2;
  }
  let df = 0;
  let repeated = 0;
  for (let g = 0; g < size; g++) {
    if (count[g] > 1) {
      df += count[g] - 1;
      repeated++;
    }
  }
  return { ss, df, groups: repeated, groupOf };
}
