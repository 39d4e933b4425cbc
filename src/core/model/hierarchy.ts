/**
 * Model hierarchy: a term stays in the model while any higher-order term containing it stays
 * (Peixoto 1990, "A property of well-formulated polynomial regression models", The American
 * Statistician 44, 26-30; common practice in factorial analysis).
 */
import { compareTerms, type Term } from './term.ts';

/** True when every factor subset of every term is also a term. */
export function isHierarchical(terms: readonly Term[]): boolean {
  const set = new Set(terms);
  return terms.every((t) => subterms(t).every((s) => set.has(s)));
}

/** Non-empty proper subsets of a term (the lower-order terms it contains). */
export function subterms(t: Term): Term[] {
  const out: Term[] = [];
  for (let s = (t - 1) & t; s > 0; s = (s - 1) & t) out.push(s);
  return out;
}

/** Adds every term needed to make `terms` hierarchical; result in model order. */
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
