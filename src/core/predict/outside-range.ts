/**
 * The tested range: a numeric factor was run between its low and high settings (coded -1 and
 * +1), or out to its axial runs at +-e when the design has them (tested-extent.ts); a setting
 * with |coded| > e asks the model to extrapolate.
 */
import { toReal } from '../factor/coding.ts';
import type { Factor } from '../factor/factor.ts';
import { SETTING_TOLERANCE } from '../tolerance.ts';
import { formatSetting } from './parse-settings.ts';

export interface OutsideSetting {
  readonly name: string;
  readonly letter: string;
  readonly real: number;
  readonly coded: number;
  /** How far beyond the nearer end of the tested range, in real units (always positive). */
  readonly beyond: number;
  /** How far beyond, in coded units: |coded| - e (e = 1 unless the design has axial runs). */
  readonly beyondCoded: number;
  /** Which end of the tested range it passed: the setting coded -e ('low') or +e ('high'). */
  readonly end: 'low' | 'high';
  /** A plain sentence naming the factor and how far out it is. */
  readonly message: string;
}

/**
 * True when a coded setting lies outside the tested range [-e, +e] (e = 1, the factorial box,
 * unless given: a central composite design's axial distance, tested-extent.ts), beyond rounding
 * (SETTING_TOLERANCE, src/core/tolerance.ts). Cost O(1); NaN is not outside (callers check
 * finiteness first). Example: isOutside(1.5) -> true; isOutside(-1) -> false;
 * isOutside(1.4, 1.414) -> false.
 */
export function isOutside(coded: number, extent = 1): boolean {
  return Math.abs(coded) > extent + SETTING_TOLERANCE;
}

/**
 * The numeric factors whose coded setting lies outside the tested range [-1, +1], each with a
 * plain message: how far out in real units and in coded units. The real distance is measured
 * from the nearer tested setting (low or high), so it reads the same on a log scale. Categorical
 * factors are never outside (their two levels are the range). Common practice; the range is the
 * region where the runs were made (Montgomery, Design and Analysis of Experiments, 8th ed.,
 * section 10.6, on extrapolation beyond the original data). Cost O(k).
 * Throws InputError (from toReal) for a non-finite coded value.
 * Example: Temperature 160..200 degC at coded 1.5 -> one entry, real 210, beyond 10, end 'high',
 * message 'Temperature = 210 degC is outside the tested range (160 to 200 degC): 10 degC above
 * the high setting (coded +1.5).' With `extent` (per factor, coded; tested-extent.ts) the range
 * is [-e, +e] on each axis: for a rotatable central composite design (e = 1.414) coded 1.4 is
 * inside and 1.5 is outside, 0.086 coded beyond its axial runs.
 */
export function outsideRange(factors: readonly Factor[], coded: ArrayLike<number>, extent?: readonly number[]): OutsideSetting[] {
  const out: OutsideSetting[] = [];
  for (let i = 0; i < factors.length; i++) {
    const f = factors[i];
    const e = extent?.[i] ?? 1;
    if (f.kind !== 'numeric' || !isOutside(coded[i], e)) continue;
    const x = coded[i];
    const real = toReal(f, x) as number;
    const lowEnd = toReal(f, -e) as number;
    const highEnd = toReal(f, e) as number;
    const end = x > 0 ? highEnd : lowEnd;
    const beyond = Math.abs(real - end);
    const which = x > 0 ? 'high' : 'low';
    const range = e === 1 ? `${formatSetting(f.low)} to ${formatSetting(f.high, f.unit)}` : `${formatSetting(lowEnd)} to ${formatSetting(highEnd, f.unit)}, axial runs included`;
    const endWords = e === 1 ? `the ${which} setting` : `the ${which === 'high' ? 'highest' : 'lowest'} tested setting`;
    const dirWord = real > end ? 'above' : 'below';
    const sign = x > 0 ? '+' : '-';
    out.push({
      name: f.name,
      letter: f.letter,
      real,
      coded: x,
      beyond,
      beyondCoded: Math.abs(x) - e,
      end: which,
      message:
        `${f.name} = ${formatSetting(real, f.unit)} is outside the tested range (${range}): ` +
        `${formatSetting(beyond, f.unit)} ${dirWord} ${endWords} (coded ${sign}${formatSetting(Math.abs(x))}).`,
    });
  }
  return out;
}
