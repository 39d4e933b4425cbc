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

const LEVELS = [-1, 0, 1] as const;

/**
 * `planned`: the planned coded settings of each run (null for a run without a plan), or absent
 * for a plain table, when -1, 0 and +1 are the levels. Throws nothing; cost O(n k).
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
  const nominal = coded.map((row, i) => {
    const plan = planned?.[i] ?? null;
    let runAway = false;
    const out = row.map((v, f) => {
      let level: number | null = null;
      if (plan) {
        if (Math.abs(v - plan[f]) <= tol) level = plan[f];
      } else {
        for (const l of LEVELS) if (Math.abs(v - l) <= tol) level = l;
      }
      if (level === null) {
        if (plan || Math.abs(v) < 1) runAway = true;
        return v;
      }
      if (Math.abs(v - level) > exactTol) moved++;
      return level;
    });
    if (runAway) away++;
    return out;
  });
  return { nominal, moved, away, exact: moved === 0 };
}
