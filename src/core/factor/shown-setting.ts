/**
 * Settings as the screens and reports show them: a number to 4 significant digits (whole
 * numbers as they are). Runs added to a plan from a computed point (a solved setting, a step of
 * the path) are planned at the shown setting, so that the run form starts from a value a person
 * can set on the machine and the plan holds what the screen said; at 4 digits the move is below
 * 0.05% of the setting (common practice: plan at a setting that can be dialled).
 * Example: shownSetting(188.965963432) -> 189; shownCoded([oven 160-200 °C], [0.448298]) -> [0.45].
 */
import { toCoded, toReal } from './coding.ts';
import type { Factor } from './factor.ts';

/** The number as shown (4 significant digits; a whole number as it is). */
export function shownSetting(value: number): number {
  return Number.isInteger(value) ? value : Number(value.toPrecision(4));
}

/** Coded settings moved to the shown real settings; categorical factors (at -1 or +1) as they are. Throws InputError as toReal does. */
export function shownCoded(factors: readonly Factor[], coded: readonly number[]): number[] {
  return factors.map((f, i) => (f.kind === 'numeric' ? toCoded(f, shownSetting(toReal(f, coded[i]) as number)) : coded[i]));
}
