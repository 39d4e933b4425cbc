/**
 * Planned settings in real units. A factorial level is the declared setting itself (so 160 stays
 * 160, not 159.99999999999997 on a log scale); any other coded value is turned into real units by
 * toReal (src/core/factor/coding.ts) and rounded to 12 significant digits, enough for any gauge.
 */
import type { Factor } from '../factor/factor.ts';
import { toReal } from '../factor/coding.ts';

/**
 * Real planned setting of `factor` at `coded`: the low or high setting (or level name) at -1 and
 * +1, else toReal rounded to 12 significant digits. Throws InputError (from toReal) for a
 * categorical factor at a coded value other than -1 or +1, or a value that is not finite.
 * Example: plannedSetting({kind:'numeric', name:'T', letter:'A', low:160, high:200}, 0) -> 180.
 */
export function plannedSetting(factor: Factor, coded: number): number | string {
  if (factor.kind === 'numeric') {
    if (coded === -1) return factor.low;
    if (coded === 1) return factor.high;
    const v = toReal(factor, coded) as number;
    return Number(v.toPrecision(12));
  }
  return toReal(factor, coded);
}
