/**
 * The coding the analysis used, one row per factor: the real setting coded -1 and +1 (a level
 * label for a categorical factor), the scale and the unit, so every report can print it.
 * Coded x = (u - (high + low)/2) / ((high - low)/2) (see factor/coding.ts). Cost O(k).
 * Example: a numeric Temperature 160..200 degC -> { name: 'Temperature', letter: 'A', kind: 'numeric', low: 160, high: 200, scale: 'linear', unit: 'degC' }.
 */
import type { Factor } from '../factor/factor.ts';
import type { CodingRow } from './analysis.ts';

export function codingRows(factors: readonly Factor[]): CodingRow[] {
  return factors.map((f) =>
    f.kind === 'numeric'
      ? { name: f.name, letter: f.letter, kind: f.kind, low: f.low, high: f.high, scale: f.scale ?? 'linear', ...(f.unit ? { unit: f.unit } : {}) }
      : { name: f.name, letter: f.letter, kind: f.kind, low: f.levels[0], high: f.levels[1], scale: 'linear' },
  );
}
