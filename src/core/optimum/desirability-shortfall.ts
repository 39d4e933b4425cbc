/**
 * Which responses hold the overall desirability at 0: at a point, every response whose
 * prediction lies at or beyond an acceptable value (d = 0 under the definitions of Derringer
 * and Suich 1980, Journal of Quality Technology 12, 214-219), with the value it misses and on
 * which side, so the screen can say in words what to change.
 */
import type { Shortfall } from '../text/desirability-text.ts';
import type { DesirabilitySpec } from './desirability.ts';

/**
 * The responses with d = 0 at a point, in the order given: maximize misses LOW from below,
 * minimize misses HIGH from above, a target misses LOW or HIGH. Cost O(m).
 * Example: desirabilityShortfalls([{ name: 'Gloss', goal: 'max', low: 70, high: 90 }], [62]) ->
 * [{ name: 'Gloss', fit: 62, limit: 70, side: 'below' }].
 */
export function desirabilityShortfalls(specs: readonly DesirabilitySpec[], fits: readonly number[], units: readonly (string | undefined)[] = []): Shortfall[] {
  const out: Shortfall[] = [];
  specs.forEach((s, i) => {
    const y = fits[i];
    const unit = units[i] ? { unit: units[i] } : {};
    if ((s.goal === 'max' || s.goal === 'target') && y <= s.low) out.push({ name: s.name, ...unit, fit: y, limit: s.low, side: 'below' });
    else if ((s.goal === 'min' || s.goal === 'target') && y >= s.high) out.push({ name: s.name, ...unit, fit: y, limit: s.high, side: 'above' });
  });
  return out;
}
