/**
 * The name and letters of every model column, as the reports print them: "Intercept" / "I",
 * "Block 2" / "Block 2", and for a term its factor names joined by ':' and its letters
 * (model/term.ts termName, termLetters). Cost O(p k).
 * Example: the columns [intercept, term AB] of factors Speed, Feed -> [{ name: 'Intercept', letters: 'I' }, { name: 'Speed:Feed', letters: 'AB' }].
 */
import type { Factor } from '../factor/factor.ts';
import { termLetters, termName } from '../model/term.ts';
import type { Column } from './columns.ts';

export interface ColumnLabel {
  readonly name: string;
  readonly letters: string;
}

export function columnLabels(columns: readonly Column[], factors: readonly Factor[]): ColumnLabel[] {
  return columns.map((c) => {
    if (c.kind === 'intercept') return { name: 'Intercept', letters: 'I' };
    if (c.kind === 'block') return { name: `Block ${c.block}`, letters: `Block ${c.block}` };
    return { name: termName(c.term, factors), letters: termLetters(c.term, factors) };
  });
}
