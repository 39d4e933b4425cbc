/**
 * Alias structure of a regular two-level fraction. With defining relation I = s1*W1 = s2*W2 = ...
 * the column of an effect T equals s_j times the column of T*W_j, so the estimate of T is really
 * the estimate of T + s1*(T*W1) + s2*(T*W2) + ... (Montgomery, Design and Analysis of
 * Experiments, 8th ed., section 8.2; Box, Hunter and Hunter, 2nd ed., section 6.3). An alias
 * chain lists those effects; the trade writes it "A = BCD", "AB = -CE".
 */
import { InputError } from '../errors.ts';
import { compareTerms, type Term } from '../model/term.ts';
import type { Design } from './design.ts';
import { compareWords, formatWord, lettersOf, multiplyWords, parseLetterWord, wordLength, type Word } from './word.ts';

function checkTerm(t: Term): void {
  if (!Number.isInteger(t) || t <= 0 || t >= 2 ** 30) throw new InputError(`A model term is a non-empty set of factors (a positive bit mask), got ${t}`);
}

/**
 * Alias chain of one effect: the effect itself first (sign +1), then every effect aliased with
 * it, shortest first, each with its sign relative to the effect; only effects of at most
 * `maxOrder` factors are kept (the effect itself always is). Cost: one product per word.
 * Throws InputError for a term that is not a positive mask, or a maxOrder below 1.
 * Example: with I = -ABCF, aliasChain(A, relation) -> [A, -BCF].
 */
export function aliasChain(term: Term, relation: readonly Word[], maxOrder = Infinity): Word[] {
  checkTerm(term);
  if (!(maxOrder >= 1)) throw new InputError(`The largest order of aliases to list must be 1 or more, got ${maxOrder}`);
  const self: Word = { mask: term, sign: 1 };
  const others = relation
    .map((w) => multiplyWords(self, w))
    .filter((w) => w.mask !== 0 && wordLength(w.mask) <= maxOrder)
    .sort(compareWords);
  return [self, ...others];
}

/**
 * For each model term, its alias chain restricted to effects of at most `maxOrder` factors (any
 * order by default), so an analysis can say which combination a coefficient estimates.
 * Example: 2^(4-1) with I = ABCD, aliasChains(relation, [A, AB]) ->
 * [{term: A, chain: [A, BCD]}, {term: AB, chain: [AB, CD]}].
 */
export function aliasChains(relation: readonly Word[], terms: readonly Term[], maxOrder = Infinity): { term: Term; chain: Word[] }[] {
  return terms.map((term) => ({ term, chain: aliasChain(term, relation, maxOrder) }));
}

/**
 * Groups the model terms the design cannot separate: terms in one group share an alias chain
 * (their columns are equal or negated). Each group lists its terms in model order, the first with
 * sign +1 and the others with their sign relative to it; terms separated from every other model
 * term form groups of one. Cost: terms x words.
 * Example: 2^(4-1) with I = ABCD and model A, B, AB, CD -> [[A], [B], [AB, CD]].
 */
export function confoundedGroups(relation: readonly Word[], terms: readonly Term[]): Word[][] {
  const sorted = [...new Set(terms)].sort(compareTerms);
  sorted.forEach(checkTerm);
  const signOf = new Map<number, 1 | -1>(relation.map((w) => [w.mask, w.sign]));
  const used = new Set<Term>();
  const groups: Word[][] = [];
  for (const t of sorted) {
    if (used.has(t)) continue;
    used.add(t);
    const group: Word[] = [{ mask: t, sign: 1 }];
    for (const u of sorted) {
      if (used.has(u)) continue;
      const s = signOf.get(t ^ u);
      if (s !== undefined) {
        used.add(u);
        group.push({ mask: u, sign: s });
      }
    }
    groups.push(group);
  }
  return groups;
}

/**
 * Label of the combination an estimate measures, in letters: "A + BCD", "A - BCF"; the first
 * word's sign is taken as +. Throws InputError for an empty chain.
 * Example: aliasLabel([A, -BCF], letters) -> "A - BCF".
 */
export function aliasLabel(chain: readonly Word[], letters: readonly string[]): string {
  if (chain.length === 0) throw new InputError('An alias label needs at least one effect, got none');
  const s0 = chain[0].sign;
  return chain
    .map((w, i) => {
      const body = formatWord(w.mask, letters);
      if (i === 0) return body;
      return (w.sign * s0 > 0 ? '+ ' : '- ') + body;
    })
    .join(' ');
}

/**
 * The trade's alias chains of a design: one chain for every alias set that holds a main effect or
 * a two-factor interaction, each written shortest first, its first word taken as +, and only
 * effects of at most `maxOrder` factors kept. Chains come in model order of their first words
 * (A, B, ..., AB, AC, ...). For a full factorial (no words) every chain is the effect alone.
 * Throws InputError for fewer than 1 factor or a maxOrder below 1.
 * Example: 2^(4-1) with I = ABCD -> [[A,BCD], [B,ACD], [C,ABD], [D,ABC], [AB,CD], [AC,BD], [AD,BC]].
 */
export function designAliasChains(relation: readonly Word[], factorCount: number, maxOrder = Infinity): Word[][] {
  if (!Number.isInteger(factorCount) || factorCount < 1 || factorCount > 30) {
    throw new InputError(`Alias chains need 1 to 30 factors, got ${factorCount}`);
  }
  const low: Term[] = [];
  for (let i = 0; i < factorCount; i++) low.push(1 << i);
  for (let i = 0; i < factorCount; i++) for (let j = i + 1; j < factorCount; j++) low.push((1 << i) | (1 << j));
  const seen = new Set<number>();
  const chains: Word[][] = [];
  for (const t of low) {
    if (seen.has(t)) continue;
    const members = [{ mask: t, sign: 1 as const }, ...relation.map((w) => multiplyWords({ mask: t, sign: 1 }, w))];
    for (const m of members) if (wordLength(m.mask) <= 2) seen.add(m.mask);
    const shortest = [...members].sort(compareWords)[0];
    const norm = members
      .map((m) => ({ mask: m.mask, sign: (m.sign * shortest.sign) as 1 | -1 }))
      .filter((m) => m.mask === shortest.mask || wordLength(m.mask) <= maxOrder)
      .sort(compareWords);
    chains.push(norm);
  }
  return chains.sort((a, b) => compareWords(a[0], b[0]));
}

/**
 * Longest effect listed in a design's alias chains by default: the larger of 3 and resolution - 1,
 * so every main effect's shortest alias shows and chains do not fill pages with four-factor and
 * longer interactions, which the trade usually takes as negligible (the sparsity-of-effects
 * principle, Montgomery, 8th ed., section 8.1); every effect for a full factorial.
 * Example: defaultAliasOrder(4, 7) -> 3; defaultAliasOrder(6, 6) -> 5; defaultAliasOrder(null, 5) -> 5.
 */
export function defaultAliasOrder(resolution: number | null, factorCount: number): number {
  if (!Number.isInteger(factorCount) || factorCount < 1) throw new InputError(`Alias chains need 1 or more factors, got ${factorCount}`);
  return resolution === null ? factorCount : Math.max(3, resolution - 1);
}

/** A chain as the trade writes it: "A = BCD", "AB = -CE = FG". Example: formatChain([AB, -CE], letters) -> "AB = -CE". */
export function formatChain(chain: readonly Word[], letters: readonly string[]): string {
  if (chain.length === 0) throw new InputError('An alias chain needs at least one effect, got none');
  return chain.map((w) => formatWord(w, letters)).join(' = ');
}

/**
 * The defining relation of a Design (its signed words in letters) read back into words over the
 * design's factors. Throws InputError for a word with an unknown letter.
 * Example: definingWordsOf(design with definingRelation ["ABCD"]) -> [{mask:0b1111, sign:1}].
 */
export function definingWordsOf(design: Pick<Design, 'factors' | 'definingRelation'>): Word[] {
  const letters = lettersOf(design.factors);
  return design.definingRelation.map((w) => parseLetterWord(w, letters));
}
