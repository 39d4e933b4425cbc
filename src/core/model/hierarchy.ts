/**
 * Model hierarchy: a term stays in the model while any higher-order term containing it stays
 * (Peixoto 1990, "A property of well-formulated polynomial regression models", The American
 * Statistician 44, 26-30; common practice in factorial analysis). A square x_i^2 contains its
 * main effect x_i: a model with A^2 keeps A (Peixoto 1990: a polynomial model is well formulated
 * when every lower power of each factor stays in it).
 */
import { compareTerms, FACTOR_BITS, isSquare, type Term } from './term.ts';

/** True when every lower-order term that a term contains (see subterms) is also a term. Example: [A, A^2] -> true, [A^2] -> false. */
export function isHierarchical(terms: readonly Term[]): boolean {
  const set = new Set(terms);
  return terms.every((t) => subterms(t).every((s) => set.has(s)));
}

/**
 * The lower-order terms a term contains: the non-empty proper subsets of a product's factors
 * (AB -> A, B), or the main effect of a square (A^2 -> A). Cost O(2^order).
 * Example: subterms(0b11) -> [0b10, 0b01].
 */
export function subterms(t: Term): Term[] {
  if (isSquare(t)) return [t & FACTOR_BITS];
  const out: Term[] = [];
  for (let s = (t - 1) & t; s > 0; s = (s - 1) & t) out.push(s);
  return out;
}

/** Adds every term needed to make `terms` hierarchical; result in model order. Example: [AC, B^2] -> [A, B, C, AC, B^2]. */
export function hierarchicalClosure(terms: readonly Term[]): Term[] {
  const set = new Set(terms);
  for (const t of terms) for (const s of subterms(t)) set.add(s);
  return [...set].sort(compareTerms);
}

/**
 * Model reduction that keeps hierarchy: drops the terms that `drop` marks, except those still
 * contained in a kept higher-order term. Returns the kept terms in model order.
 * Example: reduceHierarchical([A, B, AB], t => t === A) keeps all three, since AB contains A.
 */
export function reduceHierarchical(terms: readonly Term[], drop: (t: Term) => boolean): Term[] {
  const kept = new Set(terms.filter((t) => !drop(t)));
  for (const t of [...kept]) for (const s of subterms(t)) if (terms.includes(s)) kept.add(s);
  return [...kept].sort(compareTerms);
}
