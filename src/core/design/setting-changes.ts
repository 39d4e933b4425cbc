/**
 * How often one factor's setting changes from one run to the next in run order: the number of
 * consecutive pairs whose coded settings differ (beyond SETTING_TOLERANCE). A hard-to-change
 * factor is sorted to keep this small (common practice; Montgomery, Design and Analysis of
 * Experiments, 8th ed., section 14.5, from memory).
 */
import { InputError } from '../errors.ts';
import { SETTING_TOLERANCE } from '../tolerance.ts';

/**
 * Changes of factor `f` along `runs` in the order given. Cost O(n).
 * Throws InputError for a factor outside the runs' settings.
 * Example: settingChanges([{coded:[-1]},{coded:[-1]},{coded:[1]},{coded:[-1]}], 0) -> 2.
 */
export function settingChanges(runs: readonly { readonly coded: readonly number[] }[], f: number): number {
  const k = runs[0]?.coded.length ?? 0;
  if (runs.length > 0 && (!Number.isInteger(f) || f < 0 || f >= k)) throw new InputError(`Setting changes: factor ${f + 1} is not one of the ${k} factors`);
  let n = 0;
  for (let i = 1; i < runs.length; i++) if (Math.abs(runs[i].coded[f] - runs[i - 1].coded[f]) > SETTING_TOLERANCE) n++;
  return n;
}
