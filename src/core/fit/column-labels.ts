/**
 * The name and letters of every model column, as the reports print them: "Intercept" / "I",
 * "Block 2" / "Block 2", and for a term its factor names joined by ':' and its letters
 * (model/term.ts termName, termLetters). Cost O(p k) the first time for a set of factors, O(p)
 * after it: a term's label depends on the factors' names and letters only, so each is written
 * once per set of factors and handed out again (frozen) while those names and letters stay.
 * Example: the columns [intercept, term AB] of factors Speed, Feed -> [{ name: 'Intercept', letters: 'I' }, { name: 'Speed:Feed', letters: 'AB' }].
 */
import type { Factor } from '../factor/factor.ts';
import { termLetters, termName, type Term } from '../model/term.ts';
import type { Column } from './columns.ts';

export interface ColumnLabel {
  readonly name: string;
  readonly letters: string;
}

const INTERCEPT: ColumnLabel = Object.freeze({ name: 'Intercept', letters: 'I' });

/** Per set of factors, the names and letters the labels were written from, and the labels by term. */
interface LabelCache {
  readonly names: string[];
  readonly letters: string[];
  readonly byTerm: Map<Term, ColumnLabel>;
}
const caches = new WeakMap<readonly Factor[], LabelCache>();

function cacheFor(factors: readonly Factor[]): LabelCache {
  const c = caches.get(factors);
  if (c && c.names.length === factors.length && factors.every((f, i) => f.name === c.names[i] && f.letter === c.letters[i])) return c;
  const fresh: LabelCache = { names: factors.map((f) => f.name), letters: factors.map((f) => f.letter), byTerm: new Map() };
  caches.set(factors, fresh);
  return fresh;
}

export function columnLabels(columns: readonly Column[], factors: readonly Factor[]): ColumnLabel[] {
  const cache = cacheFor(factors);
  const out: ColumnLabel[] = [];
  for (const c of columns) {
    if (c.kind === 'intercept') out.push(INTERCEPT);
    else if (c.kind === 'block') out.push({ name: `Block ${c.block}`, letters: `Block ${c.block}` });
    else {
      let label = cache.byTerm.get(c.term);
      if (label === undefined) {
        label = Object.freeze({ name: termName(c.term, factors), letters: termLetters(c.term, factors) });
        cache.byTerm.set(c.term, label);
      }
      out.push(label);
    }
  }
  return out;
}
