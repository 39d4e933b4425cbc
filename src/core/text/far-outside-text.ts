/**
 * The sentence for an actual setting far outside the planned range (see farOutsideSettings),
 * naming the run, the factor, the setting, the range and how far outside it is in coded units.
 * Example: farOutsideText('Run 4', factor, { factor: 0, value: 1600, coded: 71 }) ->
 *   'Run 4: Oven temperature 1600 °C is far outside the planned range 160 to 200 °C (coded 71);
 *   check it for a typing slip'.
 */
import type { Factor } from '../factor/factor.ts';
import type { FarOutside } from '../factor/far-outside.ts';
import { shortNumber } from './number-text.ts';

/** "Run 4: Oven temperature 1600 °C is far outside the planned range 160 to 200 °C (coded 71); check it for a typing slip". */
export function farOutsideText(run: string, factor: Factor, far: FarOutside): string {
  if (factor.kind !== 'numeric') return `${run}: ${factor.name} is far outside the plan`;
  const unit = factor.unit ? ` ${factor.unit}` : '';
  return (
    `${run}: ${factor.name} ${shortNumber(far.value)}${unit} is far outside the planned range ${shortNumber(factor.low)} to ${shortNumber(factor.high)}${unit} ` +
    `(coded ${shortNumber(far.coded, 3)}); check it for a typing slip`
  );
}
