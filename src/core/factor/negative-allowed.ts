/**
 * Whether a number field may hold a negative value, so that the screens offer a sign button
 * only where a minus makes sense (a button that can only give refused input would mislead).
 * The field's own check still reads what is typed; this rule decides the button, not the value.
 */
import type { Response } from '../study/response.ts';
import type { Factor } from './factor.ts';

/** The kinds of number field a person types into. */
export type NumberField =
  | { readonly kind: 'setting'; readonly factor: Factor }
  | { readonly kind: 'coded' }
  | { readonly kind: 'reading'; readonly response: Response };

/**
 * The rule (common practice, our own choice):
 * - a coded value: always (coded units run from -1 to +1 and beyond);
 * - a factor's setting in real units: a numeric factor on a linear scale whose lower level is
 *   at or below zero (the range reaches zero, so an actual setting just under it is plausible,
 *   e.g. an offset from -2 to 2 mm or a bias from 0 to 5 V); never on a log scale (its settings
 *   must be positive) nor for a categorical factor (it has named levels, no numbers);
 * - a response's reading: unless its lower bound is a number at or above zero (a thickness or
 *   a count cannot be negative; no lower bound means any sign).
 * Cost O(1). Example: negativeAllowed({ kind: 'setting', factor: Temperature 160..200 }) -> false;
 * negativeAllowed({ kind: 'setting', factor: Offset -2..2 }) -> true;
 * negativeAllowed({ kind: 'reading', response: { lowerBound: 0, ... } }) -> false.
 */
export function negativeAllowed(field: NumberField): boolean {
  switch (field.kind) {
    case 'coded':
      return true;
    case 'setting': {
      const f = field.factor;
      if (f.kind !== 'numeric' || f.scale === 'log') return false;
      return Math.min(f.low, f.high) <= 0;
    }
    case 'reading': {
      const b = field.response.lowerBound;
      return !(typeof b === 'number' && b >= 0);
    }
  }
}
