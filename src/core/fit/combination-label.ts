/**
 * How a combination of terms is written: "C + AB", "A - BCD", "A + 0.5 BC" (a weight of 1 is
 * not written). One wording for the analysis, the reports and the screens.
 * Example: combinationLabel([{ letters: 'C', weight: 1 }, { letters: 'AB', weight: -1 }]) -> "C - AB".
 */
import { UNIT_WEIGHT_TOLERANCE } from '../tolerance.ts';

function weightText(w: number): string {
  return Math.abs(w - 1) < UNIT_WEIGHT_TOLERANCE ? '' : `${Number(w.toPrecision(4))} `;
}

export function combinationLabel(parts: readonly { readonly letters: string; readonly weight: number }[]): string {
  return parts
    .map((p, i) => {
      const w = weightText(Math.abs(p.weight));
      if (i === 0) return `${p.weight < 0 ? '-' : ''}${w}${p.letters}`;
      return ` ${p.weight < 0 ? '-' : '+'} ${w}${p.letters}`;
    })
    .join('');
}
