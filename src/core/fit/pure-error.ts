/**
 * Pure error from runs repeated at the same settings (and in the same block): the sum of squares
 * of each group about its own mean, with sum(n_g - 1) degrees of freedom. Lack of fit is the rest
 * of the residual. Source: Montgomery, Design and Analysis of Experiments, 8th ed., section
 * 10.7 (testing for lack of fit); Draper and Smith, Applied Regression Analysis, 3rd ed., ch. 2.1.
 * Settings count as the same when they agree within SETTING_TOLERANCE in coded units: the fit
 * uses the actual settings, so only runs the fit cannot tell apart form a group.
 * Cost O(n k).
 */
import { SETTING_TOLERANCE } from '../tolerance.ts';

export interface PureError {
  readonly ss: number;
  readonly df: number;
  /** Number of groups of repeated settings that have two or more runs. */
  readonly groups: number;
}

export function pureError(coded: readonly (readonly number[])[], y: ArrayLike<number>, blocks: readonly number[] | null | undefined): PureError {
  const groups = new Map<string, number[]>();
  for (let i = 0; i < coded.length; i++) {
    const key = (blocks ? `${blocks[i]}|` : '') + coded[i].map((v) => Math.round(v / SETTING_TOLERANCE)).join(',');
    const g = groups.get(key);
    if (g) g.push(i);
    else groups.set(key, [i]);
  }
  let ss = 0;
  let df = 0;
  let repeated = 0;
  for (const g of groups.values()) {
    if (g.length < 2) continue;
    repeated++;
    let mean = 0;
    for (const i of g) mean += y[i];
    mean /= g.length;
    for (const i of g) ss += (y[i] - mean) ** 2;
    df += g.length - 1;
  }
  return { ss, df, groups: repeated };
}
