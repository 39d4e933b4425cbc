/**
 * The nominal plan of a set of runs: the coded setting each run was meant to have, which decides
 * what the runs can estimate (alias chains), which runs repeat one point (pure error), which are
 * center runs, and the saturated set of Lenth's method. Actual settings still enter the fit;
 * they never make separable what the plan confounds.
 * Rule: with a planned setting, the nominal value is the planned one when the actual lies within
 * CENTER_TOLERANCE (0.1 coded) of it, else the actual (a genuinely different point). Without a
 * plan (a plain CSV), an actual within CENTER_TOLERANCE of -1, 0 or +1 counts as that level, and
 * any other value stands for itself. Categorical factors are always exactly at -1 or +1.
 * Source: common practice (a plan's points are what the columns' orthogonality and aliasing are
 * built on; Montgomery, Design and Analysis of Experiments, 8th ed., section 8.2 for the alias
 * structure of a fraction); the 0.1 tolerance is the project's own (tolerance.ts).
 * Cost O(n k).
 * Example: nominalSettings([[0.98, -1], [0.5, 1]]) -> nominal [[1, -1], [0.5, 1]], moved 1, away 1.
 */
import { CENTER_TOLERANCE, SETTING_TOLERANCE } from '../tolerance.ts';

export interface NominalSettings {
  /** Nominal coded setting of each run, one value per factor. */
  readonly nominal: readonly (readonly number[])[];
  /** Number of settings moved to their nominal level (actual off it by more than rounding, within 0.1). */
  readonly moved: number;
  /**
   * Number of runs with a setting more than 0.1 coded from its planned level, or, without a plan,
   * from every one of -1, 0, +1 while inside the range (a setting beyond +-1.1 is taken as an
   * axial point of a second-order plan, not as a setting error).
   */
  readonly away: number;
  /** True when every nominal setting equals its actual one (up to SETTING_TOLERANCE). */
  readonly exact: boolean;
}

/**
 * `planned`: the planned coded settings of each run (null for a run without a plan), or absent
 * for a plain table, when -1, 0 and +1 are the levels. When every nominal setting is the actual
 * one exactly (the common case: runs logged at their levels), `nominal` is `coded` itself: one
 * pass over the settings and no copy. Throws nothing; cost O(n k).
 */
export function nominalSettings(
  coded: readonly (readonly number[])[],
  planned?: readonly (readonly number[] | null)[] | null,
): NominalSettings {
  // Locals: module bindings are getters under some loaders, and these are read per setting.
  const tol = CENTER_TOLERANCE;
  const exactTol = SETTING_TOLERANCE;
  let moved = 0;
  let away = 0;
  let same = true; // every nominal setting === its actual one
  const n = coded.length;
  // Each nominal setting, written down in the one pass (rows one after another), for the copy below.
  let width = 0;
  for (let i = 0; i < n; i++) width += coded[i].length;
  const levels = new Float64Array(width);
  let o = 0;
  for (let i = 0; i < n; i++) {
    const row = coded[i];
    const plan = planned?.[i] ?? null;
    let runAway = false;
    for (let f = 0; f < row.length; f++) {
      const v = row[f];
      const level = nominalLevel(v, plan, f, tol);
      if (level !== level) {
        levels[o++] = v;
        if (plan || Math.abs(v) < 1) runAway = true;
        continue;
      }
      levels[o++] = level;
      if (level !== v) same = false;
      if (Math.abs(v - level) > exactTol) moved++;
    }
    if (runAway) away++;
  }
  if (same) return { nominal: coded, moved, away, exact: moved === 0 };
  const nominal: number[][] = [];
  o = 0;
  for (let i = 0; i < n; i++) {
    const out: number[] = [];
    for (let f = 0; f < coded[i].length; f++) out.push(levels[o++]);
    nominal.push(out);
  }
  return { nominal, moved, away, exact: moved === 0 };
}

/** The level a setting v of factor f counts as (see the file comment), or NaN when it stands for itself. */
function nominalLevel(v: number, plan: readonly number[] | null, f: number, tol: number): number {
  if (plan) return Math.abs(v - plan[f]) <= tol ? plan[f] : NaN;
  if (Math.abs(v + 1) <= tol) return -1;
  if (Math.abs(v) <= tol) return 0;
  if (Math.abs(v - 1) <= tol) return 1;
  return NaN;
}

/**
 * The plan of runs whose settings are all exactly -1, 0 or +1 and that have no planned settings
 * (Yates' path, fit-yates.ts yatesCells): every setting is its own level, so nothing moved and
 * nothing is away; what nominalSettings(coded) gives, without the pass over the settings. Cost O(1).
 */
export function exactNominal(coded: readonly (readonly number[])[]): NominalSettings {
  return { nominal: coded, moved: 0, away: 0, exact: true };
}
