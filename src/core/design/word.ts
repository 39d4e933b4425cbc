/**
 * Words of a two-level design: a product of factors with a sign, such as ABCE or -ABCF. The
 * factors are a bit mask over the declared order (bit i = factor i, as for model terms in
 * src/core/model/term.ts); mask 0 is I, the identity. Multiplying two words is the exclusive or
 * of their masks (a factor squared is I) and the product of their signs (Montgomery, Design and
 * Analysis of Experiments, 8th ed., section 8.2).
 * Example: multiplyWords({mask:0b1111, sign:1}, {mask:0b0011, sign:-1}) -> {mask:0b1100, sign:-1}
 * (ABCD times -AB is -CD).
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { compareTerms, termFactors, termOrder } from '../model/term.ts';

export interface Word {
  /** Factors of the word, bit i = factor i in declared order. */
  readonly mask: number;
  /** +1 or -1. */
  readonly sign: 1 | -1;
}

/** Product of two words: masks xor-ed, signs multiplied. Example: AB times BC -> AC. */
export function multiplyWords(a: Word, b: Word): Word {
  return { mask: a.mask ^ b.mask, sign: (a.sign * b.sign) as 1 | -1 };
}

/** Number of factors in a word (its length). Example: wordLength(0b10111) -> 4. */
export function wordLength(mask: number): number {
  return termOrder(mask);
}

/**
 * Order for listing words: shorter first, then in declared order of the factors (A, B, ...,
 * AB, AC, ...), as model terms are ordered. Signs do not take part.
 * Example: [ABC, AB, BD].sort(compareWords) -> [AB, BD, ABC].
 */
export function compareWords(a: Word | number, b: Word | number): number {
  return compareTerms(typeof a === 'number' ? a : a.mask, typeof b === 'number' ? b : b.mask);
}

/**
 * Letters of a word, with a leading "-" when its sign is -1; "I" (or "-I") for the identity.
 * `letters` are the factors' letters in declared order.
 * Example: formatWord({mask:0b100111, sign:-1}, ['A','B','C','D','E','F']) -> "-ABCF".
 */
export function formatWord(word: Word | number, letters: readonly string[]): string {
  const w = typeof word === 'number' ? { mask: word, sign: 1 as const } : word;
  const body = w.mask === 0 ? 'I' : termFactors(w.mask).map((i) => {
    if (i >= letters.length) throw new InputError(`Word mask ${w.mask} names factor ${i + 1}, but only ${letters.length} factors are known`);
    return letters[i];
  }).join('');
  return (w.sign < 0 ? '-' : '') + body;
}

/** Letters of a list of factors. Example: lettersOf(defineFactors(...)) -> ['A','B','C']. */
export function lettersOf(factors: readonly Factor[]): string[] {
  return factors.map((f) => f.letter);
}

function lookupFactor(part: string, factors: readonly Factor[]): number {
  const key = part.trim().toLowerCase();
  let idx = factors.findIndex((f) => f.name.toLowerCase() === key);
  if (idx < 0) idx = factors.findIndex((f) => f.letter.toLowerCase() === key);
  return idx;
}

function known(factors: readonly Factor[]): string {
  return factors.map((f) => `${f.letter}=${f.name}`).join(', ');
}

/**
 * Reads a word typed by a person: an optional sign, then either letters run together ("ABCD",
 * "-ABC") or factor names (or letters) joined by ':' ("Temperature:Speed"). A single factor is a
 * one-letter word. "I" alone is the identity. Letters are case-insensitive.
 * Throws InputError for an empty word, an unknown letter or name, or a factor named twice.
 * Example: parseWord('-ABC', factors) -> {mask:0b111, sign:-1}.
 */
export function parseWord(text: string, factors: readonly Factor[], label?: string): Word {
  const what = label ?? `Word "${text}"`;
  let s = text.trim();
  let sign: 1 | -1 = 1;
  if (s.startsWith('-') || s.startsWith('+')) {
    if (s[0] === '-') sign = -1;
    s = s.slice(1).trim();
  }
  if (s === '') throw new InputError(`${what}: a word of factor letters is needed, such as ABCD, got nothing`);
  if (s === 'I' || s === 'i') {
    if (!factors.some((f) => f.letter === 'I')) return { mask: 0, sign };
  }
  const parts: string[] = [];
  if (s.includes(':')) {
    parts.push(...s.split(':').map((p) => p.trim()));
  } else if (lookupFactor(s, factors) >= 0) {
    parts.push(s);
  } else {
    parts.push(...s.replace(/\s+/g, '').split(''));
  }
  let mask = 0;
  for (const part of parts) {
    if (part === '') throw new InputError(`${what}: an empty factor name between ':'`);
    const idx = lookupFactor(part, factors);
    if (idx < 0) throw new InputError(`${what}: unknown factor "${part}" (factors: ${known(factors)})`);
    if ((mask >> idx) & 1) throw new InputError(`${what}: ${factors[idx].letter} (${factors[idx].name}) appears twice`);
    mask |= 1 << idx;
  }
  return { mask, sign };
}

/**
 * Reads a word written in letters only, as this module writes them ("ABCD", "-ABCF", "I"), over
 * the given letters. Throws InputError for an unknown or repeated letter or an empty word.
 * Example: parseLetterWord('-BD', ['A','B','C','D']) -> {mask:0b1010, sign:-1}.
 */
export function parseLetterWord(text: string, letters: readonly string[]): Word {
  let s = text.trim();
  let sign: 1 | -1 = 1;
  if (s.startsWith('-') || s.startsWith('+')) {
    if (s[0] === '-') sign = -1;
    s = s.slice(1);
  }
  if (s === '') throw new InputError(`Word "${text}": letters are needed, such as ABCD, got nothing`);
  if (s === 'I') return { mask: 0, sign };
  let mask = 0;
  for (const ch of s) {
    const idx = letters.indexOf(ch.toUpperCase());
    if (idx < 0) throw new InputError(`Word "${text}": unknown letter "${ch}" (letters: ${letters.join(', ')})`);
    if ((mask >> idx) & 1) throw new InputError(`Word "${text}": ${letters[idx]} appears twice`);
    mask |= 1 << idx;
  }
  return { mask, sign };
}
