/**
 * The defining relation of a regular two-level fraction: every product of the generators' words
 * (the defining contrast subgroup without I), each with its sign; its word-length pattern
 * (A_j = number of words of length j) and its resolution, the length of its shortest word
 * (Box and Hunter 1961, Technometrics 3, 311-351; Fries and Hunter 1980, Technometrics 22,
 * 601-608, who order designs by the word-length pattern: minimum aberration).
 */
import { InputError } from '../errors.ts';
import { compareWords, multiplyWords, wordLength, type Word } from './word.ts';

/**
 * All 2^p - 1 products of p independent generator words, shortest first (then in declared order
 * of the factors). Cost: 2^p word products.
 * Throws InputError for more than 20 words or for dependent words (a product that is I or -I).
 * Example: definingRelation([ABCE, BCDF]) -> [ABCE, ADEF, BCDF] (ABCE*BCDF = ADEF).
 */
export function definingRelation(generatorWords: readonly Word[]): Word[] {
  const p = generatorWords.length;
  if (p > 20) throw new InputError(`A defining relation takes at most 20 generator words, got ${p}`);
  const out: Word[] = [];
  for (let s = 1; s < 2 ** p; s++) {
    let w: Word = { mask: 0, sign: 1 };
    for (let g = 0; g < p; g++) if ((s >> g) & 1) w = multiplyWords(w, generatorWords[g]);
    if (w.mask === 0) throw new InputError('The generator words are dependent: a product of them is I, so the fraction would be smaller than stated');
    out.push(w);
  }
  return out.sort(compareWords);
}

/**
 * Word-length pattern: word length -> how many words of that length. Empty for a full factorial.
 * Example: wordLengthPattern(definingRelation of the 2^(7-3) with E=ABC, F=BCD, G=ACD) -> {4: 7}.
 */
export function wordLengthPattern(words: readonly Word[]): Record<number, number> {
  const out: Record<number, number> = {};
  for (const w of words) {
    const n = wordLength(w.mask);
    out[n] = (out[n] ?? 0) + 1;
  }
  return out;
}

/**
 * Resolution: the length of the shortest word; null when there are no words (a full factorial).
 * Example: resolution([ABCDE]) -> 5; resolution([]) -> null.
 */
export function resolution(words: readonly Word[]): number | null {
  if (words.length === 0) return null;
  return Math.min(...words.map((w) => wordLength(w.mask)));
}

/** Roman numeral of a resolution, as the trade writes it. Example: romanResolution(4) -> "IV". */
export function romanResolution(r: number): string {
  if (!Number.isInteger(r) || r < 1 || r > 39) throw new InputError(`A resolution is a whole number from 1 to 39, got ${r}`);
  const table: [number, string][] = [[10, 'X'], [9, 'IX'], [5, 'V'], [4, 'IV'], [1, 'I']];
  let n = r;
  let s = '';
  for (const [v, t] of table) while (n >= v) { s += t; n -= v; }
  return s;
}
