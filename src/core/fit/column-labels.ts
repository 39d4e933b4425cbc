/**
 * The name and letters of every model column, as the reports print them: "Intercept" / "I",
 * "Block 2" / "Block 2", and for a term its factor names joined by ':' and its letters (the
 * strings of model/term.ts termName and termLetters). Each term's strings are its lower factors'
 * strings plus one factor, so they are built by one join per term from those of the term without
 * its last factor (kept for the call, built the same way when that term is not in the model):
 * cost O(p) joins rather than O(p k). Squares go through termName and termLetters.
 * Example: the columns [intercept, term AB] of factors Speed, Feed -> [{ name: 'Intercept', letters: 'I' }, { name: 'Speed:Feed', letters: 'AB' }].
 */
import type { Factor } from '../factor/factor.ts';
import { isSquare, termLetters, termName, type Term } from '../model/term.ts';
import type { Column } from './columns.ts';

export interface ColumnLabel {
  readonly name: string;
  readonly letters: string;
}

const square = isSquare; // a local: module bindings are getters under some loaders, read per column

export function columnLabels(columns: readonly Column[], factors: readonly Factor[]): ColumnLabel[] {
  // Labels built so far, by term: a plain array over the masks for up to 2^12 of them, else a Map.
  const small = factors.length <= 12;
  const table: (ColumnLabel | undefined)[] = small ? new Array<ColumnLabel | undefined>(1 << factors.length).fill(undefined) : [];
  const known = new Map<Term, ColumnLabel>();
  // The label of a product term: the label of the term without its highest factor, joined with that factor.
  const product = (t: Term): ColumnLabel => {
    let label = small ? table[t] : known.get(t);
    if (label !== undefined) return label;
    const high = 31 - Math.clz32(t);
    const rest = t & ~(1 << high);
    const f = factors[high];
    if (rest === 0) label = { name: f.name, letters: f.letter };
    else {
      const r = product(rest);
      label = { name: `${r.name}:${f.name}`, letters: r.letters + f.letter };
    }
    if (small) table[t] = label;
    else known.set(t, label);
    return label;
  };
  const out: ColumnLabel[] = [];
  for (const c of columns) {
    if (c.kind === 'intercept') out.push({ name: 'Intercept', letters: 'I' });
    else if (c.kind === 'block') out.push({ name: `Block ${c.block}`, letters: `Block ${c.block}` });
    else if (square(c.term)) out.push({ name: termName(c.term, factors), letters: termLetters(c.term, factors) });
    else out.push(product(c.term));
  }
  return out;
}
